/**
 * The engine's own view of a truss: indices instead of ids, SI units (m, kN, kN/m², m²),
 * typed arrays. Built from a model file by `toStructure` (shared/engine/to-structure.ts)
 * or directly by a family generator.
 */

/** A support as the engine sees it. */
export interface SupportDef {
  /** Joint index. */
  readonly node: number;
  /** pin: x and y restrained; roller: one direction restrained. */
  readonly kind: 'pin' | 'roller';
  /** Roller only: direction of the reaction, radians from +x counter-clockwise. */
  readonly angle: number;
}

/** What does not change between variants of one family and panel count. */
export interface Topology {
  readonly nodeIds: readonly string[];
  readonly memberIds: readonly string[];
  /** Start joint index of each member. */
  readonly from: Int32Array;
  /** End joint index of each member. */
  readonly to: Int32Array;
  readonly supports: readonly SupportDef[];
  /** Optional member group names (top, bottom, diagonal, vertical, link...). */
  readonly groups?: readonly string[];
}

/** A load combination: factors per load case, in case order. */
export interface CombinationDef {
  readonly id: string;
  readonly factors: Float64Array;
  readonly source?: string;
}

/** A complete truss ready for the engine. */
export interface Structure extends Topology {
  readonly name: string;
  /** Joint x coordinates, metres. */
  readonly x: Float64Array;
  /** Joint y coordinates, metres. */
  readonly y: Float64Array;
  /** Axial stiffness E·A of each member, kN. */
  readonly EA: Float64Array;
  /** Load case ids. */
  readonly cases: readonly string[];
  /** Joint loads per case: [fx0, fy0, fx1, fy1, ...], kN. */
  readonly caseLoads: readonly Float64Array[];
  /** Combinations; when empty, each case is reported alone. */
  readonly combinations: readonly CombinationDef[];
}

/** Number of reaction components a support provides. */
export function reactionCount(s: SupportDef): number {
  return s.kind === 'pin' ? 2 : 1;
}
