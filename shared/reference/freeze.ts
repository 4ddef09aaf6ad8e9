/**
 * Freezing a recomputation into a reference case: the classification and every force, reaction
 * and displacement of the chosen loadings, in the model's units, as the analyze JSON gives them.
 */
import type { ReferenceCase, ReferenceExpected, ReferenceSource, ReferenceTolerance } from '../schemas/reference-case';
import type { Recomputed } from './compare';

/** Tolerance of a frozen case: 1e-6 kN, 1e-9 m, relative 1e-6. */
export const DEFAULT_TOLERANCE: ReferenceTolerance = { absolute: { force: 1e-6, displacement: 1e-9 }, relative: 1e-6 };

type Loading = NonNullable<ReferenceExpected['results']>[string];

/**
 * The expected block of a recomputation.
 * @param loadings - the loading ids to keep (default all); each must exist in `doc.results`
 * @throws RangeError when a loading id is not in the recomputation (check first)
 */
export function expectedFrom(doc: Recomputed, loadings?: readonly string[]): ReferenceExpected {
  const c = doc.classification;
  const status = c.status as ReferenceExpected['classification']['status'];
  const classification = {
    status, joints: c.joints, members: c.members, reactions: c.reactions, mechanisms: c.mechanisms, selfStress: c.selfStress, critical: c.critical,
  };
  const ids = loadings ?? Object.keys(doc.results);
  if (!ids.length) return { classification };
  const results: Record<string, Loading> = {};
  for (const id of ids) {
    const r = doc.results[id] as Loading | undefined;
    if (!r) throw new RangeError(`no loading '${id}' in the recomputation`);
    results[id] = {
      ...(r.memberForces ? { memberForces: { ...r.memberForces } } : {}),
      ...(r.reactions ? { reactions: structuredCopy(r.reactions) } : {}),
      ...(r.displacements ? { displacements: structuredCopy(r.displacements) } : {}),
    };
  }
  return { classification, results };
}

const structuredCopy = <T extends Record<string, object>>(o: T): T =>
  Object.fromEntries(Object.entries(o).map(([k, v]) => [k, { ...v }])) as T;

/** What a frozen case is made of. */
export interface FreezeInput {
  name: string;
  description?: string;
  source: ReferenceSource;
  model: ReferenceCase['model'];
  doc: Recomputed;
  loadings?: readonly string[];
  tolerance?: ReferenceTolerance;
  /** Written as `$schema`, for editors. */
  schema?: string;
}

/** Build a reference case from a recomputation. */
export function frozenCase(f: FreezeInput): ReferenceCase {
  return {
    ...(f.schema ? { $schema: f.schema } : {}),
    name: f.name,
    ...(f.description ? { description: f.description } : {}),
    source: f.source,
    model: f.model,
    expected: expectedFrom(f.doc, f.loadings),
    tolerance: f.tolerance ?? DEFAULT_TOLERANCE,
  };
}
