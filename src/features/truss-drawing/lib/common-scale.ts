/**
 * One scale for several drawings side by side (comparing variants): the glyph unit of the
 * largest truss, and a view box that holds every truss as drawn by default (supports, loads,
 * the deflected shape at the default share of the span, the first mechanism at full swing).
 * Given the same box and the same width, every drawing shows a metre at the same length.
 */
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { buildScene } from './scene';
import { DEFAULT_PERCENT, MODE_AMPLITUDE, shifted, unitOf, viewBoxOf } from './layout';

export interface DrawingScale {
  /** View box [x, y, width, height], model length units with y down (screen). */
  box: [number, number, number, number];
  /** Model length units per nominal pixel of glyphs (supports, arrows, labels). */
  u: number;
}

export interface ScaledItem {
  model: Model;
  analysis?: AnalysisJson;
  loading?: string;
}

export function commonScale(items: readonly ScaledItem[]): DrawingScale {
  const scenes = items.map((i) => buildScene(i.model, i.analysis, i.loading));
  const u = Math.max(...scenes.map((s) => unitOf(s.extent)), Number.MIN_VALUE);
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const scene of scenes) {
    const shapes = [];
    const mode = scene.modes[0];
    if (mode) for (const f of [MODE_AMPLITUDE * scene.span, -MODE_AMPLITUDE * scene.span]) shapes.push(shifted(scene.nodes, mode, f));
    if (scene.displacements && scene.maxDisp > 0) shapes.push(shifted(scene.nodes, scene.displacements, ((DEFAULT_PERCENT / 100) * scene.span) / scene.maxDisp));
    const [bx, by, bw, bh] = viewBoxOf(scene, u, shapes);
    [x0, y0, x1, y1] = [Math.min(x0, bx), Math.min(y0, by), Math.max(x1, bx + bw), Math.max(y1, by + bh)];
  }
  if (!scenes.length) return { box: [0, -1, 1, 1], u: 1 };
  return { box: [x0, y0, x1 - x0, y1 - y0], u };
}
