/**
 * One variant of a study as a model object: find it by index or id in the study's space, and
 * rebuild it from its family with the study's loads, combinations and section (units m, kN).
 */
import type { Model } from '../schemas/model';
import type { SweepSetup } from '../sweep/evaluate';
import type { Combination } from '../sweep/presets';
import type { Params } from '../sweep/types';
import { passes, variantAt } from '../sweep/space';
import { variantId } from '../sweep/variant-id';
import { buildModel } from '../families/to-model';

/** Most variants searched for an id before giving up. */
export const MAX_ID_SEARCH = 2_000_000;

/** A variant found in a study's space. */
export interface FoundVariant { index: number; id: string; params: Params }

/**
 * Find a variant by its 0-based index or its 16-hex-digit id; a variant the study's `where`
 * filters drop is refused, as the sweep never evaluates it.
 * @returns the variant, or why it cannot be used
 */
export function findVariant(setup: SweepSetup, spec: number | string): FoundVariant | { error: string } {
  const { plan, family } = setup;
  const at = (index: number): FoundVariant => {
    const params = { ...variantAt(plan, index, {}) };
    return { index, id: variantId(family.id, params, plan.paramNames), params };
  };
  if (typeof spec === 'number') {
    if (!Number.isInteger(spec) || spec < 0 || spec >= plan.size) return { error: `variant ${spec} is outside the study's space (0..${plan.size - 1})` };
    const v = at(spec);
    return passes(plan, v.params) ? v : { error: `variant ${spec} is dropped by the study's where filters` };
  }
  if (plan.size > MAX_ID_SEARCH) return { error: `the study has ${plan.size} variants, too many to search for id ${spec}; name the variant by its index` };
  const scratch: Params = {};
  for (let i = 0; i < plan.size; i++) {
    const p = variantAt(plan, i, scratch);
    if (variantId(family.id, p, plan.paramNames) !== spec) continue;
    const v = at(i);
    return passes(plan, v.params) ? v : { error: `variant ${spec} (index ${i}) is dropped by the study's where filters` };
  }
  return { error: `no variant of the study has id ${spec}` };
}

/**
 * The model of a variant: the family's joints and members, one section, the study's loads as
 * joint loads per case, and its combinations.
 * @param params - the variant's parameters, each in its own unit
 * @throws RangeError when the parameters fail the family's check
 */
export function variantModel(setup: SweepSetup, combinations: readonly Combination[], params: Readonly<Params>, name?: string): Model {
  return buildModel(setup.family, { ...params }, {
    loads: setup.caseLoads.flat(),
    combinations: combinations.map((c) => ({ id: c.id, factors: { ...c.factors }, source: c.source })),
    section: { ...setup.section },
    ...(name ? { name } : {}),
  });
}
