/** Random one-time secrets (reset and invitation links, API tokens) and their stored sha256. */
import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

export function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** A fresh URL-safe secret and the hash to store instead of it. */
export function newSecret(bytes = 32): { secret: string; hash: string } {
  const secret = randomBytes(bytes).toString('base64url');
  return { secret, hash: sha256Hex(secret) };
}

/** Constant-time comparison of two hex digests. */
export function sameHash(a: string, b: string): boolean {
  const x = Buffer.from(a, 'hex');
  const y = Buffer.from(b, 'hex');
  return x.length === y.length && x.length > 0 && timingSafeEqual(x, y);
}

const API_TOKEN = /^pp_([0-9a-f]{12})_([A-Za-z0-9_-]{32,})$/;

/** A new API token `pp_<prefix>_<secret>`: the prefix finds the row, the hash proves the secret. */
export function newApiToken(): { token: string; prefix: string; hash: string } {
  const prefix = randomBytes(6).toString('hex');
  const token = `pp_${prefix}_${randomBytes(32).toString('base64url')}`;
  return { token, prefix, hash: sha256Hex(token) };
}

/** The prefix of a well-formed API token, or undefined. */
export function apiTokenPrefix(text: string): string | undefined {
  return API_TOKEN.exec(text)?.[1];
}

export function looksLikeApiToken(text: string): boolean {
  return text.startsWith('pp_');
}
