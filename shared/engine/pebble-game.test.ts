import { describe, expect, it } from 'vitest';
import { pebbleGame, type RigidityReport } from './pebble-game';
import type { SupportDef } from './structure';

// Parallel-chord Pratt truss with end verticals: bottom joints 0..P, top joints P+1..2P+1.
// The pebble game needs only the topology, so no coordinates are built.
const bottom = (i: number) => i;
const top = (P: number, i: number) => P + 1 + i;
const diagonal = (P: number, i: number): [number, number] =>
  i < P / 2 ? [top(P, i), bottom(i + 1)] : [bottom(i), top(P, i + 1)];
const counter = (P: number, i: number): [number, number] =>
  i < P / 2 ? [bottom(i), top(P, i + 1)] : [top(P, i), bottom(i + 1)];

function pratt(P: number): [number, number][] {
  const bars: [number, number][] = [];
  for (let i = 0; i < P; i++) bars.push([bottom(i), bottom(i + 1)]);
  for (let i = 0; i < P; i++) bars.push([top(P, i), top(P, i + 1)]);
  for (let i = 0; i <= P; i++) bars.push([bottom(i), top(P, i)]);
  for (let i = 0; i < P; i++) bars.push(diagonal(P, i));
  return bars;
}
const same = (x: [number, number], y: [number, number]) =>
  (x[0] === y[0] && x[1] === y[1]) || (x[0] === y[1] && x[1] === y[0]);
const indexOf = (bars: [number, number][], bar: [number, number]) => bars.findIndex((b) => same(b, bar));
const pin = (node: number): SupportDef => ({ node, kind: 'pin', angle: 0 });
const roller = (node: number, angle = Math.PI / 2): SupportDef => ({ node, kind: 'roller', angle });
const reactions = (s: readonly SupportDef[]) => s.reduce((r, d) => r + (d.kind === 'pin' ? 2 : 1), 0);

function run(n: number, bars: [number, number][], supports: SupportDef[]): RigidityReport {
  const rep = pebbleGame(n, Int32Array.from(bars, (b) => b[0]), Int32Array.from(bars, (b) => b[1]), supports);
  // Calladine (1978), extension of Maxwell's rule: m + r − 2j = s − k, every model.
  expect(bars.length + reactions(supports) - 2 * n).toBe(rep.genericSelfStress - rep.genericMechanisms);
  // Rigid components partition the bars (Jacobs and Hendrickson 1997): each member in one cluster.
  for (let e = 0; e < bars.length; e++) {
    const holding = rep.clusters.filter((c) => c.members.includes(e));
    expect(holding).toHaveLength(1);
    expect(holding[0].joints).toEqual(expect.arrayContaining(bars[e]));
  }
  const ground = rep.clusters.filter((c) => c.grounded);
  expect(ground.length).toBeLessThanOrEqual(1);
  const anchored = new Set(ground.flatMap((c) => c.joints));
  expect(rep.looseJoints).toEqual([...Array(n).keys()].filter((j) => !anchored.has(j)));
  return rep;
}
const clusterOf = (rep: RigidityReport, e: number) => rep.clusters.findIndex((c) => c.members.includes(e));

