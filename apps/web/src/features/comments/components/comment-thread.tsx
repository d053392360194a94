import { useId, useState, type FormEvent } from 'react';
import { commentCreateSchema, type Comment, type CommentSubjectType } from '@photon-ledger/shared';
import { Button } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { ApiRequestError } from '../../../lib/api-client';
import { useCreateComment } from '../api/create-comment';
import { useComments } from '../api/list-comments';
import { useResolveComment } from '../api/resolve-comment';

const when = (iso: string) => `${iso.slice(0, 16).replace('T', ' ')} UTC`;

/** A line a comment can be about: its key and a label. */
export interface CommentLineChoice {
  key: string;
  label: string;
}

/**
 * Threaded comments on a subject. Those who may comment (engineers, leads, reviewers) write,
 * reply and resolve; others read. `@local-part` mentions a mission member (mailed to them).
 */
export function CommentThread({
  missionId,
  subjectType,
  subjectId,
  canComment,
  lines = [],
  wholeLabel = 'The whole budget',
}: {
  missionId: string;
  subjectType: CommentSubjectType;
  subjectId: string;
  canComment: boolean;
  lines?: readonly CommentLineChoice[];
  /** The "About" choice for a comment on the subject as a whole (when lines are offered). */
  wholeLabel?: string;
}) {
  const comments = useComments(missionId, subjectType, subjectId);
  if (comments.isError) return <ErrorState title="Could not load the comments" error={comments.error} onRetry={() => void comments.refetch()} retrying={comments.isFetching} />;
  if (!comments.data) {
    return (
      <div role="status" className="h-24 animate-pulse rounded-lg border border-rule bg-paper-sunk/60 motion-reduce:animate-none">
        <span className="sr-only">Loading the comments…</span>
      </div>
    );
  }
  const all = comments.data.comments;
  const roots = all.filter((c) => !c.parentId || !all.some((p) => p.id === c.parentId));
  const labelOf = (key: string | null) => (key ? (lines.find((l) => l.key === key)?.label ?? key) : null);
  return (
    <div className="flex flex-col gap-4">
      {roots.length === 0 ? (
        <p className="text-sm text-ink-soft">No comments yet.</p>
      ) : (
        <ol className="flex flex-col gap-3">
          {roots.map((c) => (
            <CommentItem key={c.id} comment={c} all={all} missionId={missionId} canComment={canComment} lineLabel={labelOf(c.lineKey)} />
          ))}
        </ol>
      )}
      {canComment && <Composer missionId={missionId} subjectType={subjectType} subjectId={subjectId} lines={lines} wholeLabel={wholeLabel} />}
    </div>
  );
}

function CommentItem({ comment, all, missionId, canComment, lineLabel }: { comment: Comment; all: Comment[]; missionId: string; canComment: boolean; lineLabel: string | null }) {
  const replies = all.filter((c) => c.parentId === comment.id);
  const resolve = useResolveComment(missionId);
  const [replying, setReplying] = useState(false);
  return (
    <li className={`rounded-lg border px-4 py-3 ${comment.resolved ? 'border-rule bg-paper-sunk/50' : 'border-rule-strong bg-paper-raised'}`}>
      <div className="flex flex-wrap items-baseline gap-x-2 text-sm">
        <span className="font-medium">{comment.author?.displayName ?? 'Former member'}</span>
        <span className="text-xs text-ink-soft">{when(comment.createdAt)}</span>
        {lineLabel && <span className="rounded bg-ink-wash px-1.5 text-xs">on {lineLabel}</span>}
        {comment.resolved && <span className="text-xs text-sage-deep">resolved{comment.resolvedBy ? ` by ${comment.resolvedBy.displayName}` : ''}</span>}
      </div>
      <p className="mt-1 text-sm whitespace-pre-wrap">{comment.body}</p>
      {comment.mentions.length > 0 && <p className="mt-1 text-xs text-ink-soft">Mentions: {comment.mentions.map((m) => m.displayName).join(', ')}</p>}
      {canComment && (
        <div className="mt-2 flex gap-2 print:hidden">
          <Button size="sm" variant="quiet" onClick={() => setReplying((v) => !v)} aria-expanded={replying}>
            Reply
          </Button>
          <Button size="sm" variant="quiet" disabled={resolve.isPending} onClick={() => resolve.mutate({ commentId: comment.id, resolved: !comment.resolved })}>
            {comment.resolved ? 'Reopen' : 'Resolve'}
          </Button>
        </div>
      )}
      {replies.length > 0 && (
        <ol className="mt-3 flex flex-col gap-2 border-l-2 border-rule pl-4">
          {replies.map((r) => (
            <CommentItem key={r.id} comment={r} all={all} missionId={missionId} canComment={canComment} lineLabel={null} />
          ))}
        </ol>
      )}
      {replying && <Composer missionId={missionId} subjectType={comment.subjectType} subjectId={comment.subjectId} parent={comment} onDone={() => setReplying(false)} />}
    </li>
  );
}

