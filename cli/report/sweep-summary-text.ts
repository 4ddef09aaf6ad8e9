// The printed summary of a sweep: counts per status, the best variants, why the others failed.
import type { SweepSummary } from '../../shared/sweep/summary';
import { num, table } from './text-table';

const FIG_UNIT: Record<string, string> = {
  peakTension: 'kN', peakCompression: 'kN', maxAbsForce: 'kN', maxDisplacement: 'm', spanOverDeflection: '',
};

/** Render a sweep summary for the terminal. */
export function sweepSummaryText(s: SweepSummary, meta: { study: string; out: string; seconds: number; startupSeconds?: number; workers?: number; interrupted: boolean; paramNames: string[] }): string {
  const out: string[] = [];
  const b = s.byStatus;
  out.push(`${meta.interrupted ? 'INTERRUPTED' : 'DONE'}  ${meta.study}: ${s.evaluated.toLocaleString('en-US')} variants in ${meta.seconds.toFixed(1)} s${meta.workers ? ` on ${meta.workers} worker(s)` : ''} (${Math.round(s.evaluated / Math.max(meta.seconds, 1e-3)).toLocaleString('en-US')} variants/s${meta.startupSeconds !== undefined ? `; start-up ${meta.startupSeconds.toFixed(1)} s` : ''})${s.filtered ? `, ${s.filtered.toLocaleString('en-US')} left out by filters` : ''}`);
  out.push(table(
    [{ head: 'status' }, { head: 'variants', right: true }, { head: 'share', right: true }],
    [
      ['determinate', b.determinate], ['indeterminate', b.indeterminate], ['unstable', b.unstable], ['failed (error)', b.error], ['critical forms (count met, unstable)', s.critical],
    ].map(([k, v]) => [String(k), (v as number).toLocaleString('en-US'), s.evaluated ? `${((100 * (v as number)) / s.evaluated).toFixed(1)} %` : '—']),
  ));
  if (s.design) {
    out.push('', `MEMBER DESIGN  ${s.design.sized.toLocaleString('en-US')} sized (every member passes), ${s.design.unsizable.toLocaleString('en-US')} unsizable, ${s.design.notSettled.toLocaleString('en-US')} not settled`);
  }
  if (s.best.length) {
    const { figure, sense } = s.objective;
    const unit = FIG_UNIT[figure] ? ` (${FIG_UNIT[figure]})` : '';
    out.push('', `BEST ${s.best.length} by ${sense} ${figure}${unit}`);
    const shownParams = meta.paramNames.filter((n) => new Set(s.best.map((e) => shown(e.params[n]))).size > 1);
    out.push(table(
      [{ head: '#' }, { head: 'id' }, ...shownParams.map((n) => ({ head: n, right: true })), { head: 'status' }, { head: `${figure}${unit}`, right: true }, { head: 'tension kN', right: true }, { head: 'compr. kN', right: true }, { head: 'span/defl.', right: true }, ...(s.design ? [{ head: 'weight kN', right: true }, { head: 'max util.', right: true }] : [])],
      s.best.map((e) => [String(e.index), e.id, ...shownParams.map((n) => shown(e.params[n])), e.status, num(e.value, figure === 'maxDisplacement' ? 4 : 1), num(e.peakTension, 1), num(e.peakCompression, 1), Number.isFinite(e.spanOverDeflection) ? num(e.spanOverDeflection, 0) : '—', ...(s.design ? [num(e.weight ?? NaN, 2), num(e.maxUtilisation ?? NaN, 3)] : [])]),
    ));
  }
  if (s.reasons.length) {
    out.push('', 'UNSTABLE OR FAILED, AND WHY');
    for (const r of s.reasons) {
      const ex = meta.paramNames.map((n) => `${n}=${shown(r.example.params[n])}`).join(' ');
      out.push(`  ${r.count.toLocaleString('en-US')} × ${r.status}: ${r.reason}`, `      e.g. #${r.example.index} ${r.example.id} (${ex})`);
    }
  }
  out.push('', `Results in ${meta.out}/ (variants.jsonl, variants.csv, summary.json; forces kN, lengths m).`);
  out.push('Preliminary study figures: connections, bracing, fatigue and vibration are not checked; review by a licensed engineer.');
  return out.join('\n') + '\n';
}

/** A parameter value for a table: six significant digits at most (the id names the exact variant; the files keep every digit). */
function shown(v: unknown): string {
  return typeof v === 'number' && Number.isFinite(v) && !Number.isInteger(v) ? String(Number(v.toPrecision(6))) : String(v);
}
