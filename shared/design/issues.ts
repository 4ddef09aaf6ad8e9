/**
 * Messages of the member-design module, in the style of shared/errors.ts: a catalogue of codes
 * with templates, and `designIssue` to build an `Issue` with its path.
 */
import type { Issue } from '../errors';
import { formatPath } from '../errors';

const q = (s: string): string => JSON.stringify(s);
const list = (xs: readonly string[]): string => xs.map(q).join(', ');

/** Message templates, one per design issue code. */
export const designMessages = {
  'design-unknown-material': (id: string, known: readonly string[]) => `no material grade ${q(id)}; known grades: ${list(known)}`,
  'design-unknown-catalogue': (id: string, known: readonly string[]) => `no section catalogue ${q(id)}; known catalogues: ${list(known)}`,
  'design-quantity': (detail: string) => detail,
  'design-not-positive': (what: string, got: string) => `${what} must be greater than 0 (got ${got})`,
  'design-not-finite': (what: string) => `${what} must be a finite number`,
  'design-wall-too-thick': (t: number, limitName: string, limit: number) =>
    `wall thickness t = ${fmt(t)} mm must be less than ${limitName} = ${fmt(limit)} mm`,
  'design-fu-below-fy': (fu: number, fy: number) => `Fu = ${fmt(fu / 1000)} MPa is below Fy = ${fmt(fy / 1000)} MPa`,
  'design-duplicate-section': (id: string, first: string) => `duplicate section id ${q(id)} (first at ${first})`,
  'design-unknown-group-entry': (entry: string) => `${q(entry)} is neither a member group of this truss nor a member id`,
  'design-member-in-two-groups': (member: string, first: string, second: string) =>
    `member ${q(member)} is in design group ${q(first)} and in ${q(second)}`,
  'design-unsizable': (group: string, member: string, section: string, u: number) =>
    `no catalogue section passes group ${q(group)}: member ${q(member)} reaches utilisation ${fmt(u)} even with ${section}`,
  'design-not-settled': (iterations: number) => `sizing did not settle in ${iterations} iterations (sections still changing)`,
  'design-thickness-range': (section: string, t: number, grade: string, max: number) =>
    `${section} is left out: its thickness ${fmt(t)} mm is above the ${fmt(max)} mm the strengths of ${grade} hold for`,
  'design-catalogue-empty': (grade: string) => `no section of the catalogue is within the thickness range of ${grade}`,
  'design-analysis-failed': () => 'the truss could not be analysed with the chosen sections (unstable)',
} as const satisfies Record<string, (...args: never[]) => string>;

/** A design issue code. */
export type DesignIssueCode = keyof typeof designMessages;

/** Build an Issue from a design code and the template's arguments. */
export function designIssue<C extends DesignIssueCode>(code: C, path: string, ...args: Parameters<(typeof designMessages)[C]>): Issue {
  const template = designMessages[code] as (...a: unknown[]) => string;
  return { path, code, message: template(...args) };
}

/** A number for a message: up to 4 significant digits, no exponent for everyday sizes. */
export function fmt(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  return String(Number(v.toPrecision(4)));
}

/** Append path segments to a path made by `formatPath`: joinPath('sections[2]', 't') → 'sections[2].t'. */
export function joinPath(prefix: string, ...segs: (string | number)[]): string {
  const tail = formatPath(segs);
  if (!prefix) return tail;
  if (!tail) return prefix;
  return tail.startsWith('[') ? prefix + tail : `${prefix}.${tail}`;
}
