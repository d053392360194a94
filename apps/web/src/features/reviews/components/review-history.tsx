import type { ReviewSubjectType } from '@photon-ledger/shared';
import { useReviewHistory } from '../api/get-review-history';

const when = (iso: string) => `${iso.slice(0, 16).replace('T', ' ')} UTC`;

const verbs: Record<string, string> = {
  'review-submitted': 'Submitted for review',
  'review-approved': 'Approved',
  'review-sent-back': 'Sent back',
};

const text = (v: unknown) => (typeof v === 'string' && v.trim() ? v : null);

/** Every state change of a subject's review, oldest first, from the audit log (reasons, notes, hashes). */
export function ReviewHistory({ missionId, subjectType, subjectId, version }: { missionId: string; subjectType: ReviewSubjectType; subjectId: string; version: string | null }) {
  const history = useReviewHistory(missionId, subjectType, subjectId, version);
  if (history.isError) return <p className="text-sm text-alarm">The review history could not be loaded ({history.error.message}).</p>;
  if (!history.data) {
    return (
      <div role="status" className="h-12 animate-pulse rounded-md bg-paper-sunk/60 motion-reduce:animate-none">
        <span className="sr-only">Loading the review history…</span>
      </div>
    );
  }
  if (history.data.length === 0) return <p className="text-sm text-ink-soft">No review step recorded yet.</p>;
  return (
    <ol aria-label="Review history" className="flex flex-col gap-1.5 text-sm">
      {history.data.map((e) => {
        const reason = text(e.detail.reason);
        const note = text(e.detail.note);
        const hash = text(e.detail.contentHash);
        return (
          <li key={e.id} className="border-l-2 border-rule-strong pl-3">
            <p>
              <span className="font-medium">{verbs[e.action] ?? e.action}</span>
              <span className="text-ink-soft">
                {' '}
                · {e.user?.displayName ?? 'former member'} · {when(e.at)}
              </span>
            </p>
            {reason && <p className="text-ink-soft">Reason: {reason}</p>}
            {note && <p className="text-ink-soft">Note: {note}</p>}
            {hash && <p className="font-mono text-xs break-all text-ink-soft">SHA-256 {hash}</p>}
          </li>
        );
      })}
    </ol>
  );
}
