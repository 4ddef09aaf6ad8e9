/** The run summary (shared/sweep/summary.ts) of a fake run, from its columns: counts, best by the objective, reasons. */
import type { SweepSummary, ObjectiveFigure } from '@shared/sweep/summary';
import { numberOf, statusOf, type RunStore } from './run-store';

const cache = new WeakMap<RunStore, SweepSummary>();

export function demoSummary(s: RunStore, body: unknown): SweepSummary {
  const hit = cache.get(s);
  if (hit) return hit;
  const o = (body as { objective?: { minimize?: string; maximize?: string } }).objective ?? { minimize: 'maxAbsForce' };
  const figure = (o.minimize ?? o.maximize ?? 'maxAbsForce') as ObjectiveFigure;
  const sense = o.maximize ? 'maximize' : 'minimize';
  const byStatus = { determinate: 0, indeterminate: 0, unstable: 0, error: 0 };
  const reasons = new Map<string, SweepSummary['reasons'][number]>();
  let critical = 0;
  const ranked: { j: number; value: number }[] = [];
  for (let j = 0; j < s.n; j++) {
    const st = statusOf(s, j);
    byStatus[st]++;
    critical += s.critical[j];
    if (st === 'unstable' || st === 'error') {
      const k = `${st}|${s.reason[j]}`;
      const r = reasons.get(k);
      if (r) r.count++;
      else reasons.set(k, { status: st, reason: s.reason[j], count: 1, example: { index: s.index[j], id: s.variantId[j], params: {} } });
      continue;
    }
    const value = figure === 'maxAbsForce'
      ? Math.max(numberOf(s, 'peakTension', j), -numberOf(s, 'peakCompression', j))
      : figure === 'peakCompression' ? -numberOf(s, figure, j) : numberOf(s, figure as string, j);
    if (Number.isFinite(value)) ranked.push({ j, value });
  }
  ranked.sort((a, b) => (sense === 'minimize' ? a.value - b.value : b.value - a.value));
  const summary: SweepSummary = {
    objective: { figure, sense }, evaluated: s.n, filtered: s.spaceSize - s.n, byStatus, critical,
    best: ranked.slice(0, 10).map(({ j, value }) => ({
      index: s.index[j], id: s.variantId[j], params: {}, status: statusOf(s, j), value,
      peakTension: numberOf(s, 'peakTension', j), peakCompression: numberOf(s, 'peakCompression', j),
      maxDisplacement: numberOf(s, 'maxDisplacement', j), spanOverDeflection: numberOf(s, 'spanOverDeflection', j),
    })),
    reasons: [...reasons.values()],
  };
  cache.set(s, summary);
  return summary;
}
