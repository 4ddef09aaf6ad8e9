/**
 * The fields of a run's variants that pages chart, sort and filter: the recorded figures (with
 * their units as the CLI stores them: forces and weight kN, displacement m) and the study's
 * parameters. One catalogue for the charts, the table and the comparison.
 */
import type { RunDetail, VariantRow, VariantStatus } from './run-types';
import { fmt } from './format';

export type Better = 'low' | 'high' | 'abs-low';

export interface Field {
  key: string;
  label: string;
  /** Unit as stored; '' for counts and ratios. */
  unit: string;
  kind: 'figure' | 'param';
  /** Numeric: can be charted on a continuous axis, ranged and binned. */
  numeric: boolean;
  /** Which way is better, when a comparison may say so. */
  better?: Better;
}

export const FIGURES: readonly Field[] = [
  { key: 'index', label: 'Index', unit: '', kind: 'figure', numeric: true },
  { key: 'k', label: 'Mechanisms k', unit: '', kind: 'figure', numeric: true, better: 'low' },
  { key: 's', label: 'Self-stress s', unit: '', kind: 'figure', numeric: true },
  { key: 'peakTension', label: 'Peak tension', unit: 'kN', kind: 'figure', numeric: true, better: 'low' },
  { key: 'peakCompression', label: 'Peak compression', unit: 'kN', kind: 'figure', numeric: true, better: 'abs-low' },
  { key: 'maxDisplacement', label: 'Largest displacement', unit: 'm', kind: 'figure', numeric: true, better: 'low' },
  { key: 'spanOverDeflection', label: 'Span / deflection', unit: '', kind: 'figure', numeric: true, better: 'high' },
  { key: 'weight', label: 'Weight', unit: 'kN', kind: 'figure', numeric: true, better: 'low' },
  { key: 'maxUtilisation', label: 'Utilisation', unit: '', kind: 'figure', numeric: true, better: 'low' },
];

/** Figures and parameters of a run; parameters the server bins on (paramColumns) are numeric. */
export function fieldsOf(run: Pick<RunDetail, 'paramNames' | 'paramColumns'>): Field[] {
  const params = run.paramNames.map((name): Field => ({
    key: name, label: name, unit: '', kind: 'param', numeric: name in (run.paramColumns ?? {}),
  }));
  return [...params, ...FIGURES];
}

export function fieldOf(fields: readonly Field[], key: string): Field | undefined {
  return fields.find((f) => f.key === key);
}

/** "Weight (kN)", "depth". */
export function fieldLabel(f: Field | undefined, key = ''): string {
  if (!f) return key;
  return f.unit ? `${f.label} (${f.unit})` : f.label;
}

/** The value of a field on a row: a figure or a parameter. */
export function valueOf(row: VariantRow, key: string): number | string | null {
  if (key in row.params) return row.params[key];
  const v = (row as unknown as Record<string, unknown>)[key];
  return typeof v === 'number' || typeof v === 'string' ? v : null;
}

/** A value for a cell: figures with 4 significant digits, options as they are. */
export function showValue(v: number | string | null | undefined): string {
  if (v === null || v === undefined) return '—';
  return typeof v === 'number' ? fmt(v) : v;
}

export const STATUSES: readonly VariantStatus[] = ['determinate', 'indeterminate', 'unstable', 'error'];

export const STATUS_LABEL: Record<VariantStatus, string> = {
  determinate: 'Stable, determinate',
  indeterminate: 'Stable, indeterminate',
  unstable: 'Unstable',
  error: 'Failed',
};

/** Status colours, from the app palette (styles.css): ok, note, bad, warn; critical forms in bad. */
export const STATUS_COLOUR: Record<VariantStatus | 'critical', string> = {
  determinate: '#2f6f4e',
  indeterminate: '#3b6280',
  unstable: '#a3233a',
  critical: '#a3233a',
  error: '#946200',
};

/** The objective's figure as a field to chart first. */
export function objectiveField(run: Pick<RunDetail, 'summary'>): string {
  const f = run.summary?.objective.figure as string | undefined;
  if (f === 'maxAbsForce') return 'peakCompression';
  return f && FIGURES.some((x) => x.key === f) ? f : 'peakCompression';
}
