/**
 * Load combination presets, each combination quoted with its source, and their expansion
 * into factors per load case of a study.
 *
 * Roles: D dead/permanent, L live/imposed, Lr roof live (imposed on roofs), S snow, R rain,
 * W wind. A study maps roles to its own case ids with `cases`; an unmapped role uses the
 * case of the same name. Factors are dimensionless.
 */
import type { PresetCombinations, StudyCombinations } from '../schemas/study';

/** One combination: a factor per load case id (dimensionless) and where it comes from. */
export interface Combination {
  id: string;
  factors: Record<string, number>;
  source: string;
}

type Term = readonly (readonly [role: string, factor: number])[];
interface Formula {
  readonly n: number;
  readonly text: string;
  /** A sum of terms; a term with several alternatives reads "(Lr or S or R)". */
  readonly terms: readonly Term[];
}

// ASCE/SEI 7-16 §2.3.1, basic combinations for strength design (LRFD). From memory, check
// the edition: 7-10 had the same wind factor 1.0W; the seismic combinations sit in §2.3.6
// and are not offered here. Exception 1 of §2.3.1 (0.5 on L for most occupancies with
// Lo ≤ 100 psf) is not applied.
const ASCE_SOURCE = 'ASCE/SEI 7-16 §2.3.1';
const ROOF: Term = [['Lr', 0.5], ['S', 0.5], ['R', 0.5]];
export const ASCE7_16_LRFD: readonly Formula[] = [
  { n: 1, text: '1.4D', terms: [[['D', 1.4]]] },
  { n: 2, text: '1.2D + 1.6L + 0.5(Lr or S or R)', terms: [[['D', 1.2]], [['L', 1.6]], ROOF] },
  { n: 3, text: '1.2D + 1.6(Lr or S or R) + (L or 0.5W)', terms: [[['D', 1.2]], [['Lr', 1.6], ['S', 1.6], ['R', 1.6]], [['L', 1.0], ['W', 0.5]]] },
  { n: 4, text: '1.2D + 1.0W + L + 0.5(Lr or S or R)', terms: [[['D', 1.2]], [['W', 1.0]], [['L', 1.0]], ROOF] },
  { n: 5, text: '0.9D + 1.0W', terms: [[['D', 0.9]], [['W', 1.0]]] },
];
/** Roles the ASCE preset knows. */
export const ASCE_ROLES: readonly string[] = ['D', 'L', 'Lr', 'S', 'R', 'W'];

// EN 1990:2002 eq. (6.10) with the partial factors of Table A1.2(B) (recommended values):
// γG,sup = 1.35, γG,inf = 1.00, γQ = 1.5 (0 where favourable). ψ0 from Table A1.1, from
// memory: imposed loads in buildings, categories A–D, 0.7; roofs, category H, 0; snow at
// sites up to 1000 m, 0.5; wind, 0.6.
const EN_SOURCE = 'EN 1990 eq. (6.10), Table A1.2(B)';
export const EN1990_GAMMA = { G: 1.35, Ginf: 1.0, Q: 1.5 } as const;
export const EN1990_PSI0_DEFAULT: Readonly<Record<string, number>> = { L: 0.7, Lr: 0, S: 0.5, W: 0.6 };

/**
 * The roles a preset spec knows and the case each maps to.
 * @returns role → case id, in the preset's order (for EN 1990: D, then variable roles)
 */
export function presetRoles(spec: PresetCombinations): Map<string, string> {
  const roles = spec.preset === 'asce7-lrfd' ? ASCE_ROLES : ['D', ...new Set([...Object.keys(EN1990_PSI0_DEFAULT), ...Object.keys(spec.psi0 ?? {})])];
  return new Map(roles.map((r) => [r, spec.cases?.[r] ?? r]));
}

/**
 * Expand a study's combinations for the load cases it has. A preset's "or" alternatives
 * become one combination each, only for cases present; a term with no case present drops
 * out; duplicates and empty combinations are left out. Custom factors pass through.
 * Assumes `checkCombinations` found no issue; unknown roles and cases are ignored here.
 * @param spec - the study's `combinations`; undefined gives each case alone with factor 1
 * @param caseIds - the load case ids the study's loads use
 */
