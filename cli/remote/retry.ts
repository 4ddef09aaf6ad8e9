// Retries for a push: a connection that fails, or a 503 (the server or its database is busy or
// restarting), is tried again after 1, 2, 4 and 8 s; any other answer, 4xx above all, is final.
import { RemoteUnreachable, type Answer } from './http';

/** Waits between attempts, ms: five attempts in all. */
export const RETRY_DELAYS_MS = [1000, 2000, 4000, 8000] as const;

export interface RetryOptions {
  delays?: readonly number[];
  /** Told before each wait: why, how long, and which attempt comes next. */
  onRetry?: (why: string, ms: number, attempt: number, attempts: number) => void;
  sleep?: (ms: number) => Promise<void>;
}

const wait = (ms: number) => new Promise<void>((r) => setTimeout(r, ms));

/** Is this worth another attempt? */
export function retryable(outcome: Answer | unknown): string | undefined {
  if (outcome instanceof RemoteUnreachable) return outcome.message;
  const a = outcome as Answer;
  if (typeof a?.status === 'number' && a.status === 503) return 'the server answered 503 (unavailable)';
  return undefined;
}

/** Run `attempt` until it gives a final answer or the delays run out (then the last outcome stands). */
export async function withRetry(attempt: () => Promise<Answer>, options: RetryOptions = {}): Promise<Answer> {
  const delays = options.delays ?? RETRY_DELAYS_MS;
  const sleep = options.sleep ?? wait;
  for (let i = 0; ; i++) {
    let outcome: Answer | unknown;
    try {
      outcome = await attempt();
    } catch (e) {
      if (!(e instanceof RemoteUnreachable)) throw e;
      outcome = e;
    }
    const why = retryable(outcome);
    if (!why || i >= delays.length) {
      if (outcome instanceof RemoteUnreachable) throw outcome;
      return outcome as Answer;
    }
    options.onRetry?.(why, delays[i], i + 2, delays.length + 1);
    await sleep(delays[i]);
  }
}
