/**
 * The example models shipped in examples/models, bundled as JSON (a few kB each) so the
 * examples work without the team server.
 */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Model } from '@shared/schemas/model';

const files = import.meta.glob<Model>('/examples/models/*.json', { eager: true, import: 'default' });

export interface ExampleSummary {
  /** File name without .json: the URL segment. */
  name: string;
  title: string;
  description?: string;
  joints: number;
  members: number;
}

/** Every shipped example model by name. */
export function exampleModels(): Map<string, Model> {
  return new Map(Object.entries(files).map(([path, m]) => [path.replace(/^.*\/|\.json$/g, ''), m]));
}

export function getExamples(): Promise<ExampleSummary[]> {
  const list = [...exampleModels()].map(([name, m]) => ({
    name, title: m.name, description: m.description, joints: m.nodes.length, members: m.members.length,
  }));
  return Promise.resolve(list.sort((a, b) => a.name.localeCompare(b.name)));
}

export const examplesQueryOptions = () =>
  queryOptions({ queryKey: ['examples', 'list'], queryFn: getExamples, staleTime: Infinity });

export const useExamples = () => useQuery(examplesQueryOptions());
