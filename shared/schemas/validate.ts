/**
 * One Ajv instance for every schema in shared/schemas, and the translation of its errors
 * into `Issue`s with dotted paths (`members[3].to`) and short messages.
 */
import Ajv, { type ErrorObject, type ValidateFunction } from 'ajv';
import type { TSchema } from '@sinclair/typebox';
import { formatPath, issue, type Issue } from '../errors';

// strict: unknown keywords in a schema are bugs; it also makes "number" reject NaN and ±Infinity.
// verbose: errors carry the offending data and schema, used for the messages below.
const ajv = new Ajv({ allErrors: true, strict: true, useDefaults: false, verbose: true });
const compiled = new WeakMap<object, ValidateFunction>();

function compiledFor(schema: TSchema): ValidateFunction {
  let validate = compiled.get(schema);
  if (!validate) {
    const id = typeof schema.$id === 'string' ? schema.$id : undefined;
    validate = (id && ajv.getSchema(id)) || ajv.compile(schema);
    compiled.set(schema, validate);
  }
  return validate;
}

/**
 * A validator for a schema, compiled on its first call (modules declare theirs at load time; a
 * sweep worker, which gets data its parent already checked, then never pays Ajv's code generation).
 * The result validates data and returns its issues (empty when valid).
 */
export function compileSchema<T extends TSchema>(schema: T): (data: unknown) => Issue[] {
  let v: ValidateFunction | undefined;
  return (data) => {
    v ??= compiledFor(schema);
    return v(data) ? [] : toIssues(v.errors ?? [], data);
  };
}

/** Path segments of a JSON pointer, with numbers where the data holds an array. */
function segments(pointer: string, root: unknown): (string | number)[] {
  const out: (string | number)[] = [];
  let node = root;
  for (const raw of pointer.split('/').slice(1)) {
    const key = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    const isIndex = Array.isArray(node) && /^\d+$/.test(key);
    out.push(isIndex ? Number(key) : key);
    node = node !== null && typeof node === 'object' ? (node as Record<string, unknown>)[key] : undefined;
  }
  return out;
}

function describe(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') return `the text ${JSON.stringify(value.length > 20 ? `${value.slice(0, 20)}...` : value)}`;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return typeof value;
}

const TYPE_NAMES: Record<string, string> = {
  number: 'a number', integer: 'a whole number', string: 'a string', boolean: 'true or false',
  object: 'an object', array: 'a list', null: 'null',
};

function message(e: ErrorObject, path: string): Issue {
  const p = e.params as Record<string, unknown>;
  switch (e.keyword) {
    case 'type': {
      const types = ([] as string[]).concat(p.type as string | string[]);
      if (typeof e.data === 'number' && !Number.isFinite(e.data) && types.some((t) => t === 'number' || t === 'integer'))
        return issue('schema-not-finite', path, String(e.data));
      return issue('schema-type', path, types.map((t) => TYPE_NAMES[t] ?? t).join(' or '), describe(e.data));
    }
    case 'minLength':
      return issue('schema-limit', path, p.limit === 1 ? 'not be empty' : `be at least ${p.limit} characters long`);
    case 'maxLength':
      return issue('schema-limit', path, `be at most ${p.limit} characters long`);
    case 'minItems':
      return issue('schema-limit', path, p.limit === 1 ? 'not be empty' : `have at least ${p.limit} items`);
    case 'maxItems':
      return issue('schema-limit', path, `have at most ${p.limit} items`);
    case 'minimum': case 'maximum': case 'exclusiveMinimum': case 'exclusiveMaximum': {
      const words: Record<string, string> = { '>': 'be greater than', '>=': 'be at least', '<': 'be less than', '<=': 'be at most' };
      return issue('schema-limit', path, `${words[p.comparison as string]} ${p.limit}`);
    }
    case 'const':
      return issue('schema-one-of', path, [p.allowedValue]);
    case 'enum':
      return issue('schema-one-of', path, p.allowedValues as unknown[]);
    default:
      return issue('schema-invalid', path, e.message ?? `fails "${e.keyword}"`);
  }
}

