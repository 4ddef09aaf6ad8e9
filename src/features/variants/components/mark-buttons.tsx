/**
 * The caller's verdict on a variant: candidate or rejected, press again to clear. Without the
 * right, the buttons stay focusable but inert, and say why (tooltip and description).
 */
import { useId } from 'react';
import type { RunRef } from '@/lib/api';
import type { MarkKind, VariantRow } from '@/lib/run-types';
import { errorMessage } from '@/lib/api-client';
import { markUserId } from '@/lib/marks';
import { useMarkVariant } from '../api/marks';

interface Props {
  runRef: RunRef;
  row: Pick<VariantRow, 'index' | 'marks'>;
  meId?: number;
  canCandidate: boolean;
  canReject: boolean;
}

const WHY: Record<MarkKind, string> = {
  candidate: 'Your role in this project cannot mark candidates.',
  rejected: 'Your role in this project cannot reject variants.',
};

export function MarkButtons({ runRef, row, meId, canCandidate, canReject }: Props) {
  const id = useId();
  const m = useMarkVariant(runRef);
  const mine = meId === undefined ? undefined : row.marks.find((x) => markUserId(x) === meId)?.kind;
  const button = (kind: MarkKind, label: string, allowed: boolean, tone: string) => {
    const on = mine === kind;
    return (
      <button type="button" aria-pressed={on} aria-disabled={!allowed || m.isPending || undefined}
        aria-describedby={allowed ? undefined : `${id}-${kind}`} title={allowed ? `${on ? 'Clear' : 'Mark as'} ${kind}` : WHY[kind]}
        onClick={() => allowed && !m.isPending && m.mutate({ index: row.index, kind: on ? null : kind })}
        className={`rounded border px-1.5 text-[11px] leading-5 ${on ? tone : 'border-rule-strong text-ink-2 hover:bg-paper'} aria-disabled:cursor-not-allowed aria-disabled:opacity-45`}>
        {label}
      </button>
    );
  };
  return (
    <span className="inline-flex items-center gap-1">
      {button('candidate', 'Candidate', canCandidate, 'border-ok bg-ok text-white')}
      {button('rejected', 'Reject', canReject, 'border-bad bg-bad text-white')}
      {!canCandidate && <span id={`${id}-candidate`} className="sr-only">{WHY.candidate}</span>}
      {!canReject && <span id={`${id}-rejected`} className="sr-only">{WHY.rejected}</span>}
      {m.isError && <span role="alert" className="text-[11px] text-bad">{errorMessage(m.error)}</span>}
    </span>
  );
}
