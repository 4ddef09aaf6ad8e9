/** The generated JSON Schema files in shared/schemas/json/ match the TypeBox schemas. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { schemaFiles } from './schema-files';

describe('published JSON Schema files', () => {
  for (const [name, text] of Object.entries(schemaFiles())) {
    it(`${name} is up to date (run npm run schemas)`, () => {
      expect(readFileSync(new URL(`../../shared/schemas/json/${name}`, import.meta.url), 'utf8')).toBe(text);
    });
  }
});
