/** Number formatting for figures: significant digits, a real minus sign, no "-0". */

const MINUS = '\u2212';

/** `v` to `sig` significant digits (default 4, zeros kept so columns line up); "—" for non-finite. */
export function fmt(v: number | undefined | null, sig = 4): string {
  if (v === undefined || v === null || !Number.isFinite(v)) return '—';
  if (v === 0 || Math.abs(v) < 1e-12) return '0';
  const a = Math.abs(v);
  let s: string;
  if (a >= 1e6 || a < 1e-4) s = a.toExponential(sig - 1).replace(/\.?0+e/, 'e');
  else {
    const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(a)));
    s = a.toFixed(Math.min(digits, 10));
  }
  return v < 0 ? `${MINUS}${s}` : s;
}

/** Like `fmt` with an explicit sign on positive values: +85.71, −132.3. */
export function fmtSigned(v: number | undefined | null, sig = 4): string {
  const s = fmt(v, sig);
  return v !== undefined && v !== null && v > 0 && Number.isFinite(v) && s !== '0' ? `+${s}` : s;
}

/** Parse what `fmt` printed (tests and copy-paste): accepts the typographic minus. */
export function parseFigure(s: string): number {
  return Number(s.replace(MINUS, '-').replace('+', ''));
}

/** A length in the model's unit; metres are shown in millimetres when small (displacements). */
export function fmtSmallLength(v: number, unit: string): string {
  if (unit === 'm' && Math.abs(v) < 1) return `${fmt(v * 1000, 3)} mm`;
  return `${fmt(v, 3)} ${unit}`;
}