describe('pebbleGame on a 4-panel Pratt truss (10 joints)', () => {
  const P = 4;
  const n = 2 * P + 2;
  const bars = pratt(P);
  const all = [...Array(n).keys()];

  it('pin + roller: statically determinate and rigid', () => {
    const rep = run(n, bars, [pin(bottom(0)), roller(bottom(P))]);
    expect(bars.length, "Laman's theorem: m = 2j − 3 bars for minimal rigidity").toBe(2 * n - 3);
    expect(rep.genericMechanisms, "Laman's theorem: minimally rigid, 3 reactions fix it").toBe(0);
    expect(rep.genericSelfStress, 'Maxwell count m + r = 2j with k = 0 gives s = 0').toBe(0);
    expect(rep.overBracedMembers).toEqual([]);
    // Pebble game paper: one rigid cluster holding every bar, attached to the ground.
    expect(rep.clusters).toEqual([{ joints: all, members: [...bars.keys()], grounded: true }]);
    expect(rep.looseJoints).toEqual([]);
  });

  it('pin + pin: one redundant bar', () => {
    const rep = run(n, bars, [pin(bottom(0)), pin(bottom(P))]);
    expect(rep.genericMechanisms, 'statics common practice: pin-pin is stable').toBe(0);
    expect(rep.genericSelfStress, 'statics common practice: externally indeterminate to degree 1').toBe(1);
    expect(rep.redundantMembers.length + rep.redundantReactions.length, 'pebble game paper').toBe(1);
    expect(rep.clusters.map((c) => c.grounded)).toEqual([true]);
  });

  it('a panel without its diagonal: one mechanism, the two sides are separate clusters', () => {
    const cut = bars.filter((b) => !same(b, diagonal(P, 1)));
    const rep = run(n, cut, [pin(bottom(0)), roller(bottom(P))]);
    expect(rep.genericMechanisms, "Laman's theorem: 2j − 4 bars leave one degree of freedom").toBe(1);
    expect(rep.genericSelfStress, "Laman's theorem: no subset over-counted").toBe(0);
    // Pebble game paper: panel 0 (left) and panels 2–3 (right) are rigid, but not together.
    const left = clusterOf(rep, indexOf(cut, [bottom(0), bottom(1)]));
    const right = clusterOf(rep, indexOf(cut, [bottom(3), bottom(4)]));
    expect(left).not.toBe(right);
    expect(rep.clusters[left].joints).toEqual([bottom(0), bottom(1), top(P, 0), top(P, 1)]);
    expect(rep.clusters[right].joints).toEqual([2, 3, 4, 7, 8, 9]);
    expect(rep.clusters[left].grounded || rep.clusters[right].grounded).toBe(false);
    // Statics common practice: a single pin leaves the left side free to turn about it.
    expect(rep.looseJoints).toEqual(all.filter((j) => j !== bottom(0)));
    expect(rep.clusters[0]).toEqual({ joints: [bottom(0)], members: [], grounded: true });
  });

  it('a panel with two crossing diagonals: over-bracing confined to that panel', () => {
    const braced = [...bars, counter(P, 2)];
    const rep = run(n, braced, [pin(bottom(0)), roller(bottom(P))]);
    expect(rep.genericMechanisms, "Laman's theorem").toBe(0);
    expect(rep.genericSelfStress, "Laman's theorem: 6 bars on 4 joints exceed 2·4 − 3").toBe(1);
    expect(rep.redundantMembers, 'pebble game paper: the last bar of the circuit fails').toEqual([braced.length - 1]);
    const panel: [number, number][] = [
      [bottom(2), bottom(3)], [top(P, 2), top(P, 3)], [bottom(2), top(P, 2)],
      [bottom(3), top(P, 3)], diagonal(P, 2), counter(P, 2),
    ];
    const expected = panel.map((b) => indexOf(braced, b)).sort((a, b) => a - b);
    expect(rep.overBracedMembers, "Laman's theorem: the circuit is the K4 of panel 2").toEqual(expected);
  });

  it('roller + roller: one mechanism', () => {
    const rep = run(n, bars, [roller(bottom(0)), roller(bottom(P))]);
    expect(rep.genericMechanisms, 'generic count: 2 reaction bars cannot fix 3 rigid-body motions').toBe(1);
    expect(rep.genericSelfStress).toBe(0);
    expect(rep.clusters.map((c) => c.grounded), 'pebble game paper').toEqual([false]);
    expect(rep.looseJoints).toEqual(all);
  });

  it('three rollers on three joints fix the truss; two rollers on one joint act as a pin', () => {
    const three = run(n, bars, [roller(bottom(0)), roller(bottom(P)), roller(top(P, P), 0)]);
    // Statics common practice: three reactions, neither parallel nor concurrent (generic), fix a body.
    expect([three.genericMechanisms, three.genericSelfStress]).toEqual([0, 0]);
    const twoAtOne = run(n, bars, [roller(bottom(0), 0), roller(bottom(0)), roller(bottom(P))]);
    // Statics common practice: two non-parallel rollers at one joint restrain it like a pin.
    expect([twoAtOne.genericMechanisms, twoAtOne.genericSelfStress]).toEqual([0, 0]);
  });

  it('no supports: three rigid-body motions', () => {
    const rep = run(n, bars, []);
    expect(rep.genericMechanisms, "Laman's theorem: a free rigid body keeps 3 motions").toBe(3);
    expect(rep.clusters, 'pebble game paper').toEqual([{ joints: all, members: [...bars.keys()], grounded: false }]);
  });

  it('pin + roller on the same joint: the third component is redundant, the truss turns', () => {
    const rep = run(n, bars, [pin(bottom(0)), roller(bottom(0))]);
    expect(rep.genericMechanisms, 'statics common practice: rotation about the joint is free').toBe(1);
    expect(rep.redundantReactions, 'generic count: a joint has only 2 degrees of freedom').toEqual([2]);
    expect(rep.redundantMembers).toEqual([]);
    expect(rep.looseJoints).toEqual(all.slice(1));
  });

  it('two pins on one joint: two redundant components', () => {
    const rep = run(n, bars, [pin(bottom(0)), pin(bottom(0))]);
    expect(rep.redundantReactions, 'generic count: 4 reaction bars on one joint with 2 freedoms').toEqual([2, 3]);
    expect(rep.genericMechanisms).toBe(1);
  });
});