export function expandCombinations(spec: StudyCombinations | undefined, caseIds: readonly string[]): Combination[] {
  if (spec === undefined) return caseIds.map((c) => ({ id: c, factors: { [c]: 1 }, source: 'load case alone, unfactored' }));
  if (Array.isArray(spec)) {
    return spec.map((c) => ({ id: c.id, factors: { ...c.factors }, source: c.source ?? 'study file (custom factors)' }));
  }
  const preset: PresetCombinations = spec;
  const roles = presetRoles(preset);
  const present = (role: string) => roles.has(role) && caseIds.includes(roles.get(role)!);
  const out = preset.preset === 'asce7-lrfd' ? expandAsce(roles, present) : expandEn(preset.psi0 ?? {}, roles, present);
  return dedupe(out);
}

function expandAsce(roles: Map<string, string>, present: (role: string) => boolean): Combination[] {
  const out: Combination[] = [];
  for (const f of ASCE7_16_LRFD) {
    let partial: { suffix: string; factors: Record<string, number> }[] = [{ suffix: '', factors: {} }];
    for (const term of f.terms) {
      const options = term.filter(([role]) => present(role));
      if (options.length === 0) continue;
      partial = partial.flatMap((p) =>
        options.map(([role, factor]) => ({
          suffix: term.length > 1 ? `${p.suffix}-${roles.get(role)}` : p.suffix,
          factors: { ...p.factors, [roles.get(role)!]: factor },
        })),
      );
    }
    for (const p of partial) out.push({ id: `asce7-${f.n}${p.suffix}`, factors: p.factors, source: `${ASCE_SOURCE}, combination ${f.n}: ${f.text}` });
  }
  return out;
}

function expandEn(psi0: Record<string, number>, roles: Map<string, string>, present: (role: string) => boolean): Combination[] {
  const g = EN1990_GAMMA;
  const dead = present('D') ? { [roles.get('D')!]: g.G } : {};
  const variables = [...roles.keys()].filter((r) => r !== 'D' && present(r));
  const psi = (r: string) => psi0[r] ?? EN1990_PSI0_DEFAULT[r] ?? 0;
  // EN 1991-1-1 §3.3.2(1), from memory: imposed loads on roofs are not combined with snow or wind.
  const exclusive = (a: string, b: string) => (a === 'Lr' && (b === 'S' || b === 'W')) || (b === 'Lr' && (a === 'S' || a === 'W'));
  const out: Combination[] = [{ id: 'en1990-6.10-G', factors: { ...dead }, source: `${EN_SOURCE}: 1.35 Gk (no variable action)` }];
  for (const lead of variables) {
    const factors: Record<string, number> = { ...dead, [roles.get(lead)!]: g.Q };
    for (const other of variables) {
      if (other === lead || exclusive(lead, other)) continue;
      if (other === 'Lr' && variables.some((v) => exclusive(v, 'Lr'))) continue;
      const f = round12(g.Q * psi(other));
      if (f !== 0) factors[roles.get(other)!] = f;
    }
    out.push({ id: `en1990-6.10-${roles.get(lead)}`, factors, source: `${EN_SOURCE}: 1.35 Gk + 1.5 Qk,1 + Σ 1.5 ψ0,i Qk,i; leading ${lead}, ψ0 from Table A1.1` });
  }
  if (present('W')) {
    const factors = { ...(present('D') ? { [roles.get('D')!]: g.Ginf } : {}), [roles.get('W')!]: g.Q };
    out.push({ id: 'en1990-6.10-fav-W', factors, source: `${EN_SOURCE}: 1.0 Gk,inf (favourable) + 1.5 Wk, wind uplift leading` });
  }
  return out;
}

function dedupe(list: Combination[]): Combination[] {
  const seen = new Set<string>();
  return list.filter((c) => {
    const keys = Object.keys(c.factors).filter((k) => c.factors[k] !== 0).sort();
    if (keys.length === 0) return false;
    const signature = keys.map((k) => `${k}=${c.factors[k]}`).join(';');
    if (seen.has(signature)) return false;
    seen.add(signature);
    return true;
  });
}

function round12(x: number): number {
  return Number(x.toPrecision(12));
}
