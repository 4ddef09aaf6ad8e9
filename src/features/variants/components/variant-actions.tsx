/** Marks and comments on the variant page. */
import { useState } from 'react';
import type { RunRef } from '@/lib/api';
import type { ProjectRight } from '@/lib/api-types';
import type { VariantRow } from '@/lib/run-types';
import { BTN } from '@/components/ui';
import { MarkButtons } from './mark-buttons';
import { CommentsPanel } from './comments-panel';

export function VariantActions({ runRef, row, rights, meId }: { runRef: RunRef; row: VariantRow; rights: readonly ProjectRight[]; meId?: number }) {
  const [open, setOpen] = useState(false);
  return (
    <div className="flex items-center gap-2 text-xs">
      <span className="text-ink-2">Your mark</span>
      <MarkButtons runRef={runRef} row={row} meId={meId} canCandidate={rights.includes('variants:mark')} canReject={rights.includes('variants:reject')} />
      <button type="button" className={BTN} aria-haspopup="dialog" aria-expanded={open} onClick={() => setOpen(true)}>Comments</button>
      {open && <CommentsPanel runRef={runRef} index={row.index} canWrite={rights.includes('comments:write')} onClose={() => setOpen(false)} />}
    </div>
  );
}
