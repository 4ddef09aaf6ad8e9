/**
 * Detailed classification of one frame: rank of the equilibrium matrix by SVD, mechanisms k and
 * states of self-stress s (Calladine 1978: m + r − 2j = s − k), their modes (Pellegrino & Calladine
 * 1986), the pebble game's generic answer, and findings that say where the frame is weak.
 */
import type { Structure } from './structure';
import { equilibriumMatrix, transpose, type ReactionComponent } from './equilibrium';
import { jacobiSvd, localiseBasis, nullBasis } from './linalg/jacobi-svd';
import { pebbleGame, type RigidityReport } from './pebble-game';
import { geometryFindings, type Finding } from './findings';

export type Status = 'unstable' | 'determinate' | 'indeterminate';

/** A mechanism: joint displacements with no member elongation and no support movement. */
export interface MechanismMode {
  /** Joint displacements [ux0, uy0, ...], scaled so the largest component is 1 (dimensionless). */
  readonly displacement: Float64Array;
  /** Joints that move (displacement above 1e-6 of the largest). */
  readonly joints: number[];
}

/** A state of self-stress: member forces and reactions in equilibrium with no load. */
export interface SelfStressState {
  /** Forces [members..., reactions...], scaled so the largest magnitude is 1 (dimensionless). */
  readonly forces: Float64Array;
  /** Members that carry it: the redundant set of this state. */
  readonly members: number[];
  /** Reaction components that carry it (indices into `reactionComponents`). */
  readonly reactions: number[];
}

/** Classification of a frame. */
export interface Classification {
  readonly joints: number;
  readonly members: number;
  readonly reactions: number;
  /** m + r − 2j (Maxwell's count). */
  readonly countRule: number;
  readonly rank: number;
  /** k = 2j − rank. */
  readonly mechanisms: number;
  /** s = m + r − rank. */
  readonly selfStress: number;
  readonly status: Status;
  /** Degree of static indeterminacy (s when stable, else 0). */
  readonly degree: number;
  /** The count is satisfied (m + r ≥ 2j) yet k > 0. */
  readonly critical: boolean;
  /** Smallest over largest nonzero singular value of A. */
  readonly conditioning: number;
  /** Conditioning below {@link NEAR_MECHANISM}: forces are very sensitive to the geometry. */
  readonly nearlyMechanism: boolean;
  readonly mechanismModes: MechanismMode[];
  readonly selfStressStates: SelfStressState[];
  /** Members in any self-stress state: removing one of them lowers s by one. */
  readonly redundantMembers: number[];
  readonly reactionComponents: ReactionComponent[];
  readonly rigidity: RigidityReport;
  /** The pebble game (generic) and the rank disagree: collinear, parallel or concurrent geometry. */
  readonly specialGeometry: boolean;
  readonly findings: Finding[];
}

/** Conditioning below which a stable frame is reported as nearly a mechanism (common practice). */
export const NEAR_MECHANISM = 1e-4;

const ZERO = 1e-6;

/** Classify a frame in detail. Cost O(n³) in the number of joints: for reports, not sweeps. */
export function classify(st: Structure): Classification {
  const { a, rows, cols, reactions } = equilibriumMatrix(st, st.x, st.y);
  const nM = st.from.length;
  const svdA = jacobiSvd(a, rows, cols);
  const svdAt = jacobiSvd(transpose(a, rows, cols), cols, rows);
  let sMax = 0;
  for (const v of svdA.sigma) sMax = Math.max(sMax, v);
  const tol = Math.max(rows, cols) * 2.220446049250313e-16 * sMax;
  let rank = 0;
  let sMinNonzero = Infinity;
  for (const v of svdA.sigma) if (v > tol) {
    rank++;
    sMinNonzero = Math.min(sMinNonzero, v);
  }
  const k = rows - rank;
  const s = cols - rank;
  const status: Status = k > 0 ? 'unstable' : s > 0 ? 'indeterminate' : 'determinate';
  const mechanismModes = localiseBasis(nullBasis(svdAt, k)).map((d) => ({
    displacement: d,
    joints: movingJoints(d),
  }));
  const selfStressStates = localiseBasis(nullBasis(svdA, s)).map((t) => {
    const members: number[] = [];
    const reacts: number[] = [];
    t.forEach((v, c) => {
      if (Math.abs(v) > ZERO) (c < nM ? members : reacts).push(c < nM ? c : c - nM);
    });
    return { forces: t, members, reactions: reacts };
  });
  const redundant = new Set<number>();
  for (const st8 of selfStressStates) for (const e of st8.members) redundant.add(e);
  const rigidity = pebbleGame(st.nodeIds.length, st.from, st.to, st.supports);
  const specialGeometry = rigidity.genericMechanisms !== k || rigidity.genericSelfStress !== s;
  const conditioning = rank > 0 ? sMinNonzero / sMax : 0;
  const countRule = cols - rows;
  const base = {
    joints: st.nodeIds.length, members: nM, reactions: reactions.length, countRule, rank,
    mechanisms: k, selfStress: s, status, degree: k > 0 ? 0 : s,
    critical: countRule >= 0 && k > 0,
    conditioning, nearlyMechanism: k === 0 && conditioning < NEAR_MECHANISM,
    mechanismModes, selfStressStates,
    redundantMembers: [...redundant].sort((p, q) => p - q),
    reactionComponents: reactions, rigidity, specialGeometry,
  };
  return { ...base, findings: geometryFindings(st, base) };
}

function movingJoints(d: Float64Array): number[] {
  const out: number[] = [];
  for (let i = 0; i < d.length / 2; i++) if (Math.hypot(d[2 * i], d[2 * i + 1]) > ZERO) out.push(i);
  return out;
}
