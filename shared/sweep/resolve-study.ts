/**
 * From a parsed study file to a checked `SweepSetup`: schema, family, parameter space,
 * load quantities in SI, combinations in case order. Everything is checked before any work.
 */
import { Study } from '../schemas/study';
import type { StudyLoad } from '../schemas/study-loads';
import { compileSchema } from '../schemas/validate';
import { parseQuantity } from '../units';
import { families, getFamily } from '../families/registry';
import { DEFAULT_SECTION } from '../families/to-model';
import { planSpace } from './space';
import { expandCombinations, type Combination } from './presets';
import type { SweepSetup } from './evaluate';
import { prepareDesign } from '../design/prepare';

const validateStudy = compileSchema(Study);

/** A resolved study: the setup to sweep, or the issues that stop it. */
export interface ResolvedStudy {
  setup?: SweepSetup;
  /** Combinations with their factors by case id and their source. */
  combinations: Combination[];
  issues: { path: string; message: string; code?: string; position?: number }[];
}

/**
 * Check a parsed study file and resolve it.
 * @param opts.validated - the data already passed the study schema (a sweep worker, whose parent
 *   checked the same bytes): skip the schema check
 */
export function resolveStudy(data: unknown, opts: { validated?: boolean } = {}): ResolvedStudy {
  const schemaIssues = opts.validated ? [] : validateStudy(data);
  if (schemaIssues.length) return { issues: schemaIssues, combinations: [] };
  const study = data as Study;
  const family = getFamily(study.family);
  if (!family) {
    return { combinations: [], issues: [{ path: 'family', code: 'unknown-family', message: `unknown family '${study.family}'; known: ${families.map((f) => f.id).join(', ')}` }] };
  }
  const planned = planSpace(study, family.params);
  const issues: ResolvedStudy['issues'] = 'issues' in planned ? [...planned.issues] : [];
  const loads = (study.loads ?? []).map((l, i) => convertLoad(l, `loads[${i}]`, issues));
  const cases = [...new Set(loads.map((l) => l.case))];
  const combinations = expandCombinations(study.combinations, cases);
  let design: SweepSetup['design'];
  if (study.design !== undefined) {
    const d = prepareDesign(study.design);
    issues.push(...d.issues.map((i) => ({ ...i, path: i.path ? `design.${i.path}` : 'design' })));
    design = d.design;
  }
  const objective = study.objective && ('minimize' in study.objective ? study.objective.minimize : study.objective.maximize);
  if ((objective === 'weight' || objective === 'maxUtilisation') && study.design === undefined) {
    issues.push({ path: 'objective', message: `ranking by ${objective} needs a 'design' section (code, material, catalogue)` });
  }
  if (issues.length || 'issues' in planned) return { issues, combinations };
  if (!combinations.length) issues.push({ path: 'loads', message: 'the study has no loads, so there is nothing to combine' });
  if (issues.length) return { issues, combinations };
  const setup: SweepSetup = {
    family,
    plan: planned,
    cases,
    caseLoads: cases.map((c) => loads.filter((l) => l.case === c)),
    combinations: combinations.map((c) => ({ id: c.id, factors: Float64Array.from(cases, (k) => c.factors[k] ?? 0) })),
    section: DEFAULT_SECTION,
    design,
  };
  return { setup, combinations, issues };
}

function convertLoad(l: StudyLoad, path: string, issues: ResolvedStudy["issues"]): StudyLoad {
  const q = (v: number | string | undefined, key: string, unit: string): number => {
    if (v === undefined) return 0;
    const r = parseQuantity(v, unit, unit);
    if (r.error !== undefined) {
      issues.push({ path: `${path}.${key}`, code: r.code, message: r.error });
      return NaN;
    }
    return r.value;
  };
  switch (l.kind) {
    case 'area': return { ...l, value: q(l.value, 'value', 'kN/m^2'), spacing: q(l.spacing, 'spacing', 'm') };
    case 'line': return { ...l, value: q(l.value, 'value', 'kN/m') };
    case 'point': return { ...l, fx: q(l.fx, 'fx', 'kN'), fy: q(l.fy, 'fy', 'kN') };
    case 'self-weight': return l.weight === undefined ? l : { ...l, weight: q(l.weight, 'weight', 'kN/m') };
  }
}
