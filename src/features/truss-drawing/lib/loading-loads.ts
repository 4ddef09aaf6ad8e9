/** The joint loads of one loading (a combination's factored sum, or one case), in model units. */
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import type { SceneLoad } from './scene';

export interface LoadingRef {
  id: string;
  kind: 'combination' | 'case';
  /** Factor per case id. */
  factors: Record<string, number>;
  source?: string;
}

/** Find a loading by id among the model's combinations and cases; default: the analysis's first result, else the first combination or case. */
export function resolveLoading(model: Model, analysis?: AnalysisJson, id?: string): LoadingRef | undefined {
  const cases = [...new Set((model.loads ?? []).map((l) => l.case))];
  const combos = model.combinations ?? [];
  const wanted = id ?? (analysis ? Object.keys(analysis.results)[0] : undefined) ?? combos[0]?.id ?? cases[0];
  if (wanted === undefined) return undefined;
  const combo = combos.find((c) => c.id === wanted);
  if (combo) return { id: combo.id, kind: 'combination', factors: combo.factors, ...(combo.source ? { source: combo.source } : {}) };
  if (cases.includes(wanted)) return { id: wanted, kind: 'case', factors: { [wanted]: 1 } };
  return undefined;
}

/** Summed joint loads of the loading; joints with no load are left out. */
export function loadingLoads(model: Model, ref: LoadingRef | undefined): SceneLoad[] {
  if (!ref) return [];
  const sum = new Map<string, { fx: number; fy: number }>();
  for (const l of model.loads ?? []) {
    const f = ref.factors[l.case] ?? 0;
    if (!f) continue;
    const s = sum.get(l.node) ?? { fx: 0, fy: 0 };
    s.fx += f * (l.fx ?? 0);
    s.fy += f * (l.fy ?? 0);
    sum.set(l.node, s);
  }
  return [...sum].map(([node, { fx, fy }]) => ({ node, fx, fy, magnitude: Math.hypot(fx, fy) })).filter((l) => l.magnitude > 0);
}
