/** A variant's status as a small coloured label; critical forms say so. */
import type { VariantStatus } from '@/lib/run-types';
import { STATUS_LABEL } from '@/lib/figures';

const TONE: Record<VariantStatus, string> = {
  determinate: 'border-ok/50 text-ok',
  indeterminate: 'border-note/50 text-note',
  unstable: 'border-bad/50 text-bad',
  error: 'border-warn/60 text-warn',
};

const SHORT: Record<VariantStatus, string> = { determinate: 'determinate', indeterminate: 'indeterminate', unstable: 'unstable', error: 'failed' };

/** `short` for dense tables: one word ("critical" for a critical form). */
export function StatusPill({ status, critical, short }: { status: VariantStatus; critical?: boolean; short?: boolean }) {
  const text = short ? (critical ? 'critical' : SHORT[status] ?? status) : `${STATUS_LABEL[status] ?? status}${critical ? ' · critical' : ''}`;
  return (
    <span title={short ? `${STATUS_LABEL[status] ?? status}${critical ? ', a critical form' : ''}` : undefined}
      className={`inline-block whitespace-nowrap rounded-sm border px-1 text-[11px] leading-4 ${TONE[status] ?? 'border-rule text-ink-2'}`}>
      {text}
    </span>
  );
}

/** A check's outcome: pass, drift, invalid. */
export function CheckPill({ status }: { status: string }) {
  const tone = status === 'pass' ? 'border-ok/50 text-ok' : status === 'drift' ? 'border-warn/60 text-warn' : 'border-bad/50 text-bad';
  return <span className={`num inline-block rounded-sm border px-1 text-[11px] uppercase leading-4 ${tone}`}>{status}</span>;
}
