// Run a command as a child process and measure it: wall time from spawn to exit, its stdout, and
// its peak resident set, from /usr/bin/time when present, else by polling /proc/<pid>/status.
import { spawn } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';

/** What a measured run gave. */
export interface ChildRun {
  /** Exit code (null when killed by a signal). */
  code: number | null;
  stdout: string;
  stderr: string;
  /** Spawn to exit, seconds (process start-up included). */
  wallSeconds: number;
  /** Peak resident set of the process, kB; NaN when it could not be read. */
  peakRssKB: number;
  /** How the peak was read: 'time -f %M' or 'poll /proc VmHWM/VmRSS'. */
  rssMethod: string;
}

const GNU_TIME = '/usr/bin/time';
const POLL_MS = 50;

/** Largest of VmHWM (the kernel's own high-water mark) and VmRSS in /proc/<pid>/status, kB; 0 when gone. */
function rssOf(pid: number): number {
  try {
    const text = readFileSync(`/proc/${pid}/status`, 'utf8');
    let best = 0;
    for (const m of text.matchAll(/^(?:VmHWM|VmRSS):\s+(\d+)\s+kB/gm)) best = Math.max(best, Number(m[1]));
    return best;
  } catch {
    return 0;
  }
}

/**
 * Run `cmd args` in `cwd` with extra environment `env`; stderr is kept (and echoed when `echo`).
 * Worker threads live in the one process, so its resident set is the whole run's.
 * PANELPOINT_BENCH_RSS=poll forces polling even where /usr/bin/time exists.
 * @param scratch - a folder for the /usr/bin/time report
 */
export function measureChild(cmd: string, args: readonly string[], cwd: string, scratch: string, env: NodeJS.ProcessEnv = {}, echo = false): Promise<ChildRun> {
  const useTime = process.env.PANELPOINT_BENCH_RSS !== 'poll' && existsSync(GNU_TIME);
  const report = join(scratch, `time-${process.pid}-${Date.now()}.txt`);
  const argv = useTime ? [GNU_TIME, '-f', '%M', '-o', report, cmd, ...args] : [cmd, ...args];
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const child = spawn(argv[0], argv.slice(1), { cwd, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
    let wall = NaN;
    let polled = 0;
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    child.stdout.on('data', (b: Buffer) => out.push(b));
    child.stderr.on('data', (b: Buffer) => {
      err.push(b);
      if (echo) process.stderr.write(b);
    });
    const timer = useTime ? undefined : setInterval(() => { polled = Math.max(polled, rssOf(child.pid ?? -1)); }, POLL_MS);
    child.on('error', (e) => {
      if (timer) clearInterval(timer);
      reject(e);
    });
    child.on('exit', () => {
      wall = (performance.now() - t0) / 1000;
      if (timer) clearInterval(timer);
    });
    child.on('close', (code) => {
      let peak = polled || NaN;
      if (useTime) {
        const text = existsSync(report) ? readFileSync(report, 'utf8').trim().split('\n').pop() ?? '' : '';
        peak = /^\d+$/.test(text) ? Number(text) : NaN;
        rmSync(report, { force: true });
      }
      resolve({
        code, stdout: Buffer.concat(out).toString('utf8'), stderr: Buffer.concat(err).toString('utf8'),
        wallSeconds: wall, peakRssKB: peak, rssMethod: useTime ? 'time -f %M' : `poll /proc VmHWM/VmRSS every ${POLL_MS} ms`,
      });
    });
  });
}

/** The last line of `text` that parses as a JSON object, or undefined. */
export function lastJsonLine(text: string): Record<string, unknown> | undefined {
  const lines = text.trim().split('\n');
  for (let i = lines.length - 1; i >= 0; i--) {
    const l = lines[i].trim();
    if (!l.startsWith('{')) continue;
    try {
      return JSON.parse(l) as Record<string, unknown>;
    } catch {
      continue;
    }
  }
  return undefined;
}
