/**
 * Generic rigidity of a plane pin-jointed truss on its supports by the pebble game
 * (G. Laman, 1970, J. Eng. Math. 4; D. J. Jacobs and B. Hendrickson, 1997, J. Comput.
 * Phys. 137). Depends only on the topology: coordinates and roller angles are not used,
 * so the answer holds for joints and reaction lines in general position. Where it
 * disagrees with the rank of the equilibrium matrix, the geometry is special.
 */
import { reactionCount, type SupportDef } from './structure';
import { PebbleGraph, rigidClusters } from './pebble-clusters';

/** Generic rigidity of a truss on its supports. Counts and indices only: no units. */
export interface RigidityReport {
  /** Generic degrees of freedom left after the ground is fixed (generic k). */
  genericMechanisms: number;
  /** Bars (members + reaction bars) that are generically redundant (generic s). */
  genericSelfStress: number;
  /** Member indices that failed independent insertion in the game (one redundant set). */
  redundantMembers: number[];
  /** Support component indices (order: supports in order, a pin gives 2 components x then y, a roller 1) found redundant. */
  redundantReactions: number[];
  /** Member indices lying in over-braced regions (in some Laman circuit with a redundant bar). */
  overBracedMembers: number[];
  /** Rigid clusters (maximal generically rigid sub-frames) of members, each with its joints; grounded = rigidly attached to the ground. */
  clusters: { joints: number[]; members: number[]; grounded: boolean }[];
  /** Joints not rigidly attached to the ground (the under-braced region). */
  looseJoints: number[];
}

type Cluster = RigidityReport['clusters'][number];

/**
 * Pebble game on the bar graph with the ground as a rigid body.
 *
 * The ground is a minimally rigid graph on max(3, r) ground vertices (a triangle, each
 * further vertex braced to the first two), inserted first. Reaction component c becomes
 * one bar from its joint to ground vertex c, so every reaction line meets the ground at
 * its own point: three rollers on distinct joints fix a rigid body, two rollers on one
 * joint act as a pin, a third component on one joint is redundant. Members follow in
 * index order; which bar of a circuit is named redundant depends on that order.
 *
 * @param nJoints - number of joints
 * @param from - start joint index of each member
 * @param to - end joint index of each member
 * @param supports - supports in order; only `node` and `kind` are used
 * @returns counts, one redundant set, over-braced members, rigid clusters and loose joints
 * @throws RangeError when an index is out of range or a member joins a joint to itself
 */
export function pebbleGame(
  nJoints: number,
  from: Int32Array,
  to: Int32Array,
  supports: readonly SupportDef[],
): RigidityReport {
  checkInput(nJoints, from, to, supports);
  const reactionJoints = supports.flatMap((s) => Array<number>(reactionCount(s)).fill(s.node));
  const groundCount = Math.max(3, reactionJoints.length);
  const ground = (i: number) => nJoints + i;
  const g = new PebbleGraph(nJoints + groundCount);

  for (const [a, b] of groundBars(groundCount)) {
    if (g.insert(ground(a), ground(b)) < 0) throw new Error('pebble game: ground body not rigid');
  }
  const circuits: number[][] = [];
  const redundantReactions: number[] = [];
  reactionJoints.forEach((joint, c) => {
    if (g.insert(joint, ground(c)) >= 0) return;
    redundantReactions.push(c);
    circuits.push(g.reach(joint, ground(c)));
  });
  const memberBar = new Int32Array(from.length);
  const redundantMembers: number[] = [];
  for (let e = 0; e < from.length; e++) {
    memberBar[e] = g.insert(from[e], to[e]);
    if (memberBar[e] >= 0) continue;
    redundantMembers.push(e);
    circuits.push(g.reach(from[e], to[e]));
  }
  const genericMechanisms = g.freePebbles() - 3;
  const { clusters, groundJoints } = memberClusters(g, nJoints, from, to, memberBar);
  return {
    genericMechanisms,
    genericSelfStress: redundantMembers.length + redundantReactions.length,
    redundantMembers,
    redundantReactions,
    overBracedMembers: membersInside(g.vertexCount, circuits, from, to),
    clusters,
    looseJoints: range(nJoints).filter((j) => !groundJoints.has(j)),
  };
}

