// Progress of a long sweep on stderr: a bar with rate and time left on a terminal, plain lines
// every few seconds otherwise (CI logs, batch schedulers).
import cliProgress from 'cli-progress';
import type { Io } from '../context';

export interface Progress {
  update(done: number): void;
  note(text: string): void;
  stop(): void;
}

const fmtRate = (r: number) => `${Math.round(r).toLocaleString('en-US')} variants/s`;
const fmtTime = (s: number) => (!Number.isFinite(s) ? '—' : s < 90 ? `${Math.ceil(s)} s` : s < 5400 ? `${Math.round(s / 60)} min` : `${(s / 3600).toFixed(1)} h`);

/** Start reporting progress over `total` variants. @param quiet - report nothing */
export function startProgress(io: Io, total: number, label: string, quiet = false): Progress {
  const t0 = performance.now();
  if (quiet) return { update() {}, note() {}, stop() {} };
  if (io.isTTY) {
    const bar = new cliProgress.SingleBar(
      { format: `${label} {bar} {percentage}% | {value}/{total} | {rate} | {left} left`, hideCursor: true, barsize: 30, etaBuffer: 50, fps: 8, stream: process.stderr },
      cliProgress.Presets.shades_classic,
    );
    bar.start(total, 0, { rate: '', left: '—' });
    return {
      update(done) {
        const s = (performance.now() - t0) / 1000;
        const rate = done / Math.max(s, 1e-3);
        bar.update(done, { rate: fmtRate(rate), left: fmtTime((total - done) / rate) });
      },
      note(text) { io.err(`\n${text}\n`); },
      stop() { bar.stop(); },
    };
  }
  let last = t0;
  return {
    update(done) {
      const now = performance.now();
      if (now - last < 5000 && done < total) return;
      last = now;
      const s = (now - t0) / 1000;
      const rate = done / Math.max(s, 1e-3);
      io.err(`${label}: ${done}/${total} (${((100 * done) / Math.max(total, 1)).toFixed(1)}%), ${fmtRate(rate)}, ${fmtTime((total - done) / rate)} left\n`);
    },
    note(text) { io.err(`${text}\n`); },
    stop() {},
  };
}
