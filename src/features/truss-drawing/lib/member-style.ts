/** Stroke of a member: colour AND line style by force sign, width by |force| relative to the peak. */
import { PALETTE } from './palette';
import type { ForceSign } from './scene';

export interface MemberStroke {
  stroke: string;
  /** Model units. */
  strokeWidth: number;
  /** Model units; undefined for a solid line. */
  strokeDasharray?: string;
}

/** Nominal-pixel widths: zero-force hairline, and the range of loaded members. */
const W_ZERO = 1;
const W_MIN = 1.5;
const W_MAX = 6.5;
const W_UNKNOWN = 2;

export function memberStroke(sign: ForceSign, force: number | undefined, peak: number, u: number): MemberStroke {
  if (sign === 'unknown') return { stroke: PALETTE.neutral, strokeWidth: W_UNKNOWN * u };
  if (sign === 'zero') return { stroke: PALETTE.zero, strokeWidth: W_ZERO * u };
  const w = W_MIN + (W_MAX - W_MIN) * (peak > 0 ? Math.min(1, Math.abs(force ?? 0) / peak) : 0);
  if (sign === 'tension') return { stroke: PALETTE.tension, strokeWidth: w * u };
  // Dashes grow with the stroke so thick members still read as dashed.
  const dash = (5 + 1.4 * w) * u;
  const gap = (3 + 0.7 * w) * u;
  return { stroke: PALETTE.compression, strokeWidth: w * u, strokeDasharray: `${round(dash)} ${round(gap)}` };
}

const round = (v: number) => Number(v.toPrecision(4));
