/**
 * A fake S3 for development and tests: s3rver on 127.0.0.1, its objects in a folder (the
 * git-ignored .data/s3 in development, a temporary folder in tests). Never reachable from
 * outside the machine; main.ts starts it only when S3_ENDPOINT is not set.
 */
import { mkdirSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import S3rver from 's3rver';

/** s3rver accepts any well-formed signature made with these. */
export const FAKE_S3_CREDENTIALS = { accessKey: 'S3RVER', secretKey: 'S3RVER' } as const;

export interface FakeS3 {
  /** e.g. `http://127.0.0.1:40123` */
  endpoint: string;
  close(): Promise<void>;
}

/** Start s3rver on loopback; `port` 0 picks a free one. */
export async function startFakeS3(options: { directory: string; port?: number }): Promise<FakeS3> {
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({ port: options.port ?? 0, address: '127.0.0.1', silent: true, directory: options.directory });
  const address = (await server.run()) as AddressInfo;
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    async close() {
      // Keep-alive sockets of the S3 client would hold close() open.
      server.httpServer?.closeAllConnections?.();
      await server.close();
    },
  };
}