type Branch = { type?: string | string[]; const?: unknown; properties?: Record<string, { const?: unknown }> };
const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const consts = (b: Branch) => Object.entries(b.properties ?? {}).filter(([, s]) => s && 'const' in s);

/**
 * A failed union either reports the one branch the data was evidently meant for (its
 * literal properties such as `kind` match, or it alone has the data's type), or one issue.
 */
function resolveUnion(e: ErrorObject, errors: readonly ErrorObject[], segs: (string | number)[]): number | Issue {
  const branches = e.schema as Branch[];
  const path = formatPath(segs);
  if ((e.params as { passingSchemas?: unknown }).passingSchemas) return issue('schema-invalid', path, 'matches more than one allowed form');
  if (branches.every((b) => 'const' in b)) return issue('schema-one-of', path, branches.map((b) => b.const));
  const data = e.data;
  if (isObject(data)) {
    const fits = branches.flatMap((b, k) => (consts(b).length && consts(b).every(([p, c]) => data[p] === c.const) ? [k] : []));
    if (fits.length === 1) return fits[0];
  }
  const typeFails = branches.map((_, k) =>
    errors.some((x) => x.schemaPath.startsWith(`${e.schemaPath}/${k}/`) && x.keyword === 'type' && x.instancePath === e.instancePath),
  );
  const typed = typeFails.flatMap((fails, k) => (fails ? [] : [k]));
  if (typed.length === 1) return typed[0];
  if (typed.length === 0 && branches.every((b) => b.type !== undefined)) {
    const names = [...new Set(branches.flatMap((b) => ([] as string[]).concat(b.type!)))].map((t) => TYPE_NAMES[t] ?? t);
    return issue('schema-type', path, names.join(' or '), describe(data));
  }
  // Every branch tags itself with the same literal key, and the data's value is none of them.
  const key = consts(branches[0])[0]?.[0];
  if (isObject(data) && key !== undefined && branches.every((b) => b.properties?.[key] && 'const' in b.properties[key])) {
    if (!(key in data)) return issue('schema-missing-key', path, key);
    return issue('schema-one-of', formatPath([...segs, key]), branches.map((b) => b.properties![key].const));
  }
  return issue('schema-invalid', path, 'does not match any of the allowed forms');
}

/**
 * Turn Ajv errors into issues. Unknown keys point at the key itself, missing keys at the
 * object that lacks them; a failed union reports the branch that was meant, or one issue.
 * @param data - the validated document, used to tell array indices from object keys
 */
export function toIssues(errors: readonly ErrorObject[], data: unknown): Issue[] {
  const hidden: string[] = [];
  const unionIssues = new Map<ErrorObject, Issue>();
  for (const e of errors) {
    if (e.keyword !== 'anyOf' && e.keyword !== 'oneOf') continue;
    const r = resolveUnion(e, errors, segments(e.instancePath, data));
    if (typeof r === 'number') {
      (e.schema as unknown[]).forEach((_, k) => {
        if (k !== r) hidden.push(`${e.schemaPath}/${k}/`);
      });
    } else {
      hidden.push(`${e.schemaPath}/`);
      unionIssues.set(e, r);
    }
  }
  const out: Issue[] = [];
  const seen = new Set<string>();
  for (const e of errors) {
    if (hidden.some((h) => e.schemaPath.startsWith(h))) continue;
    const segs = segments(e.instancePath, data);
    const p = e.params as Record<string, unknown>;
    let one: Issue | undefined;
    if (e.keyword === 'additionalProperties') {
      const key = String(p.additionalProperty);
      one = issue('schema-unknown-key', formatPath([...segs, key]), key);
    } else if (e.keyword === 'required') {
      one = issue('schema-missing-key', formatPath(segs), String(p.missingProperty));
    } else if (e.keyword === 'anyOf' || e.keyword === 'oneOf') {
      one = unionIssues.get(e);
    } else {
      one = message(e, formatPath(segs));
    }
    if (!one || seen.has(`${one.path}\u0000${one.message}`)) continue;
    seen.add(`${one.path}\u0000${one.message}`);
    out.push(one);
  }
  return out;
}