describe('pebbleGame on small frames', () => {
  it('a triangle with one joint hanging by one bar', () => {
    const bars: [number, number][] = [[0, 1], [1, 2], [0, 2], [2, 3]];
    const rep = run(4, bars, [pin(0), roller(1)]);
    expect(rep.genericMechanisms, "Laman's theorem: the hanging joint keeps 1 freedom").toBe(1);
    expect(rep.genericSelfStress).toBe(0);
    expect(rep.looseJoints).toEqual([3]);
    expect(rep.clusters, 'pebble game paper').toEqual([
      { joints: [0, 1, 2], members: [0, 1, 2], grounded: true },
      { joints: [2, 3], members: [3], grounded: false },
    ]);
  });

  it('edge cases: empty frame, an isolated joint, a doubled bar', () => {
    const empty = run(0, [], []);
    expect([empty.genericMechanisms, empty.clusters.length], 'nothing to move').toEqual([0, 0]);
    const lone = run(1, [], []);
    expect(lone.genericMechanisms, 'a free joint has 2 freedoms, not 3').toBe(2);
    expect(lone.clusters).toEqual([{ joints: [0], members: [], grounded: false }]);
    const doubled = run(2, [[0, 1], [1, 0]], [pin(0), roller(1)]);
    expect([doubled.genericSelfStress, doubled.genericMechanisms], "Laman's theorem: 2 bars on 2 joints").toEqual([1, 0]);
    expect(doubled.overBracedMembers).toEqual([0, 1]);
  });

  it('rejects bad input', () => {
    expect(() => pebbleGame(2, Int32Array.of(0), Int32Array.of(0), [])).toThrow(RangeError);
    expect(() => pebbleGame(2, Int32Array.of(0), Int32Array.of(2), [])).toThrow(RangeError);
    expect(() => pebbleGame(2, new Int32Array(0), new Int32Array(0), [pin(5)])).toThrow(RangeError);
  });
});

