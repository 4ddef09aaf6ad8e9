// Where the CLI finds the team server and its token: PANELPOINT_SERVER and PANELPOINT_TOKEN win,
// else ~/.config/panelpoint/credentials.json ({ server, token }, mode 0600) written by
// `panelpoint login`. A stored token is only ever sent to the server it was issued by.
import { chmodSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { homedir } from 'node:os';
import { dirname, join } from 'node:path';
import { UsageError } from '../context';

/** What `panelpoint login` stores. */
export interface Credentials {
  server: string;
  /** A session token from sign-in, or an API token `pp_...` made in the web app. */
  token: string;
}

/** Where a server is assumed when none is named. */
export const DEFAULT_SERVER = 'http://127.0.0.1:8080';

export function credentialsPath(): string {
  return join(homedir(), '.config', 'panelpoint', 'credentials.json');
}

/** The stored credentials, or undefined when there are none (or the file is not ours). */
export function readCredentials(): Credentials | undefined {
  try {
    const c = JSON.parse(readFileSync(credentialsPath(), 'utf8')) as Partial<Credentials>;
    return typeof c.server === 'string' && typeof c.token === 'string' ? { server: c.server, token: c.token } : undefined;
  } catch {
    return undefined;
  }
}

/** Store credentials, readable by the user alone (folder 0700, file 0600), replaced in one step. */
export function writeCredentials(c: Credentials): string {
  const path = credentialsPath();
  mkdirSync(dirname(path), { recursive: true, mode: 0o700 });
  const tmp = `${path}.${process.pid}.tmp`;
  try {
    writeFileSync(tmp, JSON.stringify(c, null, 2) + '\n', { mode: 0o600, flag: 'w' });
    chmodSync(tmp, 0o600); // the mode above is masked by the umask
    renameSync(tmp, path);
  } finally {
    rmSync(tmp, { force: true });
  }
  return path;
}

/** A server URL without a trailing slash; UsageError when it is not http(s). */
export function normaliseServer(text: string): string {
  let url: URL;
  try {
    url = new URL(text);
  } catch {
    throw new UsageError(`--server takes a URL such as http://127.0.0.1:8080, not '${text}'`);
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') throw new UsageError(`--server must be an http:// or https:// URL, not '${text}'`);
  return url.href.replace(/\/+$/, '');
}

/** The server to talk to and the token for it. */
export interface Remote {
  server: string;
  token?: string;
  /** Where the token came from, for messages. */
  tokenFrom?: 'PANELPOINT_TOKEN' | 'credentials';
}

/** The server (--server, else PANELPOINT_SERVER, else the stored one, else the default) and its token. */
export function resolveRemote(server: string | undefined, env: NodeJS.ProcessEnv = process.env): Remote {
  const stored = readCredentials();
  const chosen = normaliseServer(server ?? (env.PANELPOINT_SERVER || stored?.server || DEFAULT_SERVER));
  if (env.PANELPOINT_TOKEN) return { server: chosen, token: env.PANELPOINT_TOKEN, tokenFrom: 'PANELPOINT_TOKEN' };
  if (stored && normaliseServer(stored.server) === chosen) return { server: chosen, token: stored.token, tokenFrom: 'credentials' };
  return { server: chosen };
}
