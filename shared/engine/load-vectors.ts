/**
 * Factored joint-load vectors: one per combination, or one per load case when a model has no
 * combinations.
 */
import type { Structure } from './structure';

/** The loadings a model is solved for. */
export interface Loadings {
  readonly ids: string[];
  readonly kind: 'combination' | 'case';
  readonly sources: (string | undefined)[];
  /** Joint loads per loading, kN: loads[c * 2j + 2i] (fx), +1 (fy). */
  readonly loads: Float64Array;
}

/** Build the factored joint loads of every loading. */
export function loadVectors(st: Structure): Loadings {
  const n2 = 2 * st.nodeIds.length;
  if (st.combinations.length === 0) {
    const loads = new Float64Array(Math.max(1, st.cases.length) * n2);
    st.caseLoads.forEach((f, c) => loads.set(f, c * n2));
    const ids = st.cases.length ? [...st.cases] : ['(no loads)'];
    return { ids, kind: 'case', sources: ids.map(() => undefined), loads };
  }
  const loads = new Float64Array(st.combinations.length * n2);
  st.combinations.forEach((cmb, c) => {
    for (let k = 0; k < st.cases.length; k++) {
      const fac = cmb.factors[k];
      if (!fac) continue;
      const f = st.caseLoads[k];
      for (let i = 0; i < n2; i++) loads[c * n2 + i] += fac * f[i];
    }
  });
  return { ids: st.combinations.map((c) => c.id), kind: 'combination', sources: st.combinations.map((c) => c.source), loads };
}
