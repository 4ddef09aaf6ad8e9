// What a command gets from the program: where to write, and the errors that set exit codes.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Output streams, replaceable in tests. */
export interface Io {
  out(text: string): void;
  err(text: string): void;
  /** Is stderr a terminal (progress bars, colour)? */
  isTTY: boolean;
}

export const processIo: Io = {
  out: (t) => process.stdout.write(t),
  err: (t) => process.stderr.write(t),
  isTTY: Boolean(process.stderr.isTTY),
};

/** Wrong use of a command (exit 2). */
export class UsageError extends Error {
  override readonly name = 'UsageError';
}

/** A command finished, and asks for this exit code (1 for --fail-on, 3 for failed variants or checks). */
export class ExitCode extends Error {
  override readonly name = 'ExitCode';
  constructor(public readonly code: number, message = '') {
    super(message);
  }
}

/** Panelpoint's version, from the nearest package.json named panelpoint (sources or bundle). */
export const VERSION: string = (() => {
  for (let dir = dirname(fileURLToPath(import.meta.url)); ; dir = dirname(dir)) {
    try {
      const pkg = JSON.parse(readFileSync(join(dir, 'package.json'), 'utf8')) as { name?: string; version: string };
      if (pkg.name === 'panelpoint') return pkg.version;
    } catch {
      // no package.json here: keep walking up
    }
    if (dirname(dir) === dir) return '0.0.0';
  }
})();
