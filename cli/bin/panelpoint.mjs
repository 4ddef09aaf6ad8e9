#!/usr/bin/env node
// Entry point for `npx panelpoint`: registers the TypeScript loader, then runs the program.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../main.ts');
process.exitCode = await main(process.argv);
