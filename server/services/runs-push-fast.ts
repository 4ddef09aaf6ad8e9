/**
 * The fast path of a push: a `variants` line read from its bytes straight into insert values, in
 * the layout the CLI writes (shared/sweep/record-format.ts: keys in that order, no whitespace, the
 * parameters in manifest.paramNames order). On the general path (runs-push-rows.ts) JSON.parse of
 * the line, the record schema, the row objects and their garbage took ≈ 1 s of the server's one
 * thread per 200,000 variants, on a machine where the database spends ≈ 3 s storing them and the
 * two share 2 cores; this reads each byte once and makes only the values the INSERT sends (≈ 0.45 s).
 *
 * It checks what the general path checks (every value against VariantRecordLine, the index order
 * and the shard's range) and gives the same values (runs-push-fast.test.ts compares them). Any line
 * it does not take as a whole, a valid one in another layout as much as a broken one, goes to the
 * general path, which stores it or answers with the precise error.
 */
import type { ParamColumns } from '../db/models/run.model';
import { PARAM_COLUMNS } from '../db/models/variant.model';
import { ascii, codePoints, JsonBytes, NULL, TRUE, FALSE } from './json-bytes';
import { REASON_LENGTH, type RowContext } from './runs-push-rows';
import { ROWS_PER_LINE } from '../schemas/runs';

/** The insert values of a line's rows (runs-insert.ts COLUMNS order), and how many records it held. */
export interface LineValues {
  values: unknown[][];
  records: number;
}

const NAME_LENGTH = 64;
const keyBytes = (key: string, first = false) => ascii(`${first ? '' : ','}"${key}":`);
const OPEN = ascii('{"kind":"variants","rows":[');
/** Keys after a comma, as the CLI writes them. */
const KEYS = [
  'id', 'params', 'status', 'joints', 'members', 'reactions', 'k', 's', 'critical', 'peakTension', 'peakCompression', 'maxDisplacement',
  'spanOverDeflection', 'reason', 'design', 'member', 'node', 'combination',
] as const;
const KEY = Object.fromEntries(KEYS.map((name) => [name, keyBytes(name)])) as Record<(typeof KEYS)[number], Buffer>;
const FIRST = { index: keyBytes('index', true), value: keyBytes('value', true) };
const STATUSES = ['determinate', 'indeterminate', 'unstable', 'error'].map((s) => ({ text: s, quoted: ascii(`"${s}"`) }));

function statusOf(j: JsonBytes): string | undefined {
  for (const s of STATUSES) if (j.lit(s.quoted)) return s.text;
  return undefined;
}

/** 16 lowercase hex digits (VariantRecordLine's id). */
function isVariantId(s: string): boolean {
  if (s.length !== 16) return false;
  for (let i = 0; i < 16; i++) {
    const c = s.charCodeAt(i);
    if (!((c >= 0x30 && c <= 0x39) || (c >= 0x61 && c <= 0x66))) return false;
  }
  return true;
}

/**
 * A reader of the lines of one push, or undefined when the run's parameter names cannot be written
 * as plain keys (then every line takes the general path).
 */
