import { describe, expect, it } from 'vitest';
import { RemoteUnreachable, type Answer } from './http';
import { RETRY_DELAYS_MS, withRetry } from './retry';

/** An attempt that plays back `outcomes` (an Error is thrown) and counts its calls. */
function scripted(outcomes: (Answer | Error)[]) {
  let calls = 0;
  const attempt = async (): Promise<Answer> => {
    const o = outcomes[Math.min(calls++, outcomes.length - 1)];
    if (o instanceof Error) throw o;
    return o;
  };
  return { attempt, calls: () => calls };
}

const refused = () => new RemoteUnreachable('http://127.0.0.1:9', Object.assign(new Error('connect'), { code: 'ECONNREFUSED' }));

describe('withRetry', () => {
  it('waits 1, 2, 4 and 8 s between attempts, then gives up with the last failure', async () => {
    const waits: number[] = [];
    const s = scripted([refused()]);
    await expect(withRetry(s.attempt, { sleep: async (ms) => void waits.push(ms) })).rejects.toThrow('ECONNREFUSED');
    expect([s.calls(), waits]).toEqual([5, [1000, 2000, 4000, 8000]]);
    expect(RETRY_DELAYS_MS).toEqual([1000, 2000, 4000, 8000]);
  });

  it('stops as soon as an attempt gets through, and tells each retry', async () => {
    const told: string[] = [];
    const s = scripted([refused(), { status: 503, body: null }, { status: 201, body: { ok: true } }]);
    const a = await withRetry(s.attempt, { sleep: async () => undefined, onRetry: (why, ms, n, of) => told.push(`${why} ${ms} ${n}/${of}`) });
    expect([a.status, s.calls()]).toEqual([201, 3]);
    expect(told).toEqual(['cannot reach http://127.0.0.1:9: ECONNREFUSED 1000 2/5', 'the server answered 503 (unavailable) 2000 3/5']);
  });

  it('never retries a 4xx, nor another 5xx', async () => {
    for (const status of [400, 401, 404, 409, 422, 500]) {
      const s = scripted([{ status, body: null }]);
      expect([(await withRetry(s.attempt, { sleep: async () => undefined })).status, s.calls()]).toEqual([status, 1]);
    }
  });

  it('a persistent 503 is returned after the last attempt', async () => {
    const s = scripted([{ status: 503, body: null }]);
    expect([(await withRetry(s.attempt, { sleep: async () => undefined })).status, s.calls()]).toEqual([503, 5]);
  });

  it('rethrows what is not a connection failure at once', async () => {
    const s = scripted([new TypeError('bad')]);
    await expect(withRetry(s.attempt, { sleep: async () => undefined })).rejects.toThrow('bad');
    expect(s.calls()).toBe(1);
  });
});