/** Bars of a minimally rigid ground body on `count` ≥ 3 vertices (Henneberg extensions of a triangle). */
function groundBars(count: number): [number, number][] {
  const bars: [number, number][] = [[0, 1], [1, 2], [0, 2]];
  for (let i = 3; i < count; i++) bars.push([i, 0], [i, 1]);
  return bars;
}

/** Members with both ends in one of the circuits (vertex sets), ascending. */
function membersInside(vertexCount: number, circuits: number[][], from: Int32Array, to: Int32Array): number[] {
  const inside = new Uint8Array(from.length);
  const mark = new Uint8Array(vertexCount);
  for (const circuit of circuits) {
    for (const v of circuit) mark[v] = 1;
    for (let e = 0; e < from.length; e++) if (mark[from[e]] && mark[to[e]]) inside[e] = 1;
    for (const v of circuit) mark[v] = 0;
  }
  return range(from.length).filter((e) => inside[e] === 1);
}

/**
 * Rigid clusters as reported: the ground cluster first (when it holds a joint), then
 * every cluster with a member in order of its lowest member, then each joint in no such
 * cluster on its own. Redundant members join the cluster holding both their ends.
 */
function memberClusters(
  g: PebbleGraph,
  nJoints: number,
  from: Int32Array,
  to: Int32Array,
  memberBar: Int32Array,
): { clusters: Cluster[]; groundJoints: Set<number> } {
  const { vertices, barCluster } = rigidClusters(g);
  const groundCluster = barCluster[0];
  const joints = vertices.map((vs) => vs.filter((v) => v < nJoints));
  const members: number[][] = vertices.map(() => []);
  for (let e = 0; e < from.length; e++) {
    const c = memberBar[e] >= 0 ? barCluster[memberBar[e]] : clusterWith(vertices, from[e], to[e]);
    members[c].push(e);
  }
  const reported = range(vertices.length).filter((c) => members[c].length > 0 && c !== groundCluster);
  reported.sort((a, b) => members[a][0] - members[b][0]);
  if (joints[groundCluster].length > 0) reported.unshift(groundCluster);
  const clusters: Cluster[] = reported.map((c) => ({
    joints: joints[c],
    members: members[c],
    grounded: c === groundCluster,
  }));
  const covered = new Set(clusters.flatMap((c) => c.joints));
  for (let j = 0; j < nJoints; j++) {
    if (!covered.has(j)) clusters.push({ joints: [j], members: [], grounded: false });
  }
  return { clusters, groundJoints: new Set(joints[groundCluster]) };
}

/** The cluster holding both a and b (unique: two clusters share at most one vertex). */
function clusterWith(vertices: number[][], a: number, b: number): number {
  const c = vertices.findIndex((vs) => vs.includes(a) && vs.includes(b));
  if (c < 0) throw new Error('pebble game: redundant member outside every rigid cluster');
  return c;
}

function checkInput(nJoints: number, from: Int32Array, to: Int32Array, supports: readonly SupportDef[]): void {
  if (!Number.isInteger(nJoints) || nJoints < 0) throw new RangeError(`pebbleGame: bad joint count ${nJoints}`);
  if (from.length !== to.length) throw new RangeError('pebbleGame: from and to differ in length');
  const isJoint = (j: number) => Number.isInteger(j) && j >= 0 && j < nJoints;
  for (let e = 0; e < from.length; e++) {
    if (!isJoint(from[e]) || !isJoint(to[e])) throw new RangeError(`pebbleGame: member ${e} has a bad joint index`);
    if (from[e] === to[e]) throw new RangeError(`pebbleGame: member ${e} joins joint ${from[e]} to itself`);
  }
  supports.forEach((s, i) => {
    if (!isJoint(s.node)) throw new RangeError(`pebbleGame: support ${i} has a bad joint index`);
  });
}

function range(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}
