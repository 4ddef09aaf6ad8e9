// Plain aligned tables for terminal reports: left-aligned text, right-aligned numbers.

export interface Column {
  head: string;
  /** Right-align (numbers). */
  right?: boolean;
}

/** Render rows under their heads with two spaces between columns and a rule under the heads. */
export function table(columns: Column[], rows: string[][], indent = '  '): string {
  const width = columns.map((c, k) => Math.max(c.head.length, ...rows.map((r) => (r[k] ?? '').length)));
  const cell = (text: string, k: number) => (columns[k].right ? text.padStart(width[k]) : text.padEnd(width[k]));
  const line = (cells: string[]) => indent + cells.map((t, k) => cell(t, k)).join('  ').trimEnd();
  return [line(columns.map((c) => c.head)), indent + width.map((w) => '─'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

/** Format a number with a fixed count of decimals, a true minus sign, and no "-0". */
export function num(v: number, decimals: number, signed = false): string {
  if (!Number.isFinite(v)) return '—';
  const r = Number(v.toFixed(decimals));
  const text = Math.abs(r).toFixed(decimals);
  if (r < 0) return `−${text}`;
  return signed && r > 0 ? `+${text}` : text;
}
