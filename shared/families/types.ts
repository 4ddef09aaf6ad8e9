/**
 * The shapes every truss family shares: its parameters, its topology and the family object.
 * Lengths in metres, angles in degrees, counts as plain integers.
 */
import type { Topology } from '../engine/structure';

/** One parameter of a family, as declared to studies, the CLI and the web form. */
export interface ParamSpec {
  /** Identifier used in study files and expressions. */
  name: string;
  /** Unit of the number: "m", "deg", or "" for counts, ratios and option strings. */
  unit: string;
  /** Value used when a study does not set the parameter (number in `unit`, or one of `options`). */
  default: number | string;
  /** Smallest allowed value, in `unit`. */
  min?: number;
  /** Largest allowed value, in `unit`. */
  max?: number;
  /** Whole numbers only (panel counts). */
  integer?: boolean;
  /** For a choice: the allowed strings. */
  options?: string[];
  /** One line: what it is, its unit and any rule (even panels...). */
  description: string;
}

/** Parameter values of one variant by name: numbers in each parameter's unit, or option strings. */
export type Params = Record<string, number | string>;

/** Member groups a family assigns. */
export type MemberGroup = 'top' | 'bottom' | 'diagonal' | 'vertical' | 'link' | 'web';

/** A family's topology: the engine's `Topology` plus chord chains and member groups. */
export interface FamilyTopology extends Topology {
  /**
   * Joint indices along the top chord, left to right; likewise the bottom chord.
   * Each chain runs over the whole span from the left end to the right end (for a Warren or a
   * pitched truss it starts and ends at the support joints), so tributary lengths sum to the span.
   */
  readonly topChord: Int32Array;
  readonly bottomChord: Int32Array;
  /** Member group per member: 'top' | 'bottom' | 'diagonal' | 'vertical' | 'link' | 'web'. */
  readonly groups: readonly string[];
}

/** A parametric truss family. */
export interface TrussFamily {
  /** Stable id used in study files, e.g. "pratt". */
  id: string;
  /** Display name. */
  name: string;
  category: 'flat' | 'pitched' | 'curved' | 'cantilever' | 'compound';
  /** One or two sentences: the pattern, its joints and what the panel count means. */
  summary: string;
  params: readonly ParamSpec[];
  /** Parameter problems (value out of range, odd panels where even needed...) as messages naming the parameter; [] when valid. */
  check(p: Params): string[];
  /** Key of everything that changes the joints/members/supports: same key, same topology. */
  topologyKey(p: Params): string;
  /** The parameters `topologyKey` reads: variants equal in all of them share a topology (a sweep skips the key then). */
  readonly topologyParams: readonly string[];
  /** Build the topology (once per key; the caller caches it). Joints are numbered along the span. */
  topology(p: Params): FamilyTopology;
  /** Fill joint coordinates, metres, into x and y (length = joints). Allocates nothing. */
  geometry(p: Params, topo: FamilyTopology, x: Float64Array, y: Float64Array): void;
}
