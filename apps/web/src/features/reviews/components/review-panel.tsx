import { useId, useState, type FormEvent } from 'react';
import { reviewSendBackSchema, type Review, type ReviewSubjectType, type Role } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { ApiRequestError } from '../../../lib/api-client';
import { useReview } from '../api/get-review';
import { useTransitionReview } from '../api/transition-review';
import { ReviewStateBadge } from './review-state-badge';

const when = (iso: string | null) => (iso ? `${iso.slice(0, 16).replace('T', ' ')} UTC` : '');

/**
 * Review state of a subject with the transitions the role may ask for: engineers and leads
 * submit, leads approve or send back (with a reason). Reviewers and admins see it read-only.
 */
export function ReviewPanel({ missionId, subjectType, subjectId, role }: { missionId: string; subjectType: ReviewSubjectType; subjectId: string; role: Role | undefined }) {
  const review = useReview(missionId, subjectType, subjectId);
  if (review.isError) return <ErrorState title="Could not load the review" error={review.error} onRetry={() => void review.refetch()} retrying={review.isFetching} />;
  if (!review.data) {
    return (
      <div role="status" className="h-28 animate-pulse rounded-lg border border-rule bg-paper-sunk/60 motion-reduce:animate-none">
        <span className="sr-only">Loading the review…</span>
      </div>
    );
  }
  return <ReviewCard review={review.data} role={role} />;
}

function ReviewCard({ review, role }: { review: Review; role: Role | undefined }) {
  const transition = useTransitionReview(review.missionId, review.subjectType, review.subjectId);
  const [sendingBack, setSendingBack] = useState(false);
  const [reason, setReason] = useState('');
  const [reasonError, setReasonError] = useState<string | undefined>();
  const reasonId = useId();
  const canSubmit = (role === 'engineer' || role === 'lead') && (review.state === 'draft' || review.state === 'changes-requested');
  const canDecide = role === 'lead' && review.state === 'in-review';
  const apiError = transition.error instanceof ApiRequestError ? transition.error : null;
  const fieldError = reasonError ?? apiError?.fields?.reason;

  const sendBack = (event: FormEvent) => {
    event.preventDefault();
    const parsed = reviewSendBackSchema.safeParse({ reason });
    if (!parsed.success) {
      setReasonError(parsed.error.issues[0]?.message ?? 'reason is required');
      return;
    }
    setReasonError(undefined);
    transition.mutate({ action: 'send-back', body: parsed.data }, { onSuccess: () => setSendingBack(false) });
  };

  return (
    <div className="flex flex-col gap-3 rounded-lg border border-rule bg-paper-raised p-4">
      <div className="flex flex-wrap items-center gap-3">
        <ReviewStateBadge state={review.state} />
        {review.submittedBy && (
          <span className="text-sm text-ink-soft">
            submitted by <span className="text-ink">{review.submittedBy.displayName}</span> {when(review.submittedAt)}
          </span>
        )}
        {review.decidedBy && (
          <span className="text-sm text-ink-soft">
            · {review.state === 'approved' ? 'approved' : 'decided'} by <span className="text-ink">{review.decidedBy.displayName}</span> {when(review.decidedAt)}
          </span>
        )}
      </div>
      {review.state === 'changes-requested' && review.reason && (
        <p className="rounded-md border-l-4 border-sodium bg-sodium-wash/60 px-3 py-2 text-sm">
          <span className="font-semibold">Reason: </span>
          {review.reason}
        </p>
      )}
      {review.note && review.state !== 'changes-requested' && <p className="text-sm text-ink-soft">Note: {review.note}</p>}
      {review.frozen && (
        <div className="text-sm">
          <p>
            Frozen {when(review.frozen.frozenAt)} ·{' '}
            {review.intact === false ? (
              <span className="font-semibold text-alarm">content no longer matches the approved hash</span>
            ) : (
              <span className="text-sage-deep">content matches the approved hash</span>
            )}
          </p>
          <p className="font-mono text-xs break-all text-ink-soft">SHA-256 {review.frozen.contentHash}</p>
        </div>
      )}
      {review.state === 'draft' && <p className="text-sm text-ink-soft">Not submitted for review yet.</p>}

      {(canSubmit || canDecide) && (
        <div className="flex flex-wrap gap-2">
          {canSubmit && (
            <Button variant="primary" size="sm" disabled={transition.isPending} onClick={() => transition.mutate({ action: 'submit', body: {} })}>
              {review.state === 'changes-requested' ? 'Submit again for review' : 'Submit for review'}
            </Button>
          )}
          {canDecide && (
            <>
              <Button variant="primary" size="sm" disabled={transition.isPending} onClick={() => transition.mutate({ action: 'approve', body: {} })}>
                Approve and freeze
              </Button>
              <Button size="sm" disabled={transition.isPending} aria-expanded={sendingBack} onClick={() => setSendingBack((v) => !v)}>
                Send back…
              </Button>
            </>
          )}
        </div>
      )}
      {canDecide && sendingBack && (
        <form onSubmit={sendBack} className="flex flex-col gap-2" noValidate>
          <label htmlFor={reasonId} className="text-sm font-medium">
            Reason for sending back (required)
          </label>
          <textarea
            id={reasonId}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            rows={3}
            aria-invalid={fieldError ? true : undefined}
            aria-describedby={fieldError ? `${reasonId}-error` : undefined}
            className={`rounded-md border bg-paper-raised px-3 py-2 text-sm ${fieldError ? 'border-alarm' : 'border-rule-strong'}`}
          />
          {fieldError && (
            <p id={`${reasonId}-error`} className="text-xs text-alarm">
              {fieldError}
            </p>
          )}
          <div>
            <Button type="submit" size="sm" disabled={transition.isPending}>
              Send back with this reason
            </Button>
          </div>
        </form>
      )}
      {transition.error && !apiError?.fields?.reason && (
        <p role="alert" className="text-sm text-alarm">
          {transition.error.message}
        </p>
      )}
    </div>
  );
}
