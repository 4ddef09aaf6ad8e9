// What a command gets from the program: where to write, and the errors that set exit codes.
import { readFileSync } from 'node:fs';

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

/** Panelpoint's version, from package.json. */
export const VERSION: string = (JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as { version: string }).version;
