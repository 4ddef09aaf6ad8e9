/** Mail caught by the development sink: the list (newest first) and one message with its headers. */
import { useState } from 'react';
import type { CapturedMail } from '@/lib/api-types';
import { fmtWhen } from '@/lib/format';
import { QueryState } from '@/components/query-state';
import { useMail, useMailMessage } from '../api/admin';

function Message({ id }: { id: number }) {
  const q = useMailMessage(id);
  return (
    <QueryState q={q} what="the message">
      {(m) => (
        <article aria-label={`Message: ${m.subject}`} className="text-xs">
          <h3 className="m-0 text-sm font-semibold">{m.subject}</h3>
          <dl className="m-0 mt-1 grid grid-cols-[auto_1fr] gap-x-3 text-ink-2">
            <dt>From</dt><dd className="num m-0">{m.from ?? '—'}</dd>
            <dt>To</dt><dd className="num m-0">{m.toHeader ?? m.to.join(', ')}</dd>
            <dt>Received</dt><dd className="num m-0">{fmtWhen(m.receivedAt)}</dd>
          </dl>
          {/* Plain text only: the HTML part is not rendered, so a message cannot run anything here. */}
          <pre className="num mt-2 max-h-[28rem] overflow-auto whitespace-pre-wrap rounded border border-rule bg-paper p-2 text-[12px] text-ink">{m.text}</pre>
          {m.headers.length > 0 && (
            <details className="mt-1"><summary className="cursor-pointer text-ink-3">Headers ({m.headers.length})</summary>
              <ul className="num m-0 mt-1 list-none p-0 text-[11px] text-ink-2">{m.headers.map((h, i) => <li key={i}><span className="text-ink">{h.name}:</span> {h.value}</li>)}</ul>
            </details>
          )}
        </article>
      )}
    </QueryState>
  );
}

export function MailBox() {
  const q = useMail();
  const [open, setOpen] = useState<number>();
  return (
    <QueryState q={q} what="the captured mail">
      {(list: CapturedMail[]) => list.length === 0 ? <p className="m-0 px-3 py-2 text-xs text-ink-2">No mail caught yet (or the server sends through a real mail host).</p> : (
        <div className="grid grid-cols-1 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
          <ul aria-label="Messages" className="m-0 max-h-[32rem] list-none divide-y divide-rule overflow-y-auto border-rule p-0 lg:border-r">
            {list.map((m) => (
              <li key={m.id}>
                <button type="button" aria-pressed={open === m.id} onClick={() => setOpen(m.id)}
                  className={`block w-full px-3 py-1.5 text-left text-xs hover:bg-paper ${open === m.id ? 'bg-select' : ''}`}>
                  <span className="block truncate font-medium text-ink">{m.subject}</span>
                  <span className="num block truncate text-ink-3">{m.to.join(', ')} · {fmtWhen(m.receivedAt)}</span>
                </button>
              </li>
            ))}
          </ul>
          <div className="px-3 py-2">{open === undefined ? <p className="m-0 text-xs text-ink-2">Pick a message to read it.</p> : <Message id={open} />}</div>
        </div>
      )}
    </QueryState>
  );
}
