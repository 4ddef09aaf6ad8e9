/**
 * What the design-space charts show, kept in the page address so a view can be shared and the
 * back button works: x, y, colour (status or a figure), split (a parameter, as facets or one
 * trace per value), and the heatmap's two parameters and figure.
 */
import type { RunDetail } from '@/lib/run-types';
import { fieldsOf, objectiveField, type Field } from '@/lib/figures';

export interface ChartState {
  x: string;
  y: string;
  /** 'status' or a field key. */
  colour: string;
  /** A parameter name, or ''. */
  split: string;
  splitAs: 'facets' | 'traces';
  hx: string;
  hy: string;
  hz: string;
}

export const CHART_KEYS = ['x', 'y', 'colour', 'split', 'splitAs', 'hx', 'hy', 'hz'] as const;

function pick(fields: readonly Field[], wanted: string | null, fallback: string): string {
  return wanted && fields.some((f) => f.key === wanted) ? wanted : fallback;
}

/**
 * The state in `params`, with defaults from the run: the first numeric parameter against the
 * objective's figure. Axes, colour and bins take numeric fields only (the server charts those).
 */
export function chartStateOf(params: URLSearchParams, run: RunDetail): ChartState {
  const fields = fieldsOf(run).filter((f) => f.numeric);
  const numericParams = fields.filter((f) => f.kind === 'param' && f.numeric).map((f) => f.key);
  const firstParam = numericParams.includes('depth') ? 'depth' : (numericParams[0] ?? 'index');
  const objective = objectiveField(run);
  // The second axis of the heatmap: a parameter studies usually vary (span is mostly held fixed).
  const preferred = ['panels', 'rise', 'slope', 'ratio'].find((p) => p !== firstParam && numericParams.includes(p));
  const secondParam = preferred ?? numericParams.find((p) => p !== firstParam && p !== 'span') ?? numericParams.find((p) => p !== firstParam) ?? firstParam;
  const split = params.get('split');
  return {
    x: pick(fields, params.get('x'), firstParam),
    y: pick(fields, params.get('y'), objective),
    colour: params.get('colour') === 'status' ? 'status' : pick(fields, params.get('colour'), 'status'),
    split: split && run.paramNames.includes(split) ? split : '',
    splitAs: params.get('splitAs') === 'traces' ? 'traces' : 'facets',
    hx: pick(fields, params.get('hx'), firstParam),
    hy: pick(fields, params.get('hy'), secondParam),
    hz: pick(fields, params.get('hz'), objective),
  };
}
