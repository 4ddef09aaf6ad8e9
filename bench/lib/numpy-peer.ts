// The NumPy peer (bench/peer/pratt_sweep.py) under Debian's /usr/bin/python3: make sure NumPy is
// there, then run it on a sample of the study.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { lastJsonLine, measureChild } from './measure-child';

export const PYTHON = '/usr/bin/python3';

const hasNumpy = () => spawnSync(PYTHON, ['-c', 'import numpy'], { stdio: 'ignore' }).status === 0;

/** Install Debian's python3-numpy when `import numpy` fails, saying so; throws when it cannot. */
export function ensureNumpy(log: (s: string) => void): void {
  if (hasNumpy()) return;
  log(`numpy is missing for ${PYTHON}: installing Debian's python3-numpy (apt-get install -y python3-numpy)`);
  // apt's chatter goes to stderr so stdout keeps only the benchmark's lines.
  const apt = (args: string[]) => spawnSync('apt-get', args, { stdio: ['ignore', 2, 2], env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } }).status === 0;
  if (!apt(['install', '-y', 'python3-numpy'])) {
    log('apt-get install failed; running apt-get update and trying again');
    apt(['update']);
    apt(['install', '-y', 'python3-numpy']);
  }
  if (!hasNumpy()) throw new Error(`could not install python3-numpy; install it by hand (apt-get install -y python3-numpy) and run again`);
  log('python3-numpy installed');
}

/** What the peer printed in its final JSON line. */
export interface PeerRun {
  variants: number;
  /** Its own timing of the loop (build, rank, solve, peaks, CSV), seconds; Python start-up excluded. */
  seconds: number;
  variantsPerSecond: number;
  numpy: string;
  wallSeconds: number;
  peakRssKB: number;
  /** Its printed lines except the JSON (the first variants' peaks and its rate). */
  text: string;
}

/** Run the peer on indices 0, stride, 2·stride... (at most `limit`), writing `out`. One BLAS thread. */
export async function runPeer(root: string, study: string, limit: number, stride: number, out: string, scratch: string): Promise<PeerRun> {
  const script = join(root, 'bench', 'peer', 'pratt_sweep.py');
  const env = { OPENBLAS_NUM_THREADS: '1', OMP_NUM_THREADS: '1', MKL_NUM_THREADS: '1' };
  const r = await measureChild(PYTHON, [script, '--study', study, '--limit', String(limit), '--stride', String(stride), '--out', out], root, scratch, env);
  const j = lastJsonLine(r.stdout);
  if (r.code !== 0 || !j) throw new Error(`the NumPy peer failed (exit ${r.code}):\n${r.stderr || r.stdout}`);
  return {
    variants: Number(j.variants), seconds: Number(j.seconds), variantsPerSecond: Number(j.variantsPerSecond), numpy: String(j.numpy),
    wallSeconds: r.wallSeconds, peakRssKB: r.peakRssKB,
    text: r.stdout.trim().split('\n').filter((l) => !l.startsWith('{')).join('\n'),
  };
}
