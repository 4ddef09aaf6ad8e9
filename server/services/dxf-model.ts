/**
 * From the LINEs of a drawing to a model: ends closer than the tolerance become one joint (at
 * the mean of the ends merged into it), each remaining LINE a member. Zero-length lines and
 * repeated lines between the same two joints are dropped and counted. Supports and loads are
 * not in a drawing: the model has none, for the engineer to add.
 */
import type { Model, ModelMember, ModelNode } from '../../shared/schemas/model';
import type { DxfDrawing } from './dxf';

export interface DxfImportReport {
  lines: number;
  joints: number;
  members: number;
  /** Line ends merged into a joint another end made first. */
  mergedEnds: number;
  zeroLength: number;
  duplicates: number;
  malformed: number;
  ignored: { total: number; byType: Record<string, number> };
  /** Drawing unit of the coordinates, and the tolerance in it. */
  unit: string;
  tolerance: { mm: number; inUnit: number };
  notes: string[];
}

interface Cluster { sx: number; sy: number; n: number; x: number; y: number }

/** Greedy merge on a grid of cells one tolerance wide: each end joins the nearest joint within `tol`. */
function makeJoints(tol: number) {
  const clusters: Cluster[] = [];
  const grid = new Map<string, number[]>();
  const cell = (v: number) => (tol > 0 ? Math.floor(v / tol) : v);
  return {
    clusters,
    at(x: number, y: number): number {
      const [cx, cy] = [cell(x), cell(y)];
      let best = -1;
      let bestD = Infinity;
      for (let dx = -1; dx <= 1; dx++) {
        for (let dy = -1; dy <= 1; dy++) {
          for (const k of grid.get(`${cx + dx},${cy + dy}`) ?? []) {
            const d = Math.hypot(clusters[k].x - x, clusters[k].y - y);
            if (d <= tol && d < bestD) [best, bestD] = [k, d];
          }
        }
      }
      if (best >= 0) {
        const c = clusters[best];
        [c.sx, c.sy, c.n] = [c.sx + x, c.sy + y, c.n + 1];
        return best;
      }
      clusters.push({ sx: x, sy: y, n: 1, x, y });
      const key = `${cx},${cy}`;
      grid.set(key, [...(grid.get(key) ?? []), clusters.length - 1]);
      return clusters.length - 1;
    },
  };
}

/** Coordinates as written in the model: 9 significant digits are far below any drawing's accuracy. */
const tidy = (v: number) => Number(v.toPrecision(9)) + 0;

/**
 * Build a model from a drawing.
 * @param tolerance - in the drawing's unit; `toleranceMm` the same in mm, for the report
 */
export function modelFromDrawing(d: DxfDrawing, opts: { name: string; source: string; unit: string; tolerance: number; toleranceMm: number }): { model: Model; report: DxfImportReport } {
  const joints = makeJoints(opts.tolerance);
  const ends = d.lines.map((l) => [joints.at(l.x1, l.y1), joints.at(l.x2, l.y2)] as const);
  // Number joints left to right, then bottom to top: the order a truss is read in.
  const order = joints.clusters.map((c, i) => ({ i, x: c.sx / c.n, y: c.sy / c.n })).sort((a, b) => a.x - b.x || a.y - b.y);
  const idOf = new Map(order.map((o, k) => [o.i, `N${k + 1}`]));
  const nodes: ModelNode[] = order.map((o) => ({ id: idOf.get(o.i)!, x: tidy(o.x), y: tidy(o.y) }));
  const members: ModelMember[] = [];
  const seen = new Set<string>();
  let zeroLength = 0;
  let duplicates = 0;
  for (const [a, b] of ends) {
    if (a === b) {
      zeroLength++;
      continue;
    }
    const key = a < b ? `${a}-${b}` : `${b}-${a}`;
    if (seen.has(key)) {
      duplicates++;
      continue;
    }
    seen.add(key);
    members.push({ id: `M${members.length + 1}`, from: idOf.get(a)!, to: idOf.get(b)! });
  }
  const total = Object.values(d.ignored).reduce((s, n) => s + n, 0);
  const notes = [
    'Supports and loads are not part of a drawing: the model has none. Add supports (and loads) before analysing it.',
    'Members have no section: the default A = 0.005 m², E = 2.0e8 kN/m² applies until you add sections.',
  ];
  if (total) notes.push(`${total} entit${total === 1 ? 'y' : 'ies'} other than LINE ignored (${Object.entries(d.ignored).map(([t, n]) => `${t} ${n}`).join(', ')}); explode polylines and blocks into LINEs to import them.`);
  if (d.malformed) notes.push(`${d.malformed} LINE entit${d.malformed === 1 ? 'y' : 'ies'} without four finite coordinates skipped.`);
  if (d.withZ) notes.push(`${d.withZ} LINE entit${d.withZ === 1 ? 'y has' : 'ies have'} a z coordinate other than 0: z was dropped (the truss is plane).`);
  if (zeroLength) notes.push(`${zeroLength} line${zeroLength === 1 ? '' : 's'} shorter than the tolerance dropped.`);
  if (duplicates) notes.push(`${duplicates} line${duplicates === 1 ? '' : 's'} repeating a member between the same two joints dropped.`);
  const model: Model = {
    name: opts.name,
    description: `Imported from the DXF drawing ${opts.source}: ${members.length} members, ${nodes.length} joints (ends within ${opts.toleranceMm} mm merged). No supports or loads yet.`,
    units: { length: opts.unit, force: 'kN' },
    nodes,
    members,
    supports: [],
  };
  const report: DxfImportReport = {
    lines: d.lines.length, joints: nodes.length, members: members.length, mergedEnds: 2 * d.lines.length - nodes.length,
    zeroLength, duplicates, malformed: d.malformed, ignored: { total, byType: { ...d.ignored } },
    unit: opts.unit, tolerance: { mm: opts.toleranceMm, inUnit: opts.tolerance }, notes,
  };
  return { model, report };
}
