/**
 * The equilibrium matrix A (2j × (m + r)) of a plane truss: A·t + f = 0, with t the member forces
 * (tension positive) followed by the reaction components, f the joint loads (ENGINEERING.md §2).
 * Column of member a→b: (cos θ, sin θ) at joint a's rows (a tension pulls a toward b), the negative at b's.
 * Reaction columns: unit direction at the supported joint (pin: x then y; roller: its angle).
 */
import type { SupportDef, Topology } from './structure';

/** What one reaction column stands for. */
export interface ReactionComponent {
  /** Index into the support list. */
  readonly support: number;
  readonly node: number;
  /** Direction of the reaction, radians from +x. */
  readonly angle: number;
}

/** List the reaction components in column order. */
export function reactionComponents(supports: readonly SupportDef[]): ReactionComponent[] {
  const out: ReactionComponent[] = [];
  supports.forEach((s, q) => {
    if (s.kind === 'pin') {
      out.push({ support: q, node: s.node, angle: 0 }, { support: q, node: s.node, angle: Math.PI / 2 });
    } else out.push({ support: q, node: s.node, angle: s.angle });
  });
  return out;
}

/**
 * Assemble A row-major. @param x - joint x, m; @param y - joint y, m
 * @returns the matrix with its shape
 */
export function equilibriumMatrix(topo: Topology, x: Readonly<Float64Array>, y: Readonly<Float64Array>): { a: Float64Array; rows: number; cols: number; reactions: ReactionComponent[] } {
  const nJ = topo.nodeIds.length;
  const nM = topo.from.length;
  const reactions = reactionComponents(topo.supports);
  const rows = 2 * nJ;
  const cols = nM + reactions.length;
  const a = new Float64Array(rows * cols);
  for (let e = 0; e < nM; e++) {
    const i = topo.from[e];
    const j = topo.to[e];
    const dx = x[j] - x[i];
    const dy = y[j] - y[i];
    const L = Math.hypot(dx, dy);
    const c = dx / L;
    const s = dy / L;
    a[2 * i * cols + e] = c;
    a[(2 * i + 1) * cols + e] = s;
    a[2 * j * cols + e] = -c;
    a[(2 * j + 1) * cols + e] = -s;
  }
  reactions.forEach((r, q) => {
    a[2 * r.node * cols + nM + q] = Math.cos(r.angle);
    a[(2 * r.node + 1) * cols + nM + q] = Math.sin(r.angle);
  });
  // Snap round-off from cos(π/2) so exact zeros stay exact.
  for (let k = 0; k < a.length; k++) if (Math.abs(a[k]) < 1e-15) a[k] = 0;
  return { a, rows, cols, reactions };
}

/** Transpose a row-major matrix. */
export function transpose(a: Readonly<Float64Array>, rows: number, cols: number): Float64Array {
  const t = new Float64Array(rows * cols);
  for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) t[c * rows + r] = a[r * cols + c];
  return t;
}
