/**
 * Problems in user input: a catalogue of error codes with their message templates, the
 * `Issue` record that locates one problem, and `InputError`, which carries them to the
 * CLI (exit code 2) or the server (HTTP 400).
 */

/** One problem in an input document. */
export interface Issue {
  /** Dotted path into the document, e.g. `members[3].to`; "" for the document itself. */
  path: string;
  /** Short human message, without the path. */
  message: string;
  /** A key of `messages`. */
  code: string;
  /** 1-based line in the file, when known. */
  line?: number;
  /** 1-based column in the file (UTF-16 code units), when known. */
  column?: number;
}

const q = (s: string): string => JSON.stringify(s);

/** Message templates, one per error code. */
export const messages = {
  'file-not-found': () => 'file not found',
  'file-unreadable': (reason: string) => `cannot read the file: ${reason}`,
  'file-unwritable': (reason: string) => `cannot write the file: ${reason}`,
  'json-syntax': (what: string) => what,
  'json-duplicate-key': (key: string, firstLine: number) => `duplicate key ${q(key)} (first at line ${firstLine})`,
  'schema-unknown-key': (key: string) => `unknown key ${q(key)}`,
  'schema-missing-key': (key: string) => `missing key ${q(key)}`,
  'schema-type': (expected: string, got: string) => `must be ${expected}, not ${got}`,
  'schema-not-finite': (got: string) => `must be a finite number, not ${got}`,
  'schema-one-of': (choices: readonly unknown[]) => `must be one of ${choices.map((c) => JSON.stringify(c)).join(', ')}`,
  'schema-limit': (rule: string) => `must ${rule}`,
  'schema-invalid': (detail: string) => detail,
  'model-empty': (list: 'nodes' | 'members') => `the model has no ${list}`,
  'duplicate-id': (kind: string, id: string, firstPath: string) => `duplicate ${kind} id ${q(id)} (first at ${firstPath})`,
  'unknown-node': (id: string) => `no node has id ${q(id)}`,
  'member-self': (id: string) => `the member starts and ends at node ${q(id)}`,
  'member-zero-length': (a: string, b: string) => `zero length: nodes ${q(a)} and ${q(b)} are at the same place`,
  'coincident-nodes': (id: string, other: string, otherPath: string) =>
    `node ${q(id)} is at the same place as node ${q(other)} (${otherPath})`,
  'unknown-section': (id: string) => `no section has id ${q(id)}`,
  'support-duplicate': (node: string, firstPath: string) => `node ${q(node)} already has a support (${firstPath})`,
  'no-supports': () => 'the model has no supports, so it is free to move',
  'unknown-case': (name: string) => `no load has case ${q(name)}`,
  'unknown-unit': (unit: string, why: string) => `unknown unit '${unit}'${why ? `: ${why}` : ''}`,
  'wrong-dimension': (unit: string, noun: string) => `'${unit}' is not ${noun}`,
  'bad-quantity': (text: string) => `cannot read '${text}' as a number with a unit`,
  'out-of-range': (what: string) => `${what} is out of range`,
} as const satisfies Record<string, (...args: never[]) => string>;

/** An error code of the catalogue. */
export type IssueCode = keyof typeof messages;

/** Build an Issue from a catalogue code and the template's arguments. */
export function issue<C extends IssueCode>(code: C, path: string, ...args: Parameters<(typeof messages)[C]>): Issue {
  const template = messages[code] as (...a: unknown[]) => string;
  return { path, code, message: template(...args) };
}

const IDENT = /^[A-Za-z_$][A-Za-z0-9_$]*$/;

/** Join path segments as `members[3].to`; keys that are not identifiers are quoted: `factors["wind 1"]`. */
export function formatPath(segments: readonly (string | number)[]): string {
  let out = '';
  for (const s of segments) {
    if (typeof s === 'number') out += `[${s}]`;
    else if (IDENT.test(s)) out += out ? `.${s}` : s;
    else out += `[${JSON.stringify(s)}]`;
  }
  return out;
}

const SEGMENT = /^(?:\.?([A-Za-z_$][A-Za-z0-9_$]*)|\[(\d+)\]|\[("(?:[^"\\]|\\.)*")\])/;

/** Split a path made by `formatPath` back into segments (numbers for array indices); undefined if malformed. */
export function parsePath(path: string): (string | number)[] | undefined {
  const out: (string | number)[] = [];
  let rest = path;
  while (rest) {
    const m = SEGMENT.exec(rest);
    if (!m) return undefined;
    out.push(m[1] ?? (m[2] !== undefined ? Number(m[2]) : (JSON.parse(m[3]) as string)));
    rest = rest.slice(m[0].length);
  }
  return out;
}

const MAX_LISTED = 20;

function formatIssue(file: string | undefined, i: Issue): string {
  const at = i.line !== undefined ? `${i.line}:${i.column ?? 1}` : '';
  const where = [file, at].filter(Boolean).join(':');
  const head = where && i.path ? `${where} ${i.path}` : where || i.path;
  return head ? `${head}: ${i.message}` : i.message;
}

/** Invalid input: one or more issues in one file (or in data that came from no file). */
export class InputError extends Error {
  override readonly name = 'InputError';

  /**
   * @param file - the file the issues are in, as the user named it; undefined for data from no file
   * @param issues - at least one issue; the message lists them as `file:line:col path: message`
   */
  constructor(
    public readonly file: string | undefined,
    public readonly issues: Issue[],
  ) {
    const lines = issues.slice(0, MAX_LISTED).map((i) => formatIssue(file, i));
    if (issues.length > MAX_LISTED) lines.push(`... and ${issues.length - MAX_LISTED} more`);
    super(lines.length ? lines.join('\n') : `${file ?? 'input'}: invalid input`);
  }
}
