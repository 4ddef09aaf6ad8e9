// `panelpoint push OUTDIR --project SLUG [--server URL]`: send a sweep's results to the team
// server in one streamed request. Retries a lost connection or a 503 (1, 2, 4, 8 s), never a 4xx.
import type { Command } from 'commander';
import { ExitCode, UsageError, type Io } from '../context';
import { resolveRemote } from '../remote/credentials';
import { errorText, postStream, RemoteUnreachable, type Answer } from '../remote/http';
import { pushChunks, pushSize } from '../remote/push-body';
import { startByteProgress } from '../remote/byte-progress';
import { withRetry } from '../remote/retry';
import { readRunFolder } from '../remote/run-folder';

interface Options { project: string; server?: string; json?: boolean; quiet?: boolean }

export function registerPush(program: Command, io: Io): void {
  program
    .command('push')
    .description('Send a sweep output folder (run.json, summary.json, variants.jsonl and the study) to the team server.')
    .argument('<outdir>', 'the --out folder of panelpoint sweep (one shard, a merged folder, or a whole run)')
    .requiredOption('-p, --project <slug>', 'the project on the server, e.g. harrow-lane-depot')
    .option('--server <url>', 'the team server (default: PANELPOINT_SERVER, else the one you signed in to)')
    .option('--json', "print the server's answer as JSON")
    .option('-q, --quiet', 'no progress on stderr')
    .addHelpText('after', '\nSign in first with `panelpoint login`, or set PANELPOINT_TOKEN (an API token pp_... works).\n\nExamples:\n  panelpoint push out/depot --project harrow-lane-depot\n  panelpoint push out/big-3 --project harrow-lane-depot --server https://panelpoint.example\n')
    .action((dir: string, opts: Options) => runPush(dir, opts, io));
}

interface PushAnswer { runId: string; created: boolean; unchanged: boolean; inserted: number; variantCount: number; status: string }

async function runPush(dir: string, opts: Options, io: Io): Promise<void> {
  if (!/^[a-z0-9]+(-[a-z0-9]+)*$/.test(opts.project)) throw new UsageError(`--project takes a project slug such as harrow-lane-depot, not '${opts.project}'`);
  const remote = resolveRemote(opts.server);
  if (!remote.token) throw new UsageError(`not signed in to ${remote.server}: run panelpoint login --server ${remote.server}, or set PANELPOINT_TOKEN`);
  const folder = readRunFolder(dir);
  const { manifest } = folder;
  const url = `${remote.server}/api/projects/${encodeURIComponent(opts.project)}/runs`;
  const headerBytes = Buffer.byteLength(JSON.stringify(folder.run)) + 1;
  const total = pushSize(headerBytes, folder.jsonlBytes, folder.evaluated);
  const shard = manifest.shard.count > 1 ? ` (shard ${manifest.shard.index}/${manifest.shard.count})` : '';
  if (!opts.quiet) io.err(`push: ${folder.evaluated.toLocaleString('en-US')} variants of '${manifest.study.name}'${shard} to ${remote.server}, project ${opts.project}\n`);

  const attempt = async (): Promise<Answer> => {
    const progress = startByteProgress(io, total, opts.quiet ?? false);
    try {
      return await postStream(url, remote.token, 'application/x-ndjson', () => pushChunks(folder.run, folder.jsonlPath), progress.sent);
    } finally {
      progress.stop();
    }
  };
  let answer: Answer;
  try {
    answer = await withRetry(attempt, { onRetry: (why, ms, n, of) => io.err(`push: ${why}; retrying in ${ms / 1000} s (attempt ${n} of ${of})\n`) });
  } catch (e) {
    if (e instanceof RemoteUnreachable) throw new ExitCode(1, `push failed: ${e.message} (gave up after 5 attempts)`);
    throw e;
  }
  report(answer, opts, remote.server, io);
}

function report(a: Answer, opts: Options, server: string, io: Io): void {
  if (a.status === 401) throw new ExitCode(2, `push refused: ${errorText(a)}\nsign in again: panelpoint login --server ${server}`);
  if (a.status >= 400 && a.status < 500) throw new ExitCode(2, `push refused, nothing was stored: ${errorText(a)}`);
  if (a.status < 200 || a.status >= 300) throw new ExitCode(1, `push failed: ${errorText(a)}`);
  const r = a.body as PushAnswer;
  if (opts.json) {
    io.out(JSON.stringify(r, null, 2) + '\n');
    return;
  }
  const what = r.unchanged ? 'already there, nothing changed' : `${r.inserted.toLocaleString('en-US')} variant(s) stored${r.created ? ', new run' : ''}`;
  io.out(`pushed run ${r.runId} to ${opts.project}: ${what}; the run holds ${r.variantCount.toLocaleString('en-US')} variants (${r.status})\n`);
}
