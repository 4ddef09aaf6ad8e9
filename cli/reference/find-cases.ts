// Finding reference case files: named files are cases; folders are searched recursively for
// *.json files that look like cases (they have `expected` and `tolerance`). A .json file in a
// folder that is not valid JSON is kept, so that a broken case is reported, never skipped.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { looksLikeCase } from '../../shared/reference/validate-case';

/** What a search found. */
export interface FoundCases {
  /** Case files in the order given (folders sorted by name), each with its folder as its suite. */
  files: { path: string; suite: string }[];
  /** Paths given that do not exist. */
  missing: string[];
}

function candidate(path: string): boolean {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    return true; // unreadable: let the loader say why
  }
  try {
    return looksLikeCase(JSON.parse(text.replace(/^\uFEFF/, '')));
  } catch {
    return true;
  }
}

function walk(dir: string, out: string[]): void {
  const entries = readdirSync(dir, { withFileTypes: true }).sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
  for (const e of entries) {
    if (e.name.startsWith('.') || e.name === 'node_modules') continue;
    const p = join(dir, e.name);
    if (e.isDirectory()) walk(p, out);
    else if (e.isFile() && e.name.endsWith('.json') && candidate(p)) out.push(p);
  }
}

/** Suite name of a file: its folder relative to the working directory, with forward slashes. */
export function suiteOf(path: string, cwd = process.cwd()): string {
  const parts = relative(cwd, join(path, '..')).split(sep).filter(Boolean);
  return parts.length ? parts.join('/') : '.';
}

/** Find the case files under `paths` (files or folders). */
export function findCaseFiles(paths: readonly string[]): FoundCases {
  const files: string[] = [];
  const missing: string[] = [];
  for (const p of paths) {
    let isDir: boolean;
    try {
      isDir = statSync(p).isDirectory();
    } catch {
      missing.push(p);
      continue;
    }
    if (isDir) walk(p, files);
    else files.push(p);
  }
  const unique = [...new Set(files)];
  return { files: unique.map((path) => ({ path, suite: suiteOf(path) })), missing };
}