// Brute force by the definition. Laman's theorem applied to the frame plus the ground as a
// rigid body, each reaction line meeting it at its own point, reduces to: a set F of members
// and reaction bars is independent iff every joint set X with |X| ≥ 2 spans at most 2|X| − 3
// members of F, and every non-empty X has at most 2|X| members and reactions of F.
type Item = [number, number]; // [a, b] a member, [a, -1] a reaction at a
const popcount = (x: number) => {
  let c = 0;
  for (; x; x &= x - 1) c++;
  return c;
};
function lamanRank(n: number, items: Item[]): number {
  const inside = new Int32Array(1 << n);
  const touching = new Int32Array(1 << n);
  for (let X = 1; X < 1 << n; X++) {
    items.forEach(([a, b], i) => {
      if (b < 0 && X & (1 << a)) touching[X] |= 1 << i;
      if (b >= 0 && X & (1 << a) && X & (1 << b)) inside[X] |= 1 << i;
    });
  }
  const independent = (F: number) => {
    for (let X = 1; X < 1 << n; X++) {
      const k = popcount(X);
      const spanned = popcount(F & inside[X]);
      if ((k >= 2 && spanned > 2 * k - 3) || spanned + popcount(F & touching[X]) > 2 * k) return false;
    }
    return true;
  };
  let best = 0;
  for (let F = 1; F < 1 << items.length; F++) if (popcount(F) > best && independent(F)) best = popcount(F);
  return best;
}

function randomFrame(seed: number, maxJoints: number, maxItems: number) {
  let s = seed >>> 0; // mulberry32
  const rand = (k: number) => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t ^= t + Math.imul(t ^ (t >>> 7), 61 | t);
    return Math.floor((((t ^ (t >>> 14)) >>> 0) / 4294967296) * k);
  };
  const n = 2 + rand(maxJoints - 1);
  const supports = Array.from({ length: rand(3) }, () => (rand(2) ? pin(rand(n)) : roller(rand(n))));
  const bars: [number, number][] = [];
  for (let m = rand(maxItems - reactions(supports) + 1); bars.length < m; ) {
    const a = rand(n);
    const b = rand(n);
    if (a !== b) bars.push([a, b]);
  }
  const items: Item[] = [...supports.flatMap((d) => Array<Item>(d.kind === 'pin' ? 2 : 1).fill([d.node, -1])), ...bars];
  return { n, bars, supports, items };
}

describe('pebbleGame against a brute-force Laman count on random frames', () => {
  it('degrees of freedom and redundant bars (up to 7 joints)', () => {
    for (let seed = 1; seed <= 60; seed++) {
      const { n, bars, supports, items } = randomFrame(seed, 7, 13);
      const rep = run(n, bars, supports);
      const rank = lamanRank(n, items);
      expect(rep.genericSelfStress, `Laman's theorem, seed ${seed}`).toBe(items.length - rank);
      expect(rep.genericMechanisms, `Laman's theorem, seed ${seed}`).toBe(2 * n - rank);
    }
  });

  it('over-braced members, rigid clusters and grounding (up to 5 joints)', () => {
    for (let seed = 101; seed <= 140; seed++) {
      const { n, bars, supports, items } = randomFrame(seed, 5, 9);
      const rep = run(n, bars, supports);
      const rank = lamanRank(n, items);
      const offset = items.length - bars.length;
      // Laman's theorem: a bar lies in some circuit iff removing it keeps the rank.
      const overBraced = bars.map((_, e) => e).filter((e) => lamanRank(n, items.toSpliced(offset + e, 1)) === rank);
      expect(rep.overBracedMembers, `Laman's theorem, seed ${seed}`).toEqual(overBraced);
      for (let a = 0; a < n; a++) {
        // Laman's theorem: a joint is fixed to the ground iff a pin there adds no rank.
        const fixed = lamanRank(n, [...items, [a, -1], [a, -1]]) === rank;
        expect(rep.looseJoints.includes(a), `Laman's theorem, seed ${seed}, joint ${a}`).toBe(!fixed);
        for (let b = a + 1; b < n; b++) {
          // Laman's theorem: two joints are rigid together iff a bar between them adds no rank.
          const rigid = lamanRank(n, [...items, [a, b]]) === rank;
          const together = rep.clusters.some((c) => c.joints.includes(a) && c.joints.includes(b));
          expect(together, `Laman's theorem, seed ${seed}, joints ${a}–${b}`).toBe(rigid);
        }
      }
    }
  });
});
