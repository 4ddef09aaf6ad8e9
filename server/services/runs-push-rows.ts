/**
 * From pushed JSONL records to `variants` rows: each `variants` line checked against the record
 * schema (paths name the line and the row), indices kept in order and inside the shard's range,
 * and the numeric parameters copied into p1..p6 for the charts.
 */
import type { CreationAttributes } from 'sequelize';
import { compileSchema } from '../../shared/schemas/validate';
import type { ParamColumns } from '../db/models/run.model';
import { PARAM_COLUMNS, type Variant } from '../db/models/variant.model';
import type { ErrorDetail } from '../http/http-error';
import { HttpError } from '../http/http-error';
import { VariantRecordLine, VariantsLine } from '../schemas/runs';

export type VariantRow = CreationAttributes<Variant>;

const checkLine = compileSchema(VariantsLine);
const checkRecord = compileSchema(VariantRecordLine);
/** Most problems listed in one error answer. */
const MAX_DETAILS = 20;
/** Longest reason stored (the column is VARCHAR(500)). */
export const REASON_LENGTH = 500;

/**
 * Map the first six numeric parameters, in paramNames order, onto p1..p6.
 * @param numeric - whether a parameter holds numbers (from the family's parameter specs)
 */
export function paramColumnsFor(paramNames: readonly string[], numeric: (name: string) => boolean): ParamColumns {
  const out: ParamColumns = {};
  paramNames.filter(numeric).slice(0, PARAM_COLUMNS.length).forEach((name, i) => (out[name] = PARAM_COLUMNS[i]));
  return out;
}

const invalid = (line: number, details: ErrorDetail[]) =>
  new HttpError(422, 'invalid-variants', `Line ${line} of the push holds variants that are not valid; nothing was stored.`, details.slice(0, MAX_DETAILS));

const figure = (v: number | null | { value: number } | undefined): number | null =>
  v === null || v === undefined ? null : typeof v === 'number' ? v : v.value;

/** Where the rows of one push may go, and what came before. */
export interface RowContext {
  runPk: number;
  paramColumns: ParamColumns;
  range: { start: number; end: number };
  /** Index of the last row of this push so far (−1 at the start). */
  lastIndex: number;
}

/**
 * Check one `variants` line and turn its records into rows; `ctx.lastIndex` moves on.
 * @param keepAfter - rows with an index ≤ this are already stored (a resumed shard) and skipped
 * @returns the rows to insert, and how many records the line held
 */
export function rowsOfLine(data: unknown, line: number, ctx: RowContext, keepAfter: number): { rows: VariantRow[]; records: number } {
  const shape = checkLine(data);
  if (shape.length) throw invalid(line, shape.map((i) => ({ path: `line ${line} ${i.path}`.trim(), message: i.message })));
  const records = (data as VariantsLine).rows;
  const details: ErrorDetail[] = [];
  const rows: VariantRow[] = [];
  for (let i = 0; i < records.length && details.length < MAX_DETAILS; i++) {
    const issues = checkRecord(records[i]);
    if (issues.length) {
      for (const x of issues) details.push({ path: `line ${line} rows[${i}]${x.path ? '.' + x.path : ''}`, message: x.message });
      continue;
    }
    const r = records[i] as VariantRecordLine;
    if (r.index <= ctx.lastIndex || r.index < ctx.range.start || r.index >= ctx.range.end) {
      details.push({ path: `line ${line} rows[${i}].index`, message: `must be above ${Math.max(ctx.lastIndex, ctx.range.start - 1)} and below ${ctx.range.end} (rows in index order, inside the shard's range)` });
      continue;
    }
    ctx.lastIndex = r.index;
    if (r.index > keepAfter) rows.push(toRow(r, ctx));
  }
  if (details.length) throw invalid(line, details);
  return { rows, records: records.length };
}

function toRow(r: VariantRecordLine, ctx: RowContext): VariantRow {
  const row: VariantRow = {
    runPk: ctx.runPk, index: r.index, variantId: r.id, params: r.params as Record<string, number | string>, status: r.status,
    joints: r.joints, members: r.members, reactions: r.reactions, k: r.k, s: r.s, critical: r.critical,
    peakTension: r.peakTension?.value ?? null, peakTensionMember: r.peakTension?.member ?? null,
    peakCompression: r.peakCompression?.value ?? null, peakCompressionMember: r.peakCompression?.member ?? null,
    maxDisplacement: r.maxDisplacement?.value ?? null, spanOverDeflection: r.spanOverDeflection,
    // A sized sweep nests its design figures under `design` (shared/sweep/record-format.ts).
    weight: figure(r.design?.weight ?? r.weight), maxUtilisation: figure(r.design?.maxUtilisation ?? r.maxUtilisation),
    reason: r.reason === null ? null : r.reason.slice(0, REASON_LENGTH),
    p1: null, p2: null, p3: null, p4: null, p5: null, p6: null,
  };
  for (const [name, col] of Object.entries(ctx.paramColumns)) {
    const v = r.params[name];
    if (col && typeof v === 'number') row[col] = v;
  }
  return row;
}
