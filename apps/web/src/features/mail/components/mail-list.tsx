import type { MailMessage } from '@photon-ledger/shared';

const when = (iso: string) => `${iso.slice(0, 19).replace('T', ' ')} UTC`;

/** Captured messages, newest first; each opens to its text. */
export function MailListView({ messages }: { messages: MailMessage[] }) {
  if (messages.length === 0) return <p className="text-sm text-ink-soft">No messages captured yet. Submitting a budget for review, a decision or an @mention sends one.</p>;
  return (
    <ul className="flex flex-col gap-2">
      {messages.map((m) => (
        <li key={m.id} className="rounded-lg border border-rule bg-paper-raised">
          <details>
            <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-3 px-4 py-2.5">
              <span className="font-medium">{m.subject}</span>
              <span className="text-xs text-ink-soft">to {m.to.join(', ')}</span>
              <span className="ml-auto font-mono text-xs text-ink-soft">{when(m.receivedAt)}</span>
            </summary>
            <div className="border-t border-rule px-4 py-3">
              <p className="text-xs text-ink-soft">From {m.from || '(none)'}</p>
              <pre className="mt-2 font-mono text-[13px] whitespace-pre-wrap">{m.text}</pre>
            </div>
          </details>
        </li>
      ))}
    </ul>
  );
}
