/**
 * A design spec checked and resolved once: material in SI, catalogue sorted by weight, code rules,
 * and per-section numbers the sizing loop reads (design tension strength kN, α, wall utilisation,
 * weight kN/m). Everything here is per study, not per variant.
 */
import { DesignSpec } from '../schemas/design';
import { compileSchema } from '../schemas/validate';
import type { Issue } from '../errors';
import { designIssue } from './issues';
import { materialFrom, type ResolvedMaterial } from './materials';
import { catalogueFrom, fromSorted, type PreparedCatalogue } from './catalogues';
import { alphaFor, designRules, wallUtilisation, type DesignRules } from './rules';
import { tensionCapacity } from './checks';

/** A design spec ready for checks and sizing. Per catalogue section arrays follow `catalogue` order. */
export interface PreparedDesign {
  readonly spec: DesignSpec;
  readonly rules: DesignRules;
  readonly material: ResolvedMaterial;
  readonly catalogue: PreparedCatalogue;
  /** Design tension strength, kN, and the check that sets it (CHECK.tensionYield or tensionRupture). */
  readonly tensionCap: Float64Array;
  readonly tensionCheck: Uint8Array;
  /** EN imperfection factor α (0 under AISC). */
  readonly alpha: Float64Array;
  /** Wall ratio over its limit, applied to compression members. */
  readonly wallUtil: Float64Array;
  /** Design over nominal wall thickness applied to hollow sections of the catalogue. */
  readonly wallFactor: number;
  /** Weight per length, kN/m (from the area for weight, `massArea`). */
  readonly weight: Float64Array;
  /** Upper bounds of design strength per gross area, kN/m²: tension, and compression at zero slenderness. */
  readonly tensionPerArea: number;
  readonly compressionPerArea: number;
  /** Add member self-weight to the analysis. */
  readonly selfWeight: boolean;
  /** Span over allowed deflection (undefined: not checked). */
  readonly deflectionLimit?: number;
}

const validate = compileSchema(DesignSpec);

/**
 * Design over nominal wall thickness when the spec does not say: 0.93 for ASTM A500 HSS and A53
 * pipe (electric-resistance welded) under AISC 360-16 §B4.2 (from memory; check the clause), else 1.
 */
export function defaultWallFactor(code: DesignSpec['code'], m: ResolvedMaterial): number {
  return code !== 'en1993-1-1' && /A500|A53\b|a53-/i.test(`${m.id} ${m.standard}`) ? 0.93 : 1;
}

/**
 * Check a design spec against its schema and resolve it.
 * @returns the prepared design, or issues (paths like `material`, `catalogue.sections[2].t`); warnings
 *   name catalogue sections left out because they are thicker than the grade's stated range
 */
export function prepareDesign(input: unknown): { design?: PreparedDesign; issues: Issue[]; warnings: Issue[] } {
  const warnings: Issue[] = [];
  const schemaIssues = validate(input);
  if (schemaIssues.length) return { issues: schemaIssues, warnings };
  const spec = input as DesignSpec;
  const m = materialFrom(spec.material, 'material');
  if (!m.material) return { issues: [...m.issues, ...catalogueFrom(spec.catalogue, 'catalogue').issues], warnings };
  const material = m.material;
  const wallFactor = spec.wallFactor ?? defaultWallFactor(spec.code, material);
  const c = catalogueFrom(spec.catalogue, 'catalogue', wallFactor);
  const issues = [...m.issues, ...c.issues];
  if (issues.length || !c.catalogue) return { issues, warnings };
  let catalogue = c.catalogue;
  if (Number.isFinite(material.maxThickness)) {
    const keep = catalogue.sections.filter((s) => s.thickness <= material.maxThickness * (1 + 1e-12));
    for (const s of catalogue.sections) {
      if (!keep.includes(s)) warnings.push(designIssue('design-thickness-range', 'catalogue', s.name, s.thickness * 1000, material.name, material.maxThickness * 1000));
    }
    if (!keep.length) return { issues: [designIssue('design-catalogue-empty', 'catalogue', material.name)], warnings };
    if (keep.length < catalogue.sections.length) catalogue = fromSorted(catalogue.id, catalogue.name, keep);
  }
  const rules = designRules(spec.code, material, spec);
  const n = catalogue.sections.length;
  const tensionCap = new Float64Array(n);
  const tensionCheck = new Uint8Array(n);
  const alpha = new Float64Array(n);
  const wallUtil = new Float64Array(n);
  const weight = new Float64Array(n);
  catalogue.sections.forEach((s, i) => {
    const t = tensionCapacity(rules, s.A);
    tensionCap[i] = t.capacity;
    tensionCheck[i] = t.check;
    alpha[i] = alphaFor(rules, s.shape);
    wallUtil[i] = wallUtilisation(rules, s.shape, s.wallRatio);
    weight[i] = s.massArea * material.unitWeight;
  });
  const tensionPerArea = Math.min(rules.yieldFactor * rules.Fy, rules.ruptureFactor * rules.Fu * rules.netAreaFactor);
  const compressionPerArea = rules.Fy * (rules.sectionFactor > 0 ? Math.min(rules.bucklingFactor, rules.sectionFactor) : rules.bucklingFactor);
  return {
    design: {
      spec, rules, material, catalogue, wallFactor, tensionCap, tensionCheck, alpha, wallUtil, weight, tensionPerArea, compressionPerArea,
      selfWeight: spec.selfWeight ?? true, deflectionLimit: spec.deflectionLimit,
    },
    issues: [],
    warnings,
  };
}
