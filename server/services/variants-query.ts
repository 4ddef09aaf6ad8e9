/**
 * The query string of the variant routes, checked and turned into SQL conditions on `variants v`.
 * Every condition starts from `v.runPk = ?`, and each sortable field has an index with runPk
 * (migrations 002 and 004), so a page is an index range, not a scan. Unknown keys and fields are
 * 422 with the key as the path.
 *
 *   status=a,b  critical=true|false  marked=candidate|rejected  ids=1,5,9
 *   f.<field>.gte=x  f.<field>.lte=x  (numeric fields and the parameters mapped to p1..p6)
 */
import type { ParamColumns } from '../db/models/run.model';
import { HttpError, type ErrorDetail } from '../http/http-error';

/** Fields of a variant by API name → column; `numeric` ones can be filtered, charted and binned. */
const BUILT_IN: Record<string, { column: string; numeric: boolean }> = {
  index: { column: 'index', numeric: true },
  status: { column: 'status', numeric: false },
  k: { column: 'k', numeric: true },
  s: { column: 's', numeric: true },
  peakTension: { column: 'peakTension', numeric: true },
  peakCompression: { column: 'peakCompression', numeric: true },
  maxDisplacement: { column: 'maxDisplacement', numeric: true },
  spanOverDeflection: { column: 'spanOverDeflection', numeric: true },
  weight: { column: 'weight', numeric: true },
  maxUtilisation: { column: 'maxUtilisation', numeric: true },
};
const STATUSES = ['determinate', 'indeterminate', 'unstable', 'error'];
const MARKS = ['candidate', 'rejected'];
/** Most indices in `ids` (a URL stays under the server's 16 KB header limit). */
export const MAX_IDS = 2000;
const FILTER_KEYS = ['status', 'critical', 'marked', 'ids'];

/** Conditions on `variants v` with their values, ready for `WHERE ${sql}`. */
export interface Conditions {
  sql: string;
  values: unknown[];
}

/** Collects problems with the query; `done()` throws them as one 422. */
export class QueryReader {
  readonly details: ErrorDetail[] = [];
  constructor(readonly query: Record<string, unknown>, readonly paramColumns: ParamColumns) {}

  fail(path: string, message: string): undefined {
    this.details.push({ path, message });
    return undefined;
  }

  /** One string value (a key given twice is a problem). */
  text(key: string): string | undefined {
    const v = this.query[key];
    if (v === undefined) return undefined;
    if (typeof v !== 'string') return this.fail(key, 'must be given once');
    return v;
  }

  int(key: string, min: number, max: number, fallback: number): number {
    const t = this.text(key);
    if (t === undefined) return fallback;
    const n = /^\d{1,9}$/.test(t) ? Number(t) : NaN;
    if (!(n >= min && n <= max)) return this.fail(key, `must be a whole number from ${min} to ${max}`) ?? fallback;
    return n;
  }

  /** The column of a field as `v.\`col\``; undefined (and a problem) when unknown. */
  column(path: string, name: string, numeric: boolean): string | undefined {
    const b = Object.hasOwn(BUILT_IN, name) ? BUILT_IN[name] : undefined;
    const col = b ? b.column : Object.hasOwn(this.paramColumns, name) ? this.paramColumns[name] : undefined;
    if (!col) return this.fail(path, `unknown field '${name}'; fields: ${this.fieldNames(numeric).join(', ')}`);
    if (numeric && b && !b.numeric) return this.fail(path, `'${name}' is not a numeric field`);
    return `v.\`${col}\``;
  }

  fieldNames(numeric: boolean): string[] {
    return [...Object.keys(BUILT_IN).filter((k) => !numeric || BUILT_IN[k].numeric), ...Object.keys(this.paramColumns)];
  }

