// Bytes sent by a push on stderr: one line rewritten in place on a terminal (at most 10 times a
// second), a plain line every 5 s otherwise, and a closing line with the rate.
import type { Io } from '../context';

export interface ByteProgress {
  sent(bytes: number): void;
  stop(): void;
}

const mb = (b: number) => `${(b / 1e6).toFixed(1)} MB`;

/** @param total - bytes expected (an estimate: the share is capped at 100 %) */
export function startByteProgress(io: Io, total: number, quiet: boolean): ByteProgress {
  if (quiet) return { sent() {}, stop() {} };
  const t0 = performance.now();
  let done = 0;
  let last = t0;
  const line = () => {
    const s = Math.max((performance.now() - t0) / 1000, 1e-3);
    return `push: ${mb(done)} of ${mb(total)} sent (${Math.min(100, (100 * done) / Math.max(total, 1)).toFixed(0)} %), ${mb(done / s)}/s`;
  };
  return {
    sent(bytes) {
      done += bytes;
      const now = performance.now();
      if (now - last < (io.isTTY ? 100 : 5000)) return;
      last = now;
      io.err(io.isTTY ? `\r${line()}\x1b[K` : `${line()}\n`);
    },
    stop() {
      io.err(`${io.isTTY ? '\r' : ''}${line()} in ${((performance.now() - t0) / 1000).toFixed(1)} s${io.isTTY ? '\x1b[K' : ''}\n`);
    },
  };
}
