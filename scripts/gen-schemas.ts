// Write the JSON Schema of every file format to shared/schemas/json/, for editors and other tools.
// `npm run schemas` regenerates them; a test fails when they are out of date.
import { writeFileSync } from 'node:fs';
import { schemaFiles } from '../tests/schemas/schema-files';

for (const [name, text] of Object.entries(schemaFiles())) {
  writeFileSync(new URL(`../shared/schemas/json/${name}`, import.meta.url), text);
  console.log(`wrote shared/schemas/json/${name}`);
}