  /** Refuse keys that are neither filters nor in `own`. */
  onlyKeys(own: readonly string[]): void {
    for (const key of Object.keys(this.query)) {
      if (!own.includes(key) && !FILTER_KEYS.includes(key) && !/^f\.[^.]+\.(gte|lte)$/.test(key)) {
        this.fail(key, `unknown query parameter; use ${[...own, ...FILTER_KEYS, 'f.<field>.gte', 'f.<field>.lte'].join(', ')}`);
      }
    }
  }

  done(): void {
    if (this.details.length) throw new HttpError(422, 'invalid-query', 'The query is not valid.', this.details);
  }
}

const list = (text: string) => text.split(',').map((s) => s.trim()).filter(Boolean);

/** The filters of the query as conditions on run `runPk`. */
export function filterConditions(r: QueryReader, runPk: number): Conditions {
  const parts = ['v.runPk = ?'];
  const values: unknown[] = [runPk];
  const inList = (sql: string, items: unknown[]) => {
    parts.push(`${sql} IN (${items.map(() => '?').join(',')})`);
    values.push(...items);
  };
  const status = r.text('status');
  if (status !== undefined) {
    const wanted = list(status);
    const bad = wanted.filter((s) => !STATUSES.includes(s));
    if (!wanted.length || bad.length) r.fail('status', `must be a comma list of ${STATUSES.join(', ')}`);
    else inList('v.status', wanted);
  }
  const critical = r.text('critical');
  if (critical !== undefined) {
    if (critical !== 'true' && critical !== 'false') r.fail('critical', 'must be true or false');
    else {
      parts.push('v.critical = ?');
      values.push(critical === 'true');
    }
  }
  const marked = r.text('marked');
  if (marked !== undefined) {
    const kinds = list(marked);
    if (!kinds.length || kinds.some((k) => !MARKS.includes(k))) r.fail('marked', `must be ${MARKS.join(' or ')} (or both, comma-separated)`);
    else {
      parts.push(`v.id IN (SELECT m.variantPk FROM marks m WHERE m.kind IN (${kinds.map(() => '?').join(',')}))`);
      values.push(...kinds);
    }
  }
  const ids = r.text('ids');
  if (ids !== undefined) {
    const items = list(ids);
    if (!items.length || items.length > MAX_IDS || items.some((s) => !/^\d{1,9}$/.test(s))) r.fail('ids', `must be a comma list of up to ${MAX_IDS} variant indices`);
    else inList('v.`index`', items.map(Number));
  }
  for (const key of Object.keys(r.query).filter((k) => k.startsWith('f.')).sort()) {
    const m = /^f\.([^.]+)\.(gte|lte)$/.exec(key);
    const text = r.text(key);
    if (!m || text === undefined) continue;
    const col = r.column(key, m[1], true);
    const v = text.trim() === '' ? NaN : Number(text);
    if (!Number.isFinite(v)) r.fail(key, 'must be a number');
    else if (col) {
      parts.push(`${col} ${m[2] === 'gte' ? '>=' : '<='} ?`);
      values.push(v);
    }
  }
  return { sql: parts.join(' AND '), values };
}

/** The sort of `sort=field|-field` (default: index). */
export interface Sort {
  /** `v.\`col\``. */
  column: string;
  desc: boolean;
  /** Sorting by index: unique in a run, never null, no tie-break needed. */
  byIndex: boolean;
}

export function readSort(r: QueryReader): Sort {
  const t = r.text('sort') ?? 'index';
  const desc = t.startsWith('-');
  const name = desc ? t.slice(1) : t;
  const column = r.column('sort', name, false) ?? 'v.`index`';
  return { column, desc, byIndex: column === 'v.`index`' };
}

/** ORDER BY of a sort; ties broken by the row id, as the (runPk, column) indexes hold them. */
export function orderSql(s: Sort): string {
  const dir = s.desc ? 'DESC' : 'ASC';
  return s.byIndex ? `${s.column} ${dir}` : `${s.column} ${dir}, v.id ${dir}`;
}
