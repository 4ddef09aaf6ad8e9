/**
 * A small builder for family topologies: joints placed by fractions of the span and of the local
 * depth, members by joint id with ids from their group, and the one geometry routine all families
 * share. Lengths in metres.
 */
import type { SupportDef } from '../engine/structure';
import type { FamilyTopology, MemberGroup } from './types';

/** A family topology that also knows where its joints sit, independent of the dimensions. */
export interface LaidOutTopology extends FamilyTopology {
  /** x / span of each joint (0 = left end, 1 = right end). */
  readonly xi: Float64Array;
  /** Height fraction at the joint's xi: 0 on the bottom outline, 1 on the top outline. */
  readonly eta: Float64Array;
}

/**
 * Height of an outline at xi = x / span, metres, from the shape constants `k` a family's
 * `prepare` wrote (depth, rise...). Must not allocate.
 */
export type Outline = (xi: number, k: Float64Array) => number;

/** Member id prefix per group: TC1.., BC1.., D1.., V1.., L1.., W1... */
export const GROUP_PREFIX: Readonly<Record<MemberGroup, string>> = {
  top: 'TC', bottom: 'BC', diagonal: 'D', vertical: 'V', link: 'L', web: 'W',
};

/** Joints within this fraction of the span count as one column when ordering. */
const SAME_COLUMN = 1e-9;

/** Collects joints, members and supports, then numbers the joints along the span. */
export class TopologyBuilder {
  private readonly ids: string[] = [];
  private readonly index = new Map<string, number>();
  private readonly xi: number[] = [];
  private readonly eta: number[] = [];
  private readonly ends: [number, number][] = [];
  private readonly groups: MemberGroup[] = [];
  private readonly supports: { node: number; kind: 'pin' | 'roller'; angle: number }[] = [];

  /** Add a joint at x = xi · span, y = bottom + eta · (top − bottom); returns its id. */
  joint(id: string, xi: number, eta: number): string {
    if (this.index.has(id)) throw new RangeError(`joint ${id} defined twice`);
    this.index.set(id, this.ids.length);
    this.ids.push(id);
    this.xi.push(xi);
    this.eta.push(eta);
    return id;
  }

  /** Add a member between two joints (by id) in a group. */
  bar(a: string, b: string, group: MemberGroup): void {
    const i = this.at(a);
    const j = this.at(b);
    if (i === j) throw new RangeError(`member from ${a} to itself`);
    this.ends.push([i, j]);
    this.groups.push(group);
  }

  /** Add a chain of members through the joints, in order. */
  chain(ids: readonly string[], group: MemberGroup): void {
    for (let k = 1; k < ids.length; k++) this.bar(ids[k - 1], ids[k], group);
  }

  /** Add a support; `angleDeg` is the roller's reaction direction from +x, degrees. */
  support(id: string, kind: 'pin' | 'roller', angleDeg = 90): void {
    this.supports.push({ node: this.at(id), kind, angle: kind === 'roller' ? (angleDeg * Math.PI) / 180 : 0 });
  }

  /** Number the joints left to right (bottom before top within a column) and freeze. */
  build(topChord: readonly string[], bottomChord: readonly string[]): LaidOutTopology {
    const n = this.ids.length;
    const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => {
      const dx = this.xi[a] - this.xi[b];
      if (Math.abs(dx) > SAME_COLUMN) return dx;
      return this.eta[a] - this.eta[b] || a - b;
    });
    const newIndex = new Int32Array(n);
    order.forEach((old, k) => { newIndex[old] = k; });
    const counters: Partial<Record<MemberGroup, number>> = {};
    const memberIds = this.groups.map((g) => {
      counters[g] = (counters[g] ?? 0) + 1;
      return `${GROUP_PREFIX[g]}${counters[g]}`;
    });
    const remap = (ids: readonly string[]) => Int32Array.from(ids, (id) => newIndex[this.at(id)]);
    const supports: SupportDef[] = this.supports.map((s) => ({ ...s, node: newIndex[s.node] }));
    return {
      nodeIds: order.map((old) => this.ids[old]),
      memberIds,
      from: Int32Array.from(this.ends, ([a]) => newIndex[a]),
      to: Int32Array.from(this.ends, ([, b]) => newIndex[b]),
      supports,
      groups: [...this.groups],
      topChord: remap(topChord),
      bottomChord: remap(bottomChord),
      xi: Float64Array.from(order, (old) => this.xi[old]),
      eta: Float64Array.from(order, (old) => this.eta[old]),
    };
  }

  private at(id: string): number {
    const i = this.index.get(id);
    if (i === undefined) throw new RangeError(`no joint ${id}`);
    return i;
  }
}

/**
 * Fill coordinates, metres: x = xi · span, y = bottom(xi) + eta · (top(xi) − bottom(xi)).
 * Allocates nothing; `top` and `bottom` must be module-level functions reading the constants `k`.
 */
export function fillLayout(
  topo: FamilyTopology, span: number, k: Float64Array, top: Outline, bottom: Outline,
  x: Float64Array, y: Float64Array,
): void {
  const t = topo as Partial<LaidOutTopology>;
  const xi = t.xi;
  const eta = t.eta;
  if (!xi || !eta) throw new RangeError('topology was not built by a family generator');
  const n = xi.length;
  if (x.length < n || y.length < n) throw new RangeError(`coordinate buffers shorter than ${n} joints`);
  for (let i = 0; i < n; i++) {
    const b = bottom(xi[i], k);
    x[i] = xi[i] * span;
    y[i] = eta[i] === 0 ? b : b + eta[i] * (top(xi[i], k) - b);
  }
}

/** Ids "<prefix><from>".."<prefix><to>" inclusive, e.g. ids('B', 0, 3) = B0, B1, B2, B3. */
export function ids(prefix: string, from: number, to: number): string[] {
  const out: string[] = [];
  for (let i = from; i <= to; i++) out.push(`${prefix}${i}`);
  return out;
}
