/**
 * The columns of the variants table: the study's parameters, then the recorded figures. Which
 * are shown is the user's choice, kept in this browser (localStorage); the index and the actions
 * are always there.
 */
import type { RunDetail } from '@/lib/run-types';
import { FIGURES } from '@/lib/figures';

export interface Column {
  key: string;
  label: string;
  unit: string;
  numeric: boolean;
  /** The server sorts by it. */
  sortable: boolean;
  group: 'param' | 'figure' | 'other';
}

const SORTABLE_FIGURES = new Set(['status', 'k', 's', 'peakTension', 'peakCompression', 'maxDisplacement', 'spanOverDeflection', 'weight', 'maxUtilisation']);

const OTHER: Column[] = [
  { key: 'variantId', label: 'Variant id', unit: '', numeric: false, sortable: false, group: 'other' },
  { key: 'status', label: 'Status', unit: '', numeric: false, sortable: true, group: 'other' },
  { key: 'counts', label: 'j · m · r', unit: '', numeric: false, sortable: false, group: 'other' },
  { key: 'reason', label: 'Reason', unit: '', numeric: false, sortable: false, group: 'other' },
  { key: 'marks', label: 'Team marks', unit: '', numeric: false, sortable: false, group: 'other' },
];

/** Shown unless the user hides them. */
const HIDDEN_BY_DEFAULT = new Set(['variantId', 'counts', 'reason']);

/** Columns of a run; the server sorts by the parameters it stores in columns (the numeric ones). */
export function columnsOf(run: Pick<RunDetail, 'paramNames' | 'paramColumns'>): Column[] {
  const numeric = (p: string) => p in (run.paramColumns ?? {});
  const params = run.paramNames.map((p): Column => ({ key: `param:${p}`, label: p, unit: '', numeric: numeric(p), sortable: numeric(p), group: 'param' }));
  const figures = FIGURES.filter((f) => f.key !== 'index').map((f): Column => ({
    key: f.key, label: f.label, unit: f.unit, numeric: true, sortable: SORTABLE_FIGURES.has(f.key), group: 'figure',
  }));
  const [variantId, status, ...rest] = OTHER;
  return [variantId, ...params, status, ...figures, ...rest];
}

/** The field a column sorts and filters by (a parameter's own name). */
export const fieldOfColumn = (c: Column) => (c.group === 'param' ? c.key.slice(6) : c.key);

const KEY = 'panelpoint.variants.columns';

interface Choice {
  hidden: string[];
  shown: string[];
}

export function loadChoice(): Choice {
  try {
    const raw = JSON.parse(window.localStorage.getItem(KEY) ?? '{}') as Partial<Choice>;
    return { hidden: Array.isArray(raw.hidden) ? raw.hidden : [], shown: Array.isArray(raw.shown) ? raw.shown : [] };
  } catch {
    return { hidden: [], shown: [] };
  }
}

export function saveChoice(c: Choice): void {
  try {
    window.localStorage.setItem(KEY, JSON.stringify(c));
  } catch {
    // Storage refused (private window): the choice lasts for this page only.
  }
}

export const isVisible = (c: Choice, key: string) => (HIDDEN_BY_DEFAULT.has(key) ? c.shown.includes(key) : !c.hidden.includes(key));

/** The choice with `key` shown or hidden. */
export function toggled(c: Choice, key: string, visible: boolean): Choice {
  const drop = (l: string[]) => l.filter((k) => k !== key);
  if (HIDDEN_BY_DEFAULT.has(key)) return { ...c, shown: visible ? [...drop(c.shown), key] : drop(c.shown) };
  return { ...c, hidden: visible ? drop(c.hidden) : [...drop(c.hidden), key] };
}
