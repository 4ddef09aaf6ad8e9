/**
 * Everything the drawing shows, derived once from a model and (optionally) its analysis JSON:
 * joints, members with force and sign, supports, the loading's joint loads, displacements,
 * mechanism modes and the panels the findings name. Values stay in the model's units.
 */
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { loadingLoads, resolveLoading, type LoadingRef } from './loading-loads';

export interface Pt { x: number; y: number }
export type ForceSign = 'tension' | 'compression' | 'zero' | 'unknown';

export interface SceneMember {
  id: string;
  from: string;
  to: string;
  /** Model length unit. */
  length: number;
  /** Model force unit, tension positive; undefined when there are no forces (unstable frame). */
  force?: number;
  sign: ForceSign;
}
export interface SceneSupport { node: string; kind: 'pin' | 'roller'; /** Reaction direction, degrees from +x CCW. */ angle: number }
export interface SceneLoad { node: string; fx: number; fy: number; magnitude: number }
export interface Extent { x0: number; y0: number; x1: number; y1: number; w: number; h: number }

export interface Scene {
  nodes: Map<string, Pt>;
  members: SceneMember[];
  supports: SceneSupport[];
  loads: SceneLoad[];
  maxLoad: number;
  extent: Extent;
  /** Horizontal extent (or vertical when the frame is a column), model length unit. */
  span: number;
  units: { length: string; force: string };
  loading?: LoadingRef;
  /** Largest |force|, model force unit (0 without forces). */
  peak: number;
  displacements?: Map<string, Pt>;
  maxDisp: number;
  maxDispNode?: string;
  /** Mechanism modes, normalised so the largest component is 1. */
  modes: Map<string, Pt>[];
  unbracedPanels: string[][];
  doubleBracedPanels: string[][];
  overBraced: Set<string>;
  status?: string;
}

/** Forces within this fraction of the peak are drawn as zero-force members. */
export const ZERO_FRACTION = 1e-3;

export function signOf(force: number | undefined, peak: number): ForceSign {
  if (force === undefined || !Number.isFinite(force)) return 'unknown';
  if (Math.abs(force) <= ZERO_FRACTION * peak || force === 0) return 'zero';
  return force > 0 ? 'tension' : 'compression';
}

function extentOf(nodes: Map<string, Pt>): Extent {
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const p of nodes.values()) [x0, y0, x1, y1] = [Math.min(x0, p.x), Math.min(y0, p.y), Math.max(x1, p.x), Math.max(y1, p.y)];
  if (!nodes.size) [x0, y0, x1, y1] = [0, 0, 1, 1];
  return { x0, y0, x1, y1, w: x1 - x0, h: y1 - y0 };
}

const toMap = (rec: Record<string, { ux: number; uy: number }>) =>
  new Map(Object.entries(rec).map(([id, d]) => [id, { x: d.ux, y: d.uy }]));

/** Build the scene. `loading` is a combination or case id; default the analysis's first result. */
export function buildScene(model: Model, analysis?: AnalysisJson, loading?: string): Scene {
  const nodes = new Map(model.nodes.map((n) => [n.id, { x: n.x, y: n.y }]));
  const extent = extentOf(nodes);
  const ref = resolveLoading(model, analysis, loading);
  const result = ref && analysis ? (analysis.results[ref.id] ?? analysis.cases[ref.id]) as ResultJson | undefined : undefined;
  const forces = result?.memberForces;
  let peak = 0;
  if (forces) for (const v of Object.values(forces)) peak = Math.max(peak, Math.abs(v));
  const members = model.members.map((m) => {
    const a = nodes.get(m.from), b = nodes.get(m.to);
    const force = forces?.[m.id];
    return { id: m.id, from: m.from, to: m.to, length: a && b ? Math.hypot(b.x - a.x, b.y - a.y) : NaN, force, sign: signOf(force, peak) };
  });
  const loads = loadingLoads(model, ref);
  const displacements = result ? toMap(result.displacements) : undefined;
  let maxDisp = 0;
  let maxDispNode: string | undefined;
  for (const [id, d] of displacements ?? []) {
    const v = Math.hypot(d.x, d.y);
    if (v > maxDisp) [maxDisp, maxDispNode] = [v, id];
  }
  const c = analysis?.classification;
  const findings = c?.findings ?? [];
  const doubleBraced = findings.filter((f) => f.code === 'panel-double-braced');
  return {
    nodes, members, extent,
    span: extent.w > 0 ? extent.w : Math.max(extent.h, 1),
    supports: model.supports.map((s) => ({ node: s.node, kind: s.type, angle: s.type === 'roller' ? (s.angle ?? 90) : 90 })),
    loads, maxLoad: loads.reduce((m, l) => Math.max(m, l.magnitude), 0),
    units: { length: analysis?.units.length ?? model.units?.length ?? 'm', force: analysis?.units.force ?? model.units?.force ?? 'kN' },
    loading: ref, peak, displacements, maxDisp, maxDispNode,
    modes: (c?.mechanismModes ?? []).map((m) => toMap(m.displacements)),
    unbracedPanels: findings.filter((f) => f.code === 'panel-unbraced' && f.joints).map((f) => f.joints!),
    doubleBracedPanels: doubleBraced.filter((f) => f.joints).map((f) => f.joints!),
    // The members the self-stress states load (the redundant set), not the whole generic circuit.
    overBraced: new Set([...(c?.redundantMembers ?? c?.rigidity.overBracedMembers ?? []), ...doubleBraced.flatMap((f) => f.members ?? [])]),
    status: c?.status,
  };
}

interface ResultJson {
  memberForces: Record<string, number>;
  displacements: Record<string, { ux: number; uy: number }>;
}