function Composer({
  missionId,
  subjectType,
  subjectId,
  lines = [],
  wholeLabel = 'The whole budget',
  parent,
  onDone,
}: {
  missionId: string;
  subjectType: CommentSubjectType;
  subjectId: string;
  lines?: readonly CommentLineChoice[];
  wholeLabel?: string;
  parent?: Comment;
  onDone?: () => void;
}) {
  const create = useCreateComment(missionId);
  const [body, setBody] = useState('');
  const [lineKey, setLineKey] = useState('');
  const [bodyError, setBodyError] = useState<string | undefined>();
  const id = useId();
  const apiError = create.error instanceof ApiRequestError ? create.error : null;
  const shownError = bodyError ?? apiError?.fields?.body ?? apiError?.fields?.parentId ?? Object.values(apiError?.fields ?? {})[0];

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const input = { subjectType, subjectId, body, ...(parent ? { parentId: parent.id, ...(parent.lineKey ? { lineKey: parent.lineKey } : {}) } : lineKey ? { lineKey } : {}) };
    const parsed = commentCreateSchema.safeParse(input);
    if (!parsed.success) {
      setBodyError(parsed.error.issues[0]?.message ?? 'invalid comment');
      return;
    }
    setBodyError(undefined);
    create.mutate(parsed.data, {
      onSuccess: () => {
        setBody('');
        onDone?.();
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate className="mt-2 flex flex-col gap-2 print:hidden">
      {!parent && lines.length > 0 && (
        <div className="flex flex-col gap-1">
          <label htmlFor={`${id}-line`} className="text-sm font-medium">
            About
          </label>
          <select id={`${id}-line`} value={lineKey} onChange={(e) => setLineKey(e.target.value)} className="h-9 max-w-sm rounded-md border border-rule-strong bg-paper-raised px-2 text-sm">
            <option value="">{wholeLabel}</option>
            {lines.map((l) => (
              <option key={l.key} value={l.key}>
                {l.label}
              </option>
            ))}
          </select>
        </div>
      )}
      <label htmlFor={`${id}-body`} className="text-sm font-medium">
        {parent ? `Reply to ${parent.author?.displayName ?? 'this comment'}` : 'New comment'}
      </label>
      <textarea
        id={`${id}-body`}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        rows={3}
        aria-invalid={shownError ? true : undefined}
        aria-describedby={`${id}-hint${shownError ? ` ${id}-error` : ''}`}
        className={`rounded-md border bg-paper-raised px-3 py-2 text-sm ${shownError ? 'border-alarm' : 'border-rule-strong'}`}
      />
      <p id={`${id}-hint`} className="text-xs text-ink-soft">
        Mention a mission member with @ and the part of their e-mail address before the @ (e.g. @ines.okafor); they get an e-mail.
      </p>
      {shownError && (
        <p id={`${id}-error`} className="text-xs text-alarm">
          {shownError}
        </p>
      )}
      {create.error && !apiError?.fields && (
        <p role="alert" className="text-sm text-alarm">
          {create.error.message}
        </p>
      )}
      <div>
        <Button type="submit" size="sm" variant={parent ? 'secondary' : 'primary'} disabled={create.isPending}>
          {parent ? 'Post reply' : 'Post comment'}
        </Button>
      </div>
    </form>
  );
}
