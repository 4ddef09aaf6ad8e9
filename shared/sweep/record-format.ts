/**
 * One variant as a line of JSON Lines and a row of CSV; both carry the same figures, rounded the
 * same way (forces to 1e-6 kN, displacements to 1e-9 m, ratios to 1e-3), so they agree exactly.
 */
import type { VariantRecord } from './evaluate';
import type { SummaryInput } from './summary';

/** The rounding of every stored figure: forces to 1e-6 kN, displacements to 1e-9 m, ratios to 1e-3. */
export const roundForce = (v: number) => Math.round(v * 1e6) / 1e6;
export const roundDisp = (v: number) => Math.round(v * 1e9) / 1e9;
export const roundRatio = (v: number) => Math.round(v * 1e3) / 1e3;
const r6 = (v: number) => (Number.isFinite(v) ? String(roundForce(v)) : 'null');
const r9 = (v: number) => (Number.isFinite(v) ? String(roundDisp(v)) : 'null');
const r3 = (v: number) => (Number.isFinite(v) ? String(roundRatio(v)) : 'null');

/** The figures of a record as they are stored (rounded), for the summary. */
export function storedFigures(r: VariantRecord): SummaryInput {
  const stable = r.status === 'determinate' || r.status === 'indeterminate';
  return {
    index: r.index, id: r.id, params: r.params, status: r.status, critical: r.critical, reason: r.reason,
    peakTension: stable && r.peakTensionMember ? roundForce(r.peakTension) : NaN,
    peakCompression: stable && r.peakCompressionMember ? roundForce(r.peakCompression) : NaN,
    maxDisplacement: stable && r.maxDisplacementNode ? roundDisp(r.maxDisplacement) : NaN,
    spanOverDeflection: stable && Number.isFinite(r.spanOverDeflection) ? roundRatio(r.spanOverDeflection) : NaN,
  };
}
const q = (s: string) => JSON.stringify(s);
const value = (v: number | string) => (typeof v === 'number' ? (Number.isFinite(v) ? String(v) : 'null') : q(v));

/** CSV columns, after `index,id` and the parameters. */
export const FIGURE_COLUMNS = [
  'status', 'joints', 'members', 'reactions', 'k', 's', 'critical',
  'peakTension_kN', 'peakTensionMember', 'peakTensionCombination',
  'peakCompression_kN', 'peakCompressionMember', 'peakCompressionCombination',
  'maxDisplacement_m', 'maxDisplacementNode', 'maxDisplacementCombination',
  'spanOverDeflection', 'reason',
] as const;

/** The CSV header line (with newline). */
export function csvHeader(paramNames: readonly string[]): string {
  return ['index', 'id', ...paramNames, ...FIGURE_COLUMNS].join(',') + '\n';
}

function csvText(s: string): string {
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** One CSV row (with newline); empty cells where a figure does not exist. */
export function csvRow(r: VariantRecord, paramNames: readonly string[]): string {
  let line = `${r.index},${r.id}`;
  for (const n of paramNames) {
    const v = r.params[n];
    line += ',' + (typeof v === 'number' ? String(v) : csvText(String(v ?? '')));
  }
  const blank = (s: string) => (s === 'null' ? '' : s);
  const stable = r.status === 'determinate' || r.status === 'indeterminate';
  line += `,${r.status},${r.joints},${r.members},${r.reactions},${r.k},${r.s},${r.critical}`;
  line += stable ? `,${r6(r.peakTension)},${r.peakTensionMember},${r.peakTensionCombination}` : ',,,';
  line += stable ? `,${r6(r.peakCompression)},${r.peakCompressionMember},${r.peakCompressionCombination}` : ',,,';
  line += stable ? `,${blank(r9(r.maxDisplacement))},${r.maxDisplacementNode},${r.maxDisplacementCombination}` : ',,,';
  line += `,${stable ? blank(r3(r.spanOverDeflection)) : ''},${csvText(r.reason)}\n`;
  return line;
}

/** One JSON line (with newline). Unstable and failed variants carry null peaks and a reason. */
export function jsonLine(r: VariantRecord, paramNames: readonly string[]): string {
  let params = '';
  for (let i = 0; i < paramNames.length; i++) params += `${i ? ',' : ''}${q(paramNames[i])}:${value(r.params[paramNames[i]])}`;
  const stable = r.status === 'determinate' || r.status === 'indeterminate';
  const peak = (v: string, m: string, c: string, key = 'member') => (stable && m ? `{"value":${v},"${key}":${q(m)},"combination":${q(c)}}` : 'null');
  return `{"index":${r.index},"id":"${r.id}","params":{${params}},"status":"${r.status}","joints":${r.joints},"members":${r.members},"reactions":${r.reactions},"k":${r.k},"s":${r.s},"critical":${r.critical}` +
    `,"peakTension":${peak(r6(r.peakTension), r.peakTensionMember, r.peakTensionCombination)}` +
    `,"peakCompression":${peak(r6(r.peakCompression), r.peakCompressionMember, r.peakCompressionCombination)}` +
    `,"maxDisplacement":${peak(r9(r.maxDisplacement), r.maxDisplacementNode, r.maxDisplacementCombination, 'node')}` +
    `,"spanOverDeflection":${stable ? r3(r.spanOverDeflection) : 'null'},"reason":${r.reason ? q(r.reason) : 'null'}}\n`;
}
