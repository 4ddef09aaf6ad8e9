/**
 * Storage for an app built without one (tests that do not exercise files, embedded use): files
 * kept in memory, lost when the process ends, with a warning once. server/main.ts always passes
 * a real store; in production there is no fallback (503 'storage-unavailable').
 */
import type { AppDeps } from '../app-deps';
import { HttpError } from '../http/http-error';
import type { Logger } from './logger';
import type { Storage } from './storage';

export function memoryStorage(logger?: Logger): Storage {
  const objects = new Map<string, Buffer>();
  let warned = false;
  return {
    async put(key, data) {
      if (!warned && logger) logger.warn('files kept in memory: no storage configured', { key });
      warned = true;
      objects.set(key, Buffer.from(data));
    },
    async get(key) {
      const data = objects.get(key);
      if (!data) throw new Error(`no object ${key}`);
      return data;
    },
    async remove(key) {
      objects.delete(key);
    },
  };
}

const fallbacks = new WeakMap<AppDeps, Storage>();

/** deps.storage, or one in-memory store per app outside production. */
export function storageOf(deps: AppDeps): Storage {
  if (deps.storage) return deps.storage;
  if (deps.config.production) throw new HttpError(503, 'storage-unavailable', 'File storage is not configured on this server.');
  let s = fallbacks.get(deps);
  if (!s) fallbacks.set(deps, (s = memoryStorage(deps.logger)));
  return s;
}
