/**
 * The (k = 2, l = 3) pebble game on a plane bar graph and its rigid-cluster decomposition
 * (D. J. Jacobs and B. Hendrickson, 1997, J. Comput. Phys. 137). Purely combinatorial:
 * no coordinates, no units. Used by `pebbleGame` (shared/engine/pebble-game.ts).
 */

const UNKNOWN = 0;
const RIGID = 1;
const FLOPPY = 2;

/**
 * Vertices holding two pebbles each; every accepted bar is directed and covered by one
 * pebble of its tail. A set of vertices closed under out-edges therefore has
 * 2·|set| − (bars inside it) free pebbles.
 */
export class PebbleGraph {
  /** Free pebbles per vertex (0, 1 or 2). */
  readonly pebbles: Int32Array;
  /** Current tail of each accepted bar. */
  readonly tail: number[] = [];
  /** Current head of each accepted bar. */
  readonly head: number[] = [];
  /** Accepted bars leaving each vertex (bar ids). */
  readonly out: number[][];
  private readonly seen: Int32Array;
  private readonly via: Int32Array;
  private stamp = 0;

  /** @param vertexCount - number of vertices, all starting with two free pebbles */
  constructor(readonly vertexCount: number) {
    this.pebbles = new Int32Array(vertexCount).fill(2);
    this.out = Array.from({ length: vertexCount }, () => []);
    this.seen = new Int32Array(vertexCount);
    this.via = new Int32Array(vertexCount);
  }

  /** Number of accepted (independent) bars. */
  get barCount(): number {
    return this.tail.length;
  }

  /** Total free pebbles: the generic degrees of freedom of the whole graph, trivial ones included. */
  freePebbles(): number {
    return this.pebbles.reduce((sum, p) => sum + p, 0);
  }

  /**
   * Tries to insert the bar a–b. It is independent when four pebbles can be gathered on
   * its ends; it is then accepted and covered by a pebble of a.
   * @returns the new bar id, or −1 when the bar is redundant (the graph is left as it was
   *   after the search, so `reach(a, b)` then gives its Laman circuit)
   */
  insert(a: number, b: number): number {
    if (!this.gather(a, b, 4)) return -1;
    const id = this.tail.length;
    this.tail.push(a);
    this.head.push(b);
    this.out[a].push(id);
    this.pebbles[a]--;
    return id;
  }

  /**
   * Moves free pebbles onto a and b until they hold `target` between them (at most 4).
   * @returns whether the target was reached
   */
  gather(a: number, b: number, target: number): boolean {
    for (;;) {
      if (this.pebbles[a] + this.pebbles[b] >= target) return true;
      if (this.pebbles[a] < 2 && this.pullTo(a, b)) continue;
      if (this.pebbles[b] < 2 && this.pullTo(b, a)) continue;
      return false;
    }
  }

  /** All vertices reachable from a or b along directed bars, a and b included. */
  reach(a: number, b: number): number[] {
    const found = a === b ? [a] : [a, b];
    const seen = new Set(found);
    for (let i = 0; i < found.length; i++) {
      for (const e of this.out[found[i]]) {
        if (!seen.has(this.head[e])) {
          seen.add(this.head[e]);
          found.push(this.head[e]);
        }
      }
    }
    return found;
  }

  /**
   * Depth-first search from w along directed bars, never entering `blocked`, for a vertex
   * with a free pebble; on success the pebble is moved to w by reversing the path.
   */
  private pullTo(w: number, blocked: number): boolean {
    const stamp = ++this.stamp;
    this.seen[w] = stamp;
    this.seen[blocked] = stamp;
    const stack = [w];
    while (stack.length > 0) {
      const y = stack.pop()!;
      for (const e of this.out[y]) {
        const x = this.head[e];
        if (this.seen[x] === stamp) continue;
        this.seen[x] = stamp;
        this.via[x] = e;
        if (this.pebbles[x] > 0) {
          this.movePebble(x, w);
          return true;
        }
        stack.push(x);
      }
    }
    return false;
  }

