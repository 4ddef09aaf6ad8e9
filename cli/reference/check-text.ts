// Text of `panelpoint check`: the table of cases, the list of figures out of tolerance for each
// drifted case (also the body of its JUnit <failure>), and the problems of invalid cases.
import type { CaseComparison, FigureCheck } from '../../shared/reference/compare';
import { table } from '../report/text-table';

/** The outcome of one case file. */
export interface CaseOutcome {
  file: string;
  /** Folder the case was found in (its JUnit suite). */
  suite: string;
  name: string;
  status: 'pass' | 'drift' | 'invalid' | 'error';
  comparison?: CaseComparison;
  /** Model units, for the figures. */
  units?: { length: string; force: string };
  /** Why an invalid case does not load, or why a recomputation failed. */
  problems?: string;
  seconds: number;
}

/** Figures listed per drifted case. */
export const MAX_LISTED = 20;

const LABEL: Record<CaseOutcome['status'], string> = { pass: 'pass', drift: 'DRIFT', invalid: 'invalid', error: 'ERROR' };

/** A number as written in a case: up to 10 significant digits. */
export function figureNumber(v: number): string {
  return Number.isFinite(v) ? String(Number(v.toPrecision(10))) : String(v);
}

const amount = (v: number | undefined, unit: string) =>
  v === undefined ? '—' : Number.isFinite(v) ? `${v === 0 ? '0' : v.toExponential(2)} ${unit}` : String(v);

function unitOf(f: FigureCheck, units: CaseOutcome['units']): string {
  if (f.kind === 'force') return units?.force ?? '';
  if (f.kind === 'displacement') return units?.length ?? '';
  return '';
}

/** The want, got, difference and allowed cells of a figure. */
export function figureCells(f: FigureCheck, units: CaseOutcome['units']): [string, string, string, string] {
  const unit = unitOf(f, units);
  const show = (v: FigureCheck['want'] | undefined) =>
    v === undefined ? 'missing' : typeof v === 'number' ? `${figureNumber(v)}${unit ? ` ${unit}` : ''}` : String(v);
  if (f.kind === 'exact') return [show(f.want), f.got === undefined ? 'missing' : show(f.got), '—', 'exact'];
  return [show(f.want), show(f.got), amount(f.difference, unit), amount(f.allowed, unit)];
}

/** The summary table: one row per case. */
export function casesTable(outcomes: readonly CaseOutcome[]): string {
  const rows = outcomes.map((o) => {
    const w = o.comparison?.worst;
    const cells = w ? figureCells(w, o.units) : ['—', '—', '—', '—'];
    return [o.name, LABEL[o.status], w ? w.figure : o.status === 'pass' ? '(classification only)' : '—', ...cells, o.file];
  });
  return table(
    [{ head: 'case' }, { head: 'status' }, { head: 'worst figure' }, { head: 'want', right: true }, { head: 'got', right: true }, { head: 'difference', right: true }, { head: 'allowed', right: true }, { head: 'file' }],
    rows,
  );
}

/** Every figure out of tolerance in a drifted case (up to MAX_LISTED), with the amounts. */
export function driftText(o: CaseOutcome): string {
  const c = o.comparison;
  if (!c) return '';
  const n = c.failures.length;
  const head = `${o.name} (${o.file}): ${n} of ${c.compared} figure${c.compared === 1 ? '' : 's'} out of tolerance`;
  const rows = c.failures.slice(0, MAX_LISTED).map((f) => [f.figure, ...figureCells(f, o.units), f.note ?? '']);
  const body = table(
    [{ head: 'figure' }, { head: 'want', right: true }, { head: 'got', right: true }, { head: 'difference', right: true }, { head: 'allowed', right: true }, { head: 'note' }],
    rows,
  );
  return [head, body, ...(n > MAX_LISTED ? [`  ... and ${n - MAX_LISTED} more`] : [])].join('\n');
}

/** Problems of an invalid or failed case, indented under its file. */
export function problemText(o: CaseOutcome): string {
  const what = o.status === 'invalid' ? 'invalid reference case' : 'recomputation failed';
  return `${o.file}: ${what}\n${(o.problems ?? '').replace(/^/gm, '  ')}`;
}

/** The whole report: table, then details of every case that did not pass, then the totals. */
export function checkReport(outcomes: readonly CaseOutcome[], missing: readonly string[]): string {
  const parts: string[] = [];
  if (outcomes.length) parts.push(casesTable(outcomes));
  for (const o of outcomes) {
    if (o.status === 'drift') parts.push(driftText(o));
    else if (o.status === 'invalid' || o.status === 'error') parts.push(problemText(o));
    for (const note of o.comparison?.notes ?? []) parts.push(`note: ${o.name}: ${note}`);
  }
  for (const p of missing) parts.push(`${p}: path not found`);
  const n = (s: CaseOutcome['status']) => outcomes.filter((o) => o.status === s).length;
  parts.push(`reference cases: ${n('pass')} passed, ${n('drift')} drifted, ${n('invalid')} invalid, ${n('error')} failed to recompute (of ${outcomes.length})`);
  return parts.join('\n\n') + '\n';
}
