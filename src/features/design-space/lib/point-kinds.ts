/** How a variant is drawn: by status, critical forms apart, each with its own marker and colour. */
import type { VariantStatus } from '@/lib/run-types';
import { STATUS_COLOUR } from '@/lib/figures';

export type PointKind = 'determinate' | 'indeterminate' | 'unstable' | 'critical' | 'error';

export const KINDS: readonly PointKind[] = ['determinate', 'indeterminate', 'unstable', 'critical', 'error'];

export const KIND_LABEL: Record<PointKind, string> = {
  determinate: 'Stable, determinate',
  indeterminate: 'Stable, indeterminate',
  unstable: 'Unstable',
  critical: 'Critical form (count met, still a mechanism)',
  error: 'Failed',
};

/** Rows of the strip under the chart, for variants without a y value. */
export const STRIP_ROW: Record<PointKind, string> = {
  determinate: 'no value', indeterminate: 'no value', unstable: 'unstable', critical: 'critical', error: 'failed',
};

/** Marker per kind: stable ones are filled dots; the others keep shapes that read without colour. */
export const KIND_MARKER: Record<PointKind, { symbol: string; size: number; color: string; opacity: number }> = {
  determinate: { symbol: 'circle', size: 5, color: STATUS_COLOUR.determinate, opacity: 0.7 },
  indeterminate: { symbol: 'circle', size: 5, color: STATUS_COLOUR.indeterminate, opacity: 0.7 },
  unstable: { symbol: 'x', size: 6, color: STATUS_COLOUR.unstable, opacity: 0.85 },
  critical: { symbol: 'diamond-open', size: 7, color: STATUS_COLOUR.critical, opacity: 1 },
  error: { symbol: 'triangle-down-open', size: 7, color: STATUS_COLOUR.error, opacity: 1 },
};

export function kindOf(status: VariantStatus, critical: boolean): PointKind {
  if (critical) return 'critical';
  return status === 'determinate' || status === 'indeterminate' || status === 'unstable' ? status : 'error';
}

export const isStable = (k: PointKind) => k === 'determinate' || k === 'indeterminate';
