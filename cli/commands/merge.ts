// `panelpoint merge DIR... --out DIR`: join the run folders of `sweep --shard i/n` into one.
import type { Command } from 'commander';
import { ExitCode, UsageError, VERSION, type Io } from '../context';
import { sweepSummaryText } from '../report/sweep-summary-text';
import { mergeRuns } from '../sweep/merge-runs';

interface Options { out?: string; json?: boolean }

export function registerMerge(program: Command, io: Io): void {
  program
    .command('merge')
    .description('Join the output folders of `panelpoint sweep --shard i/n` into one run folder (variants in index order, summary rebuilt).')
    .argument('<dirs...>', 'run folders of complete shards of one study')
    .requiredOption('-o, --out <dir>', 'the merged run folder (must be new or empty; written whole or not at all)')
    .option('--json', 'print summary.json to stdout instead of the table')
    .addHelpText('after', '\nExamples:\n  panelpoint merge out/big-1 out/big-2 out/big-3 --out out/big\n')
    .action((dirs: string[], opts: Options) => runMerge(dirs, opts, io));
}

function runMerge(dirs: string[], opts: Options, io: Io): void {
  if (!opts.out) throw new UsageError('merge needs --out DIR');
  const { manifest, summary, seconds, doc } = mergeRuns(dirs, opts.out, VERSION);
  const n = manifest.mergedFrom.length;
  io.out(opts.json ? JSON.stringify(doc, null, 2) + '\n' : sweepSummaryText(summary, { study: manifest.study.name, out: opts.out, seconds, interrupted: false, paramNames: manifest.paramNames }));
  io.err(`merged ${n} of ${n + (manifest.missing?.length ?? 0)} shards into ${opts.out}\n`);
  if (manifest.missing?.length) {
    const list = manifest.missing.map((m) => `${m.shard}/${manifest.mergedFrom[0].shard.count} (variants ${m.start}..${m.end - 1})`).join(', ');
    throw new ExitCode(3, `partial: shard(s) ${list} missing; run them with panelpoint sweep --shard and merge all shards again`);
  }
  if (summary.byStatus.error > 0) throw new ExitCode(3, `${summary.byStatus.error} variant(s) failed; see 'reason' in ${opts.out}/variants.jsonl`);
}
