// The JSON Schema files generated from the TypeBox schemas (see scripts/gen-schemas.ts).
import { Model } from '../../shared/schemas/model';
import { Study } from '../../shared/schemas/study';

/** File name → JSON text of every published schema. */
export function schemaFiles(): Record<string, string> {
  const text = (s: object) => JSON.stringify({ $schema: 'http://json-schema.org/draft-07/schema#', ...s }, null, 2) + '\n';
  return { 'model.schema.json': text(Model), 'study.schema.json': text(Study) };
}
