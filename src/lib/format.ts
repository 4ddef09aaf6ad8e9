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

const pad = (n: number) => String(n).padStart(2, '0');

/** A timestamp as "2025-03-14 09:12" in local time; "—" when absent or unreadable. */
export function fmtWhen(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '—';
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())} ${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

/** Bytes as B, kB, MB (powers of 1000). */
export function fmtBytes(n: number): string {
  if (!Number.isFinite(n)) return '—';
  if (n < 1000) return `${n} B`;
  if (n < 1e6) return `${fmt(n / 1e3, 3)} kB`;
  return `${fmt(n / 1e6, 3)} MB`;
}

/** The first 8 characters of a commit hash. */
export function shortCommit(c: string | null | undefined): string {
  return c ? c.slice(0, 8) : '—';
}

/** A count with thousands separated as the CLI prints them: 120,000. */
export function fmtCount(n: number): string {
  return Math.round(n).toLocaleString('en-US');
}

/** A parameter or count as written in a study: 18, 1.25, 6 (no padding zeros); "—" for non-finite. */
export function fmtPlain(v: number | string | null | undefined): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'string') return v;
  if (!Number.isFinite(v)) return '—';
  const s = String(Number(v.toPrecision(6)));
  return v < 0 ? `\u2212${s.slice(1)}` : s;
}
