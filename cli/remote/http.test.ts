import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { postStream } from './http';

let server: http.Server;
let url = '';
beforeAll(async () => {
  // Reads the body slowly, so that the client has to wait for 'drain' again and again.
  server = http.createServer((req, res) => {
    let bytes = 0;
    req.on('data', (d: Buffer) => {
      bytes += d.length;
      req.pause();
      setTimeout(() => req.resume(), 1);
    });
    req.on('end', () => res.end(JSON.stringify({ bytes })));
  });
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/`;
});
afterAll(() => new Promise<void>((done) => server.close(() => done())));

describe('postStream', () => {
  it('uploads every chunk through many waits for drain, leaving no listeners behind', async () => {
    const warnings: string[] = [];
    const onWarning = (w: Error) => warnings.push(w.name);
    process.on('warning', onWarning);
    const chunk = Buffer.alloc(256 * 1024, 0x61);
    async function* chunks() {
      for (let i = 0; i < 40; i++) yield chunk;
    }
    let sent = 0;
    try {
      const answer = await postStream(url, undefined, 'application/octet-stream', chunks, (n) => (sent += n));
      expect(answer).toEqual({ status: 200, body: { bytes: 40 * chunk.length } });
    } finally {
      process.off('warning', onWarning);
    }
    expect(sent).toBe(40 * chunk.length);
    expect(warnings).toEqual([]);
  });
});
