// The program: a thin table of commands. Only this file turns errors into exit codes:
// 0 ok, 1 unexpected, 2 invalid input or usage, 3 finished with failed variants or checks.
import { Command, CommanderError } from 'commander';
import { InputError } from '../shared/errors';
import { ExitCode, processIo, UsageError, VERSION, type Io } from './context';
import { registerAnalyze } from './commands/analyze';
import { registerSweep } from './commands/sweep';
import { registerFamilies } from './commands/families';
import { registerNew } from './commands/new';
import { registerMerge } from './commands/merge';
import { registerFreeze } from './commands/freeze';
import { registerCheck } from './commands/check';
import { registerLogin } from './commands/login';
import { registerPush } from './commands/push';

/** Build the command table. */
export function buildProgram(io: Io): Command {
  const program = new Command('panelpoint')
    .description('Parametric studies of plane trusses: stability, determinacy, member forces, sweeps.')
    .version(VERSION, '-V, --version')
    .showHelpAfterError('(run with --help for usage)')
    .configureOutput({ writeOut: (s) => io.out(s), writeErr: (s) => io.err(s) })
    .exitOverride();
  registerAnalyze(program, io);
  registerSweep(program, io);
  registerMerge(program, io);
  registerFamilies(program, io);
  registerNew(program, io);
  registerFreeze(program, io);
  registerCheck(program, io);
  registerLogin(program, io);
  registerPush(program, io);
  return program;
}

/** Run the program. @returns the exit code */
export async function main(argv: string[], io: Io = processIo): Promise<number> {
  const program = buildProgram(io);
  try {
    await program.parseAsync(argv);
    return 0;
  } catch (e) {
    return exitCodeOf(e, io);
  }
}

function exitCodeOf(e: unknown, io: Io): number {
  if (e instanceof CommanderError) {
    if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return 0;
    return 2;
  }
  if (e instanceof ExitCode) {
    if (e.message) io.err(`${e.message}\n`);
    return e.code;
  }
  if (e instanceof InputError) {
    io.err(`error: invalid input\n${e.message}\n`);
    return 2;
  }
  if (e instanceof UsageError) {
    io.err(`error: ${e.message}\n`);
    return 2;
  }
  io.err(`unexpected error: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  return 1;
}