  /** Reverses the search path from w to x, carrying one pebble from x to w. */
  private movePebble(x: number, w: number): void {
    this.pebbles[x]--;
    for (let v = x; v !== w; ) {
      const e = this.via[v];
      const y = this.tail[e];
      this.out[y].splice(this.out[y].indexOf(e), 1);
      this.out[v].push(e);
      this.tail[e] = v;
      this.head[e] = y;
      v = y;
    }
    this.pebbles[w]++;
  }
}

/** Rigid clusters of the accepted bars of a finished pebble game. */
export interface ClusterDecomposition {
  /** Vertex ids of each cluster, ascending. */
  readonly vertices: number[][];
  /** Cluster index of each accepted bar. */
  readonly barCluster: Int32Array;
}

/**
 * Decomposes the accepted bars into rigid clusters (maximal generically rigid subgraphs;
 * every bar lies in exactly one, two clusters share at most one vertex). For each bar not
 * yet placed, three pebbles are pinned on its ends; a vertex is rigid with the bar when no
 * free pebble can be brought to it (Jacobs and Hendrickson 1997). Clusters grow outward
 * over neighbours, since a rigid cluster is connected. Clusters are numbered in the order
 * of their lowest bar id. Moves pebbles but keeps the game's state valid.
 */
export function rigidClusters(g: PebbleGraph): ClusterDecomposition {
  const n = g.vertexCount;
  const neighbours: number[][] = Array.from({ length: n }, () => []);
  for (let e = 0; e < g.barCount; e++) {
    neighbours[g.tail[e]].push(g.head[e]);
    neighbours[g.head[e]].push(g.tail[e]);
  }
  const barCluster = new Int32Array(g.barCount).fill(-1);
  const vertices: number[][] = [];
  for (let seed = 0; seed < g.barCount; seed++) {
    if (barCluster[seed] >= 0) continue;
    const u = g.tail[seed];
    const v = g.head[seed];
    if (!g.gather(u, v, 3)) throw new Error('pebble game: three pebbles not found on an accepted bar');
    const status = new Uint8Array(n);
    status[u] = RIGID;
    status[v] = RIGID;
    const members = [u, v];
    for (let i = 0; i < members.length; i++) {
      for (const z of neighbours[members[i]]) {
        if (status[z] !== UNKNOWN) continue;
        const region = pebbleFreeRegion(g, z, u, v, status);
        if (region === null) {
          status[z] = FLOPPY;
          continue;
        }
        for (const x of region) status[x] = RIGID;
        members.push(...region);
      }
    }
    const c = vertices.length;
    vertices.push(members.sort((a, b) => a - b));
    for (let e = seed; e < g.barCount; e++) {
      if (status[g.tail[e]] === RIGID && status[g.head[e]] === RIGID) barCluster[e] = c;
    }
  }
  return { vertices, barCluster };
}

/**
 * Searches from z (never entering u or v, whose three pebbles are pinned) for a free
 * pebble. Vertices already marked RIGID reach none and are skipped; reaching a FLOPPY one
 * counts as finding a pebble, as nothing moves during one cluster's tests.
 * @returns the searched region (z included) when it holds no free pebble, else null
 */
function pebbleFreeRegion(
  g: PebbleGraph,
  z: number,
  u: number,
  v: number,
  status: Uint8Array,
): number[] | null {
  if (g.pebbles[z] > 0) return null;
  const seen = new Set([u, v, z]);
  const region = [z];
  for (let i = 0; i < region.length; i++) {
    for (const e of g.out[region[i]]) {
      const x = g.head[e];
      if (seen.has(x) || status[x] === RIGID) continue;
      if (g.pebbles[x] > 0 || status[x] === FLOPPY) return null;
      seen.add(x);
      region.push(x);
    }
  }
  return region;
}
