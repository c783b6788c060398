import type { CapturedMail } from '@shared/schemas/me';
import { Fragment, type ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import { formatDateTime } from '../../../lib/format';

/** Turns http(s) addresses in a plain-text message into links; everything else stays text. */
export function linkify(text: string): ReactNode[] {
  const parts = text.split(/(https?:\/\/[^\s<>"')\]]+)/g);
  return parts.map((part, i) =>
    /^https?:\/\//.test(part) ? (
      // biome-ignore lint/suspicious/noArrayIndexKey: the split is stable for one message
      <a key={i} href={part} className="break-all">
        {part}
      </a>
    ) : (
      // biome-ignore lint/suspicious/noArrayIndexKey: the split is stable for one message
      <Fragment key={i}>{part}</Fragment>
    ),
  );
}

/** The captured outgoing mail: list on the left, the chosen message on the right (`?m=<id>`). */
export function Outbox({ messages }: { messages: CapturedMail[] }) {
  const [params] = useSearchParams();
  const newestFirst = [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
  const selected = newestFirst.find((m) => m.id === params.get('m')) ?? newestFirst[0];

  if (!selected) return <p className="text-ink-muted">No mail has gone out yet.</p>;

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(16rem,1fr)_2fr]">
      <nav aria-label="Messages">
        <ul className="border-t border-ink">
          {newestFirst.map((m) => {
            const current = m.id === selected.id;
            return (
              <li key={m.id} className="border-b border-rule">
                <Link
                  to={`?m=${m.id}`}
                  aria-current={current ? 'true' : undefined}
                  className={`block px-3 py-2 no-underline hover:bg-paper-sunk ${current ? 'bg-paper-sunk shadow-[inset_3px_0_0_var(--color-ink)]' : ''}`}
                >
                  <span className="block font-semibold">{m.subject || '(no subject)'}</span>
                  <span className="block truncate text-sm text-ink-muted">To {m.to}</span>
                  <span className="num block text-xs text-ink-muted">{formatDateTime(m.receivedAt)}</span>
                </Link>
              </li>
            );
          })}
        </ul>
      </nav>
      <article aria-labelledby="mail-subject" className="min-w-0 border border-ink bg-paper-raised">
        <header className="border-b border-rule px-4 py-3">
          <h2 id="mail-subject" className="text-xl">
            {selected.subject || '(no subject)'}
          </h2>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
            <dt className="label-caps pt-0.5">From</dt>
            <dd className="break-all">{selected.from}</dd>
            <dt className="label-caps pt-0.5">To</dt>
            <dd className="break-all">{selected.to}</dd>
            <dt className="label-caps pt-0.5">Sent</dt>
            <dd className="num">{formatDateTime(selected.receivedAt)}</dd>
          </dl>
        </header>
        <div className="num whitespace-pre-wrap break-words px-4 py-4 text-sm">{linkify(selected.text)}</div>
      </article>
    </div>
  );
}
