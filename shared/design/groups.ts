/**
 * Design groups (the members sized together) and unbraced lengths per member, resolved once per
 * topology from the spec's `groups` and `unbraced`. Lengths in metres.
 */
import type { DesignSpec } from '../schemas/design';
import type { Issue } from '../errors';
import { formatPath } from '../errors';
import { designIssue } from './issues';

/** The members of a truss as design sees them: ids and member groups (top, bottom, diagonal...). */
export interface MemberSet {
  readonly ids: readonly string[];
  /** Member group per member ('' when none). */
  readonly groups: readonly string[];
}

/** Members per design group and unbraced lengths per member. */
export interface GroupPlan {
  /** Design group names, in order of first appearance. */
  readonly names: readonly string[];
  /** Design group index per member. */
  readonly groupOf: Int32Array;
  /** Members of group g: order[start[g]] .. order[start[g + 1] − 1]. */
  readonly start: Int32Array;
  readonly order: Int32Array;
  /** Fixed unbraced length per member, m; NaN: the member's own length. */
  readonly inPlane: Float64Array;
  readonly outOfPlane: Float64Array;
}

/**
 * Assign members to design groups: a user group takes the member groups and member ids it lists;
 * a member in no user group joins the design group named like its member group ("members" when it
 * has none).
 * @returns the plan, or issues: unknown entries (`groups.webs[1]`), a member in two user groups,
 *   unknown keys of `unbraced.outOfPlane`
 */
export function planGroups(spec: Pick<DesignSpec, 'groups' | 'unbraced'>, ms: MemberSet): { plan?: GroupPlan; issues: Issue[] } {
  const issues: Issue[] = [];
  const nM = ms.ids.length;
  const user = new Array<string | undefined>(nM).fill(undefined);
  const memberGroups = new Set(ms.groups.filter(Boolean));
  const idIndex = new Map(ms.ids.map((id, e) => [id, e] as const));
  for (const [name, entries] of Object.entries(spec.groups ?? {})) {
    entries.forEach((entry, k) => {
      const hit: number[] = [];
      if (memberGroups.has(entry)) ms.groups.forEach((g, e) => g === entry && hit.push(e));
      else if (idIndex.has(entry)) hit.push(idIndex.get(entry)!);
      else issues.push(designIssue('design-unknown-group-entry', formatPath(['groups', name, k]), entry));
      for (const e of hit) {
        const prev = user[e];
        if (prev !== undefined && prev !== name) issues.push(designIssue('design-member-in-two-groups', formatPath(['groups', name, k]), ms.ids[e], prev, name));
        else user[e] = name;
      }
    });
  }
  const names: string[] = [];
  const groupOf = new Int32Array(nM);
  for (let e = 0; e < nM; e++) {
    const name = user[e] ?? (ms.groups[e] || 'members');
    let g = names.indexOf(name);
    if (g < 0) g = names.push(name) - 1;
    groupOf[e] = g;
  }
  const start = new Int32Array(names.length + 1);
  for (let e = 0; e < nM; e++) start[groupOf[e] + 1]++;
  for (let g = 0; g < names.length; g++) start[g + 1] += start[g];
  const fill = start.slice(0, names.length);
  const order = new Int32Array(nM);
  for (let e = 0; e < nM; e++) order[fill[groupOf[e]]++] = e;

  const inPlane = new Float64Array(nM).fill(NaN);
  const outOfPlane = new Float64Array(nM).fill(NaN);
  const ip = spec.unbraced?.inPlane;
  if (typeof ip === 'number') inPlane.fill(ip);
  const op = spec.unbraced?.outOfPlane;
  if (typeof op === 'number') outOfPlane.fill(op);
  else if (op && typeof op === 'object') {
    for (const [key, len] of Object.entries(op)) {
      const isDesign = names.includes(key);
      if (!isDesign && !memberGroups.has(key)) {
        issues.push(designIssue('design-unknown-group-entry', formatPath(['unbraced', 'outOfPlane', key]), key));
        continue;
      }
      // A design group's value wins over a member group's for the same member.
      for (let e = 0; e < nM; e++) {
        if (names[groupOf[e]] === key) outOfPlane[e] = len;
        else if (!isDesign && ms.groups[e] === key && !(names[groupOf[e]] in op)) outOfPlane[e] = len;
      }
    }
  }
  if (issues.length) return { issues };
  return { plan: { names, groupOf, start, order, inPlane, outOfPlane }, issues };
}
