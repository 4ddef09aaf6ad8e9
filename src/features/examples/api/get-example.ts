/** One shipped example, analysed in the browser by the engine (no server). */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { analyzeModel } from '@/lib/browser-analysis';
import { ApiError } from '@/lib/api-client';
import { exampleModels } from './list-examples';

export interface Example {
  name: string;
  model: Model;
  analysis: AnalysisJson;
}

export async function getExample(name: string): Promise<Example> {
  const model = exampleModels().get(name);
  if (!model) throw new ApiError(404, 'example-not-found', `There is no example called "${name}". The list of examples shows the ones shipped.`);
  const ba = analyzeModel(model);
  if (!ba.ok) {
    const details = ba.issues.map((i) => ({ path: i.path, message: i.message }));
    throw new ApiError(422, 'model-invalid', `The example ${name} does not pass the model checks.`, details);
  }
  return { name, model, analysis: ba.json };
}

export const exampleQueryOptions = (name: string) =>
  queryOptions({ queryKey: ['examples', 'detail', name], queryFn: () => getExample(name), staleTime: Infinity, retry: false });

export const useExample = (name: string) => useQuery(exampleQueryOptions(name));
