// Where `panelpoint check --push` finds its server and API token: PANELPOINT_SERVER and
// PANELPOINT_TOKEN, else ~/.config/panelpoint/credentials.json ({ "server", "token" }, as
// `panelpoint login` writes it). Each environment variable overrides its key of the file.
import { readFileSync } from 'node:fs';
import { homedir } from 'node:os';
import { join } from 'node:path';

/** A server and the token to call it with. */
export interface Credentials {
  /** Base URL without a trailing slash, e.g. `http://127.0.0.1:8080`. */
  server: string;
  token: string;
}

/** No usable credentials (the message says what to do). */
export class CredentialsError extends Error {
  override readonly name = 'CredentialsError';
}

/** The credentials file under `home`. */
export const credentialsPath = (home = homedir()): string => join(home, '.config', 'panelpoint', 'credentials.json');

function fromFile(path: string): Partial<Credentials> {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    return {};
  }
  try {
    const data = JSON.parse(text) as { server?: unknown; token?: unknown };
    return {
      ...(typeof data.server === 'string' ? { server: data.server } : {}),
      ...(typeof data.token === 'string' ? { token: data.token } : {}),
    };
  } catch {
    throw new CredentialsError(`${path} is not valid JSON: run panelpoint login again`);
  }
}

/** Read the credentials; throws CredentialsError when the server or the token is missing. */
export function readCredentials(env: NodeJS.ProcessEnv = process.env, home = homedir()): Credentials {
  const path = credentialsPath(home);
  const file = fromFile(path);
  const server = env.PANELPOINT_SERVER || file.server;
  const token = env.PANELPOINT_TOKEN || file.token;
  if (!server || !token) {
    throw new CredentialsError(`no ${!server ? 'server' : 'API token'} to push to: run panelpoint login, or set PANELPOINT_SERVER and PANELPOINT_TOKEN (read ${path})`);
  }
  if (!/^https?:\/\/[^/\s]+/.test(server)) throw new CredentialsError(`the server ${JSON.stringify(server)} is not an http(s) URL`);
  return { server: server.replace(/\/+$/, ''), token };
}
