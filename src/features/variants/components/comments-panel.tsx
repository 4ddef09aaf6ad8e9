/**
 * Comments on one variant, in a side panel over the right edge: the thread, oldest first, and a
 * form for those with the right. Escape or Close returns focus to where it came from.
 */
import { useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import type { RunRef } from '@/lib/api';
import { fmtWhen } from '@/lib/format';
import { variantPath } from '@/lib/paths';
import { QueryState } from '@/components/query-state';
import { FormError } from '@/components/form-error';
import { BTN, BTN_PRIMARY, LINK } from '@/components/ui';
import { useAddComment, useComments } from '../api/comments';

interface Props {
  runRef: RunRef;
  index: number;
  canWrite: boolean;
  onClose: () => void;
}

export function CommentsPanel({ runRef, index, canWrite, onClose }: Props) {
  const id = useId();
  const q = useComments(runRef, index);
  const add = useAddComment(runRef, index);
  const [body, setBody] = useState('');
  const heading = useRef<HTMLHeadingElement>(null);
  const close = useRef(onClose);
  close.current = onClose;
  useEffect(() => {
    const back = document.activeElement as HTMLElement | null;
    heading.current?.focus();
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && close.current();
    window.addEventListener('keydown', onKey);
    return () => {
      window.removeEventListener('keydown', onKey);
      back?.focus?.();
    };
  }, [index]);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (body.trim()) add.mutate(body.trim(), { onSuccess: () => setBody('') });
  };
  return (
    <aside role="dialog" aria-modal="false" aria-labelledby={`${id}-h`}
      className="fixed top-11 right-0 bottom-0 z-30 flex w-[24rem] max-w-full flex-col border-l border-rule-strong bg-sheet shadow-xl">
      <div className="flex items-center gap-2 border-b border-rule px-3 py-2">
        <h2 id={`${id}-h`} ref={heading} tabIndex={-1} className="m-0 text-sm font-semibold">Comments on variant <span className="num">{index}</span></h2>
        <button type="button" className={`ml-auto ${BTN}`} onClick={onClose}>Close</button>
      </div>
      <div className="flex-1 overflow-y-auto px-3 py-2 text-sm">
        <QueryState q={q} what="the comments">
          {(list) => list.length === 0 ? <p className="m-0 text-xs text-ink-2">No comments yet.</p> : (
            <ol className="m-0 flex list-none flex-col gap-2 p-0">
              {list.map((c) => (
                <li key={c.id} className="rounded border border-rule px-2 py-1.5">
                  <p className="m-0 text-xs text-ink-3">{c.author?.name ?? 'a deleted account'} · <span className="num">{fmtWhen(c.createdAt)}</span></p>
                  <p className="m-0 mt-0.5 whitespace-pre-wrap">{c.body}</p>
                </li>
              ))}
            </ol>
          )}
        </QueryState>
      </div>
      <div className="border-t border-rule px-3 py-2">
        {canWrite ? (
          <form onSubmit={submit}>
            <label htmlFor={`${id}-body`} className="block text-xs text-ink-2">Your comment</label>
            <textarea id={`${id}-body`} rows={3} maxLength={10000} value={body} onChange={(e) => setBody(e.target.value)}
              className="mt-1 block w-full rounded border border-rule-strong bg-sheet px-2 py-1 text-sm" />
            {add.isError && <FormError error={add.error} />}
            <button type="submit" disabled={add.isPending || !body.trim()} className={`mt-2 ${BTN_PRIMARY}`}>{add.isPending ? 'Posting…' : 'Post'}</button>
          </form>
        ) : <p className="m-0 text-xs text-ink-2">Your role in this project can read comments but not write them.</p>}
        <Link to={variantPath(runRef.slug, runRef.runId, index)} className={`mt-2 inline-block text-xs ${LINK}`}>Open the variant</Link>
      </div>
    </aside>
  );
}
