// `panelpoint login [--server URL] [--email E]`: sign in to the team server and keep the session
// token in ~/.config/panelpoint/credentials.json (mode 0600) for `panelpoint push`. With
// --with-token, store an API token (pp_...) made in the web app instead.
import type { Command } from 'commander';
import { ExitCode, UsageError, type Io } from '../context';
import { DEFAULT_SERVER, normaliseServer, readCredentials, writeCredentials } from '../remote/credentials';
import { errorText, RemoteUnreachable, requestJson, type Answer } from '../remote/http';
import { ask, askSecret } from '../remote/prompt';

interface Options { server?: string; email?: string; withToken?: boolean }

export function registerLogin(program: Command, io: Io): void {
  program
    .command('login')
    .description('Sign in to the team server and store the token for panelpoint push (~/.config/panelpoint/credentials.json, mode 0600).')
    .option('--server <url>', `the team server (default: PANELPOINT_SERVER, else the stored one, else ${DEFAULT_SERVER})`)
    .option('--email <email>', 'your email (asked for when not given)')
    .option('--with-token', 'store an API token (pp_...) from the web app instead of signing in with a password')
    .addHelpText('after', '\nThe password is asked without echo on a terminal, and read from stdin otherwise.\nPANELPOINT_TOKEN and PANELPOINT_SERVER, when set, win over the stored credentials.\n\nExamples:\n  panelpoint login --server https://panelpoint.example --email ada@example.com\n  printf "%s\\n" "$TOKEN" | panelpoint login --with-token\n')
    .action((opts: Options) => runLogin(opts, io));
}

async function call(what: () => Promise<Answer>): Promise<Answer> {
  try {
    return await what();
  } catch (e) {
    if (e instanceof RemoteUnreachable) throw new ExitCode(1, `login failed: ${e.message}`);
    throw e;
  }
}

async function runLogin(opts: Options, io: Io): Promise<void> {
  const server = normaliseServer(opts.server ?? (process.env.PANELPOINT_SERVER || readCredentials()?.server || DEFAULT_SERVER));
  let token: string;
  let who: { name?: string; email?: string } | undefined;
  if (opts.withToken) {
    token = (await askSecret('API token: ')).trim();
    if (!token) throw new UsageError('no token given');
    const me = await call(() => requestJson('GET', `${server}/api/auth/me`, token));
    if (me.status !== 200) throw new ExitCode(2, `the server does not accept this token: ${errorText(me)}`);
    who = (me.body as { user?: typeof who }).user;
  } else {
    const email = opts.email ?? (await ask('Email: '));
    if (!email) throw new UsageError('no email given (use --email)');
    const password = await askSecret('Password: ');
    if (!password) throw new UsageError('no password given');
    const a = await call(() => requestJson('POST', `${server}/api/auth/sign-in`, undefined, { email, password }));
    if (a.status !== 200) throw new ExitCode(2, `sign-in refused: ${errorText(a)}`);
    const body = a.body as { token: string; user?: typeof who; expiresIn?: number };
    token = body.token;
    who = body.user;
  }
  const path = writeCredentials({ server, token });
  io.out(`signed in to ${server}${who?.name ? ` as ${who.name}${who.email ? ` <${who.email}>` : ''}` : ''}; token stored in ${path}\n`);
  if (process.env.PANELPOINT_TOKEN) io.err('note: PANELPOINT_TOKEN is set and wins over the stored token\n');
}
