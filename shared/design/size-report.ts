/**
 * A sizing result as plain data for reports and JSON (ids and names instead of indices), and its
 * problems as issues. Allocates: call it for the variants you keep, not inside a sweep loop.
 */
import type { Issue } from '../errors';
import { checkName } from './check-names';
import { designIssue, joinPath } from './issues';
import { MAX_ITERATIONS, type Sizer, type SizingResult } from './size';

/** One member's design: section, utilisation, governing check with its clause, combination id. */
export interface MemberDesign {
  id: string;
  group: string;
  section: string;
  sectionName: string;
  utilisation: number;
  check: string;
  /** Combination id of the governing force ('' for none). */
  combination: string;
}

/** One design group's choice. */
export interface GroupDesign {
  name: string;
  section: string;
  sectionName: string;
  /** false: no catalogue section passes (the section shown is the one with the least utilisation). */
  ok: boolean;
  worstMember: string;
  utilisation: number;
}

/** The whole sizing as plain data; weights kN and kg, deflection m. */
export interface SizingReport {
  status: SizingResult['status'];
  settled: boolean;
  iterations: number;
  code: string;
  material: string;
  catalogue: string;
  weightKN: number;
  massKg: number;
  maxUtilisation: number;
  maxUtilisationMember: string;
  maxDeflection: number | null;
  spanOverDeflection: number | null;
  deflectionLimit: number | null;
  deflectionOk: boolean | null;
  groups: GroupDesign[];
  members: MemberDesign[];
  issues: Issue[];
}

/** Problems of a sizing: unsizable groups (group and worst member), no settling, a failed analysis. */
export function sizingIssues(sizer: Sizer, r: SizingResult): Issue[] {
  const out: Issue[] = [];
  if (r.status === 'analysis-failed') return [designIssue('design-analysis-failed', '')];
  const secs = sizer.design.catalogue.sections;
  sizer.plan.names.forEach((name, g) => {
    if (r.groupOk[g]) return;
    const w = r.groupWorst[g];
    out.push(designIssue('design-unsizable', joinPath('groups', name), name, sizer.members.ids[w], secs[r.groupSection[g]].name, r.utilisation[w]));
  });
  if (!r.settled) out.push(designIssue('design-not-settled', '', MAX_ITERATIONS));
  return out;
}

/**
 * Plain data of a sizing result. @param combinationIds - ids of the analysed combinations, in order
 */
export function describeSizing(sizer: Sizer, r: SizingResult, combinationIds: readonly string[] = []): SizingReport {
  const { design, members, plan } = sizer;
  const secs = design.catalogue.sections;
  const code = design.rules.code;
  const failed = r.status === 'analysis-failed';
  const num = (v: number) => (Number.isFinite(v) ? v : null);
  return {
    status: r.status,
    settled: r.settled,
    iterations: r.iterations,
    code,
    material: design.material.name,
    catalogue: design.catalogue.id,
    weightKN: failed ? NaN : r.weight,
    massKg: failed ? NaN : r.mass,
    maxUtilisation: failed ? NaN : r.maxUtilisation,
    maxUtilisationMember: failed || r.maxUtilisationMember < 0 ? '' : members.ids[r.maxUtilisationMember],
    maxDeflection: failed ? null : num(r.maxDeflection),
    spanOverDeflection: failed ? null : num(r.spanOverDeflection),
    deflectionLimit: design.deflectionLimit ?? null,
    deflectionOk: failed ? null : (r.deflectionOk ?? null),
    groups: failed ? [] : plan.names.map((name, g) => {
      const w = r.groupWorst[g];
      const s = secs[r.groupSection[g]];
      return { name, section: s.id, sectionName: s.name, ok: r.groupOk[g] === 1, worstMember: w >= 0 ? members.ids[w] : '', utilisation: w >= 0 ? r.utilisation[w] : 0 };
    }),
    members: failed ? [] : members.ids.map((id, e) => {
      const s = secs[r.section[e]];
      const c = r.combination[e];
      return {
        id, group: plan.names[plan.groupOf[e]], section: s.id, sectionName: s.name, utilisation: r.utilisation[e],
        check: checkName(code, r.check[e]), combination: c >= 0 ? (combinationIds[c] ?? String(c)) : '',
      };
    }),
    issues: sizingIssues(sizer, r),
  };
}
