// Time a body run in rounds until at least a given wall time has passed; report the per-call cost.

/** What a timed loop measured. */
export interface LoopTiming {
  /** Calls made while the clock ran. */
  calls: number;
  /** Wall time of those calls, seconds. */
  seconds: number;
  /** Calls per second over the whole timed span. */
  perSecond: number;
  /** Microseconds per call over the whole timed span. */
  microseconds: number;
  /** Microseconds per call in the fastest round (the least disturbed by other work on the machine). */
  bestMicroseconds: number;
  /** Calls per second in the fastest round. */
  bestPerSecond: number;
}

/** Length of one timed round, ms: short enough that some rounds miss other processes' bursts. */
const ROUND_MS = 10;

/**
 * Call `body(i)` with a running counter: first for `warmSeconds` untimed (so V8 optimises it and
 * the round size is calibrated to about 10 ms), then in rounds until `minSeconds` have passed.
 */
export function timeLoop(body: (i: number) => void, minSeconds: number, warmSeconds: number): LoopTiming {
  let i = 0;
  let round = 1;
  const warmEnd = performance.now() + warmSeconds * 1000;
  while (performance.now() < warmEnd) {
    const t = performance.now();
    for (let k = 0; k < round; k++) body(i++);
    if (performance.now() - t < ROUND_MS / 2) round *= 2;
  }
  let calls = 0;
  let best = Infinity;
  const t0 = performance.now();
  let t = t0;
  while (t - t0 < minSeconds * 1000) {
    for (let k = 0; k < round; k++) body(i++);
    calls += round;
    const now = performance.now();
    best = Math.min(best, (now - t) / round);
    t = now;
  }
  const seconds = (t - t0) / 1000;
  return {
    calls, seconds, perSecond: calls / seconds, microseconds: (seconds * 1e6) / calls,
    bestMicroseconds: best * 1000, bestPerSecond: 1000 / best,
  };
}

/** A number rounded to `digits` significant digits, for printing and the JSON line. */
export function sig(v: number, digits = 4): number {
  return Number.isFinite(v) ? Number(v.toPrecision(digits)) : v;
}

/** The value after `--name` in argv (or `--name=value`), else undefined. */
export function argValue(argv: readonly string[], name: string): string | undefined {
  const k = argv.indexOf(name);
  if (k >= 0) return argv[k + 1];
  const eq = argv.find((a) => a.startsWith(`${name}=`));
  return eq?.slice(name.length + 1);
}