export function fastLineReader(paramNames: readonly string[], paramColumns: ParamColumns): ((line: Buffer, ctx: RowContext, keepAfter: number) => LineValues | undefined) | undefined {
  // A params object is stored as its own bytes only when they are JSON.stringify's text of it:
  // plain, distinct keys that V8 does not reorder (an array index such as "2" would come first).
  const plain = paramNames.every((n) => JSON.stringify(n) === `"${n}"` && !/^\d/.test(n));
  if (!plain || new Set(paramNames).size !== paramNames.length) return undefined;
  const keys = paramNames.map((n, i) => ascii(`${i ? ',' : ''}"${n}":`));
  const slots = paramNames.map((n) => PARAM_COLUMNS.indexOf(paramColumns[n] as (typeof PARAM_COLUMNS)[number]));
  const j = new JsonBytes();
  const p = [null, null, null, null, null, null] as (number | null)[];

  /** A peak: null, or {"value":…,"member"|"node":name,"combination":…}; undefined when not readable. */
  const peak = (who: Uint8Array): { value: number; name: string } | null | undefined => {
    if (j.lit(NULL)) return null;
    if (!j.byte(0x7b) || !j.lit(FIRST.value)) return undefined;
    const value = j.number();
    if (Number.isNaN(value) || !j.lit(who)) return undefined;
    const name = j.string();
    if (name === undefined || (name.length > NAME_LENGTH && codePoints(name) > NAME_LENGTH)) return undefined;
    return j.lit(KEY.combination) && j.skipString() && j.byte(0x7d) ? { value, name } : undefined;
  };
  const numberOrNull = (): number | null | undefined => {
    if (j.lit(NULL)) return null;
    const v = j.number();
    return Number.isNaN(v) ? undefined : v;
  };

  /** One record's insert values; undefined when the record is not in the CLI's layout or not valid. */
  const record = (runPk: number): unknown[] | undefined => {
    if (!j.byte(0x7b) || !j.lit(FIRST.index)) return undefined;
    const index = j.count();
    if (index < 0 || !j.lit(KEY.id)) return undefined;
    const id = j.string();
    if (id === undefined || !isVariantId(id) || !j.lit(KEY.params)) return undefined;
    const paramsAt = j.pos;
    if (!j.byte(0x7b)) return undefined;
    p.fill(null);
    for (let i = 0; i < keys.length; i++) {
      if (!j.lit(keys[i])) return undefined;
      const c = j.peek();
      if (c === 0x22) {
        if (j.string(true) === undefined || !j.canonical) return undefined;
      } else if (!j.lit(NULL)) {
        const v = j.number(true);
        if (Number.isNaN(v) || !j.canonical) return undefined;
        if (slots[i] >= 0) p[slots[i]] = v;
      }
    }
    if (!j.byte(0x7d)) return undefined;
    const params = j.text(paramsAt, j.pos);
    if (!j.lit(KEY.status)) return undefined;
    const status = statusOf(j);
    if (status === undefined || !j.lit(KEY.joints)) return undefined;
    const joints = j.count();
    if (joints < 0 || !j.lit(KEY.members)) return undefined;
    const members = j.count();
    if (members < 0 || !j.lit(KEY.reactions)) return undefined;
    const reactions = j.count();
    if (reactions < 0 || !j.lit(KEY.k)) return undefined;
    const kk = j.count();
    if (kk < 0 || !j.lit(KEY.s)) return undefined;
    const s = j.count();
    if (s < 0 || !j.lit(KEY.critical)) return undefined;
    const critical = j.lit(TRUE) ? 1 : j.lit(FALSE) ? 0 : -1;
    if (critical < 0 || !j.lit(KEY.peakTension)) return undefined;
    const tension = peak(KEY.member);
    if (tension === undefined || !j.lit(KEY.peakCompression)) return undefined;
    const compression = peak(KEY.member);
    if (compression === undefined || !j.lit(KEY.maxDisplacement)) return undefined;
    const displacement = peak(KEY.node);
    if (displacement === undefined || !j.lit(KEY.spanOverDeflection)) return undefined;
    const ratio = numberOrNull();
    if (ratio === undefined || !j.lit(KEY.reason)) return undefined;
    const reason = j.lit(NULL) ? null : j.string()?.slice(0, REASON_LENGTH);
    if (reason === undefined) return undefined;
    const design = j.lit(KEY.design) ? designFigures() : NO_DESIGN;
    if (design === undefined || !j.byte(0x7d)) return undefined;
    return [
      runPk, index, id, params, status, joints, members, reactions, kk, s, critical,
      tension?.value ?? null, tension?.name ?? null, compression?.value ?? null, compression?.name ?? null, displacement?.value ?? null,
      ratio, design.weight, design.maxUtilisation, reason, p[0], p[1], p[2], p[3], p[4], p[5],
    ];
  };

  /** The weight and utilisation of `"design":` null or {...} (other keys skipped); undefined when not readable. */
  const designFigures = (): { weight: number | null; maxUtilisation: number | null } | undefined => {
    if (j.lit(NULL)) return NO_DESIGN;
    if (!j.byte(0x7b)) return undefined;
    const out = { weight: null as number | null, maxUtilisation: null as number | null };
    if (j.byte(0x7d)) return out;
    do {
      const key = j.string();
      if (key === undefined || !j.byte(0x3a)) return undefined;
      if (key === 'weight' || key === 'maxUtilisation') {
        if (out[key] !== null) return undefined; // given twice: JSON.parse keeps the last one
        out[key] = j.number();
        if (Number.isNaN(out[key])) return undefined;
      } else if (!j.skipValue()) return undefined;
    } while (j.byte(0x2c));
    return j.byte(0x7d) ? out : undefined;
  };

  return (line, ctx, keepAfter) => {
    j.reset(line);
    if (!j.lit(OPEN)) return undefined;
    const values: unknown[][] = [];
    let records = 0;
    let last = ctx.lastIndex;
    do {
      const row = record(ctx.runPk);
      if (!row || ++records > ROWS_PER_LINE) return undefined;
      const index = row[1] as number;
      if (index <= last || index < ctx.range.start || index >= ctx.range.end) return undefined;
      last = index;
      if (index > keepAfter) values.push(row);
    } while (j.byte(0x2c));
    if (!j.byte(0x5d) || !j.byte(0x7d) || !j.atEnd()) return undefined;
    ctx.lastIndex = last;
    return { values, records };
  };
}

const NO_DESIGN = { weight: null, maxUtilisation: null } as const;
