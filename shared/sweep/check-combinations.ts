/**
 * Checks of a study's `combinations` against the load cases its loads use, before any work.
 */
import type { StudyCombinations } from '../schemas/study';
import { presetRoles } from './presets';
import type { Issue } from './types';

/**
 * Issues in `combinations`: unknown roles, roles mapped to cases no load uses, two roles on
 * one case, load cases a preset would leave out, duplicate ids and factors for unknown cases.
 * @param caseIds - the load case ids the study's loads use
 * @param path - path of the combinations in the study (default `combinations`)
 */
export function checkCombinations(
  spec: StudyCombinations | undefined,
  caseIds: readonly string[],
  path = 'combinations',
): Issue[] {
  if (spec === undefined) return [];
  const issues: Issue[] = [];
  const known = new Set(caseIds);
  const cases = [...known].map((c) => `'${c}'`).join(', ') || 'none';
  if (Array.isArray(spec)) {
    const ids = new Set<string>();
    spec.forEach((c, i) => {
      if (ids.has(c.id)) issues.push({ path: `${path}[${i}].id`, message: `combination id '${c.id}' is used twice` });
      ids.add(c.id);
      for (const [k, f] of Object.entries(c.factors)) {
        const at = `${path}[${i}].factors.${k}`;
        if (!known.has(k)) issues.push({ path: at, message: `no load has case '${k}' (cases: ${cases})` });
        else if (!Number.isFinite(f)) issues.push({ path: at, message: `factor must be a finite number; got ${f}` });
      }
    });
    return issues;
  }
  const roles = presetRoles(spec);
  const roleList = [...roles.keys()].join(', ');
  const target = new Map<string, string>();
  for (const [role, caseId] of Object.entries(spec.cases ?? {})) {
    const at = `${path}.cases.${role}`;
    if (!roles.has(role)) issues.push({ path: at, message: `preset ${spec.preset} has no role '${role}' (roles: ${roleList})` });
    else if (!known.has(caseId)) issues.push({ path: at, message: `no load has case '${caseId}' (cases: ${cases})` });
    else if (target.has(caseId)) issues.push({ path: at, message: `case '${caseId}' is already mapped to role ${target.get(caseId)}` });
    target.set(caseId, role);
  }
  if (spec.preset === 'en1990-6.10' && spec.psi0 && 'D' in spec.psi0) {
    issues.push({ path: `${path}.psi0.D`, message: 'D is the permanent action; ψ0 applies to variable actions only' });
  }
  const covered = new Set(roles.values());
  for (const c of known) {
    if (covered.has(c)) continue;
    const hint = spec.preset === 'en1990-6.10' ? `map it in \`cases\`, give its ψ0 in \`psi0.${c}\`,` : 'map it in `cases`';
    issues.push({ path, message: `load case '${c}' is not part of preset ${spec.preset}; ${hint} or give custom combinations` });
  }
  return issues;
}
