/**
 * One model, fully: classification, then for a stable frame the forces, reactions and
 * displacements of every loading by the direct stiffness method, with statics cross-checks.
 */
import type { Structure } from './structure';
import { classify, type Classification } from './classify';
import { createKernel } from './kernel';
import { loadVectors, type Loadings } from './load-vectors';
import { findPeaks, type Peaks } from './peaks';
import { equilibriumMatrix } from './equilibrium';
import { solveDense } from './linalg/dense-lu';

/** Results of one loading. */
export interface LoadResult {
  readonly id: string;
  readonly kind: 'combination' | 'case';
  readonly source?: string;
  /** Member forces, kN, tension positive. */
  readonly forces: Float64Array;
  /** Joint displacements [ux0, uy0, ...], m. */
  readonly disp: Float64Array;
  /** Reactions per support [rx, ry, ...] in global axes, kN. */
  readonly react: Float64Array;
  readonly peak: Peaks;
  /** Largest equilibrium residual |A·t + f| at any joint, kN. */
  readonly residual: number;
  /** Determinate frames: largest difference between stiffness and statics forces, kN. */
  readonly staticsDifference?: number;
}

/** A model's analysis. */
export interface Analysis {
  readonly classification: Classification;
  /** The fast path's own count of mechanisms (collapsed pivots); equals classification.mechanisms unless the frame is nearly a mechanism. */
  readonly pivotMechanisms: number;
  readonly loadings: Loadings;
  /** One per loading when the frame is stable; empty when it is unstable. */
  readonly results: LoadResult[];
  /** When the model has combinations: one result per load case alone (factor 1) as well. */
  readonly caseResults: LoadResult[];
}

/** Analyse a structure. */
export function analyze(st: Structure): Analysis {
  const classification = classify(st);
  const loadings = loadVectors(st);
  // With combinations, each load case alone is solved too, with the same factorisation.
  const cases = loadings.kind === 'combination' ? loadVectors({ ...st, combinations: [] }) : undefined;
  const n2 = 2 * st.nodeIds.length;
  const all = new Float64Array(loadings.loads.length + (cases?.loads.length ?? 0));
  all.set(loadings.loads);
  if (cases) all.set(cases.loads, loadings.loads.length);
  const nAll = all.length / n2;
  const nL = loadings.ids.length;
  const kernel = createKernel(st, nAll);
  const k = kernel.run(st.x, st.y, st.EA, all, nAll);
  const solved: LoadResult[] = [];
  if (classification.mechanisms === 0 && k === 0) {
    const nJ = st.nodeIds.length;
    const nM = st.from.length;
    const ns = st.supports.length;
    const eq = equilibriumMatrix(st, st.x, st.y);
    const ids = [...loadings.ids, ...(cases?.ids ?? [])];
    for (let c = 0; c < nAll; c++) {
      const isCase = c >= nL;
      const forces = kernel.forces.slice(c * nM, (c + 1) * nM);
      const disp = kernel.disp.slice(c * 2 * nJ, (c + 1) * 2 * nJ);
      const react = kernel.react.slice(c * 2 * ns, (c + 1) * 2 * ns);
      const f = all.subarray(c * 2 * nJ, (c + 1) * 2 * nJ);
      const t = new Float64Array(eq.cols);
      t.set(forces);
      eq.reactions.forEach((rc, q) => {
        const rx = react[2 * rc.support];
        const ry = react[2 * rc.support + 1];
        t[nM + q] = st.supports[rc.support].kind === 'pin' ? (rc.angle === 0 ? rx : ry) : rx * Math.cos(rc.angle) + ry * Math.sin(rc.angle);
      });
      let residual = 0;
      for (let r = 0; r < eq.rows; r++) {
        let s = f[r];
        for (let q = 0; q < eq.cols; q++) s += eq.a[r * eq.cols + q] * t[q];
        residual = Math.max(residual, Math.abs(s));
      }
      let staticsDifference: number | undefined;
      if (classification.status === 'determinate') {
        const statics = solveDense(eq.a, eq.rows, f.map((v) => -v));
        if (statics) {
          staticsDifference = 0;
          for (let e = 0; e < nM; e++) staticsDifference = Math.max(staticsDifference, Math.abs(statics[e] - forces[e]));
        }
      }
      solved.push({
        id: ids[c], kind: isCase ? 'case' : loadings.kind, source: isCase ? undefined : loadings.sources[c], forces, disp, react,
        peak: findPeaks(forces, 0, nM, disp, 0, nJ), residual, staticsDifference,
      });
    }
  }
  return { classification, pivotMechanisms: k, loadings, results: solved.slice(0, nL), caseResults: solved.slice(nL) };
}
