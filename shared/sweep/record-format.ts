/**
 * One variant as a line of JSON Lines and a row of CSV; both carry the same figures, rounded the
 * same way (forces to 1e-6 kN, displacements to 1e-9 m, ratios to 1e-3), so they agree exactly.
 */
import type { VariantRecord } from './evaluate';
import type { DesignFigures } from './evaluate-design';
import type { SummaryInput } from './summary';

/** The rounding of every stored figure: forces to 1e-6 kN, displacements to 1e-9 m, ratios to 1e-3. */
export const roundForce = (v: number) => Math.round(v * 1e6) / 1e6;
export const roundDisp = (v: number) => Math.round(v * 1e9) / 1e9;
export const roundRatio = (v: number) => Math.round(v * 1e3) / 1e3;
const r6 = (v: number) => (Number.isFinite(v) ? String(roundForce(v)) : 'null');
const r9 = (v: number) => (Number.isFinite(v) ? String(roundDisp(v)) : 'null');
const r3 = (v: number) => (Number.isFinite(v) ? String(roundRatio(v)) : 'null');

/**
 * The figures of a record as they are stored (rounded), for the summary.
 * @param out - filled and returned when given (a sweep reuses one: the summary copies what it keeps)
 */
export function storedFigures(r: VariantRecord, paramNames: readonly string[], out?: SummaryInput): SummaryInput {
  const stable = r.status === 'determinate' || r.status === 'indeterminate';
  void paramNames;
  const o = out ?? ({} as SummaryInput);
  o.index = r.index; o.id = r.id; o.params = r.params; o.status = r.status; o.critical = r.critical; o.reason = r.reason;
  o.peakTension = stable && r.peakTensionMember ? roundForce(r.peakTension) : NaN;
  o.peakCompression = stable && r.peakCompressionMember ? roundForce(r.peakCompression) : NaN;
  o.maxDisplacement = stable && r.maxDisplacementNode ? roundDisp(r.maxDisplacement) : NaN;
  o.spanOverDeflection = stable && Number.isFinite(r.spanOverDeflection) ? roundRatio(r.spanOverDeflection) : NaN;
  o.designStatus = stable ? r.design.status : '';
  o.weight = stable && r.design.status && Number.isFinite(r.design.weight) ? roundRatio(r.design.weight) : NaN;
  o.maxUtilisation = stable && r.design.status && Number.isFinite(r.design.maxUtilisation) ? Math.round(r.design.maxUtilisation * 1e4) / 1e4 : NaN;
  o.deflectionOk = stable && r.design.status ? r.design.deflectionOk : undefined;
  return o;
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

/** CSV columns of member design, after the figures, when a study sizes members. */
export const DESIGN_COLUMNS = [
  'design', 'weight_kN', 'mass_kg', 'maxUtilisation', 'maxUtilisationMember', 'governingCheck', 'governingCombination', 'deflectionOk', 'sections', 'designReason',
] as const;

/** The CSV header line (with newline). @param design - the study sizes members */
export function csvHeader(paramNames: readonly string[], design = false): string {
  return ['index', 'id', ...paramNames, ...FIGURE_COLUMNS, ...(design ? DESIGN_COLUMNS : [])].join(',') + '\n';
}

/** A CSV cell: quoted (with doubled quotes) when it holds a quote, comma or line break. */
export function csvText(s: string): string {
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Both lines of one record, each ending in a newline. */
export interface FormattedRecord { json: string; csv: string }

// Ids of members, joints and combinations repeat across millions of lines: quote each once.
const quoteCache = new Map<string, string>();
function qc(s: string): string {
  let v = quoteCache.get(s);
  if (v === undefined) {
    v = JSON.stringify(s);
    if (quoteCache.size < 65536) quoteCache.set(s, v);
  }
  return v;
}

/**
 * Format a record as a JSON line and a CSV row at once, converting each number to text once.
 * Unstable and failed variants carry null peaks (empty CSV cells) and a reason.
 * @param out - reused between calls
 */
export function formatRecord(r: VariantRecord, paramNames: readonly string[], out: FormattedRecord, design = false): FormattedRecord {
  let jp = '';
  let cp = '';
  for (let i = 0; i < paramNames.length; i++) {
    const v = r.params[paramNames[i]];
    jp += `${i ? ',' : ''}${qc(paramNames[i])}:${value(v)}`;
    cp += ',' + (typeof v === 'number' ? String(v) : csvText(String(v ?? '')));
  }
  const stable = r.status === 'determinate' || r.status === 'indeterminate';
  const head = `${r.status},${r.joints},${r.members},${r.reactions},${r.k},${r.s},${r.critical}`;
  let json = `{"index":${r.index},"id":"${r.id}","params":{${jp}},"status":"${r.status}","joints":${r.joints},"members":${r.members},"reactions":${r.reactions},"k":${r.k},"s":${r.s},"critical":${r.critical}`;
  let csv = `${r.index},${r.id}${cp},${head}`;
  json += peakJson('peakTension', stable, r6(r.peakTension), r.peakTensionMember, r.peakTensionCombination, 'member');
  json += peakJson('peakCompression', stable, r6(r.peakCompression), r.peakCompressionMember, r.peakCompressionCombination, 'member');
  json += peakJson('maxDisplacement', stable, r9(r.maxDisplacement), r.maxDisplacementNode, r.maxDisplacementCombination, 'node');
  csv += peakCsv(stable, r6(r.peakTension), r.peakTensionMember, r.peakTensionCombination);
  csv += peakCsv(stable, r6(r.peakCompression), r.peakCompressionMember, r.peakCompressionCombination);
  csv += peakCsv(stable, r9(r.maxDisplacement), r.maxDisplacementNode, r.maxDisplacementCombination);
  const ratio = stable && Number.isFinite(r.spanOverDeflection) ? r3(r.spanOverDeflection) : 'null';
  json += `,"spanOverDeflection":${ratio},"reason":${r.reason ? q(r.reason) : 'null'}`;
  csv += `,${ratio === 'null' ? '' : ratio},${csvText(r.reason)}`;
  if (design) {
    const d = formatDesignPart(r.design);
    json += d.json;
    csv += d.csv;
  }
  json += '}\n';
  csv += '\n';
  out.json = json;
  out.csv = csv;
  return out;
}

/** The member design part of a record: JSON (after a comma) and CSV cells (each after a comma). */
export function formatDesignPart(d: DesignFigures): FormattedRecord {
  if (d.status && d.status !== 'analysis-failed') {
    const w = r3(d.weight), mass = r3(d.mass), u = String(Math.round(d.maxUtilisation * 1e4) / 1e4);
    const ok = d.deflectionOk === undefined ? 'null' : String(d.deflectionOk);
    return {
      json: `,"design":{"status":"${d.status}","weight":${w},"mass":${mass},"maxUtilisation":${u},"member":${qc(d.maxUtilisationMember)},"check":${qc(d.governingCheck)},"combination":${qc(d.governingCombination)},"deflectionOk":${ok},"sections":${q(d.sections)},"reason":${d.reason ? q(d.reason) : 'null'}}`,
      csv: `,${d.status},${w},${mass},${u},${d.maxUtilisationMember},${csvText(d.governingCheck)},${d.governingCombination},${ok === 'null' ? '' : ok},${csvText(d.sections)},${csvText(d.reason)}`,
    };
  }
  return { json: ',"design":null', csv: ',,,,,,,,,,' };
}

function peakJson(key: string, stable: boolean, v: string, m: string, c: string, who: string): string {
  return stable && m ? `,"${key}":{"value":${v},"${who}":${qc(m)},"combination":${qc(c)}}` : `,"${key}":null`;
}

function peakCsv(stable: boolean, v: string, m: string, c: string): string {
  return stable && m ? `,${v},${m},${c}` : ',,,';
}

/** One CSV row (see formatRecord). */
export function csvRow(r: VariantRecord, paramNames: readonly string[]): string {
  return formatRecord(r, paramNames, { json: '', csv: '' }).csv;
}

/** One JSON line (see formatRecord). */
export function jsonLine(r: VariantRecord, paramNames: readonly string[]): string {
  return formatRecord(r, paramNames, { json: '', csv: '' }).json;
}
