/**
 * Drawing coordinates: SVG user units ARE model length units, with y negated (y up on screen),
 * so the truss keeps its true proportions under any container size. Decorations (supports,
 * arrows, labels) are sized in "nominal pixels" of `u` model units each.
 */
import type { Extent, Pt, Scene } from './scene';

/** Default deflection: the largest displacement drawn as this share of the span, percent. */
export const DEFAULT_PERCENT = 5;
/** Mechanism amplitude: the largest mode component moves this share of the span. */
export const MODE_AMPLITUDE = 0.06;

/** Joint positions moved by `f` times the displacements `by` (the nodes themselves when there is nothing to add). */
export function shifted(nodes: Map<string, Pt>, by: Map<string, Pt> | undefined, f: number): Map<string, Pt> {
  if (!by || f === 0) return nodes;
  return new Map([...nodes].map(([id, p]) => {
    const d = by.get(id);
    return [id, d ? { x: p.x + f * d.x, y: p.y + f * d.y } : p];
  }));
}

/** Nominal pixels across the larger side of the truss. */
const NOMINAL_WIDTH = 760;

/** Glyph sizes in nominal pixels. */
export const SIZE = {
  joint: 2.8,
  supportDepth: 24,
  supportHalf: 14,
  arrowMin: 18,
  arrowMax: 56,
  arrowHead: 7,
  label: 10,
  tooltip: 11.5,
  pad: 14,
} as const;

/** Model units per nominal pixel. */
export function unitOf(extent: Extent): number {
  return (Math.max(extent.w, extent.h) || 1) / NOMINAL_WIDTH;
}

/** Screen point of a model point (y flipped). */
export const sx = (p: Pt) => p.x;
export const sy = (p: Pt) => -p.y;

/** Arrow length of a load of magnitude `m`, model units. */
export function arrowLength(m: number, maxLoad: number, u: number): number {
  if (maxLoad <= 0) return 0;
  return u * (SIZE.arrowMin + (SIZE.arrowMax - SIZE.arrowMin) * (m / maxLoad));
}

/** Rotate (x, y) in screen axes by `deg` counter-clockwise as seen on screen. */
export function rotateScreen(x: number, y: number, deg: number): [number, number] {
  const r = (-deg * Math.PI) / 180;
  return [x * Math.cos(r) - y * Math.sin(r), x * Math.sin(r) + y * Math.cos(r)];
}

/** Box of everything drawn, screen coordinates; `shapes` are other joint positions drawn (deflected, animation extremes), loads included. */
export function viewBoxOf(scene: Scene, u: number, shapes: readonly Map<string, Pt>[] = []): [number, number, number, number] {
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  const add = (x: number, y: number) => {
    x0 = Math.min(x0, x); x1 = Math.max(x1, x); y0 = Math.min(y0, y); y1 = Math.max(y1, y);
  };
  const all = [scene.nodes, ...shapes];
  for (const shape of all) for (const p of shape.values()) add(sx(p), sy(p));
  for (const s of scene.supports) {
    const p = scene.nodes.get(s.node);
    if (!p) continue;
    for (const [cx, cy] of [[-SIZE.supportHalf, 0], [SIZE.supportHalf, 0], [-SIZE.supportHalf, SIZE.supportDepth], [SIZE.supportHalf, SIZE.supportDepth]]) {
      const [rx, ry] = rotateScreen(cx * u, cy * u, s.angle - 90);
      add(sx(p) + rx, sy(p) + ry);
    }
  }
  for (const shape of all) for (const l of scene.loads) {
    const p = shape.get(l.node);
    if (!p) continue;
    const len = arrowLength(l.magnitude, scene.maxLoad, u) + SIZE.label * 1.6 * u;
    add(sx(p) - (l.fx / l.magnitude) * len, sy(p) + (l.fy / l.magnitude) * len);
  }
  const pad = SIZE.pad * u;
  return [x0 - pad, y0 - pad, x1 - x0 + 2 * pad, y1 - y0 + 2 * pad];
}
