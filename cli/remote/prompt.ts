// Questions for `panelpoint login`: on a terminal, asked on stderr (a password without echo);
// otherwise answers are read from stdin, one line each, so scripts can pipe them in.
import { createInterface } from 'node:readline';
import { ExitCode } from '../context';

let lines: AsyncIterator<string> | undefined;

/** The next line of stdin (a pipe or a file); '' at the end. */
async function nextLine(): Promise<string> {
  lines ??= createInterface({ input: process.stdin, crlfDelay: Infinity, terminal: false })[Symbol.asyncIterator]();
  const r = await lines.next();
  return r.done ? '' : r.value;
}

/** Is stdin a terminal we can talk to? */
export const interactive = (): boolean => Boolean(process.stdin.isTTY);

/** Ask for a visible answer (an email). */
export async function ask(question: string): Promise<string> {
  if (!interactive()) return (await nextLine()).trim();
  const rl = createInterface({ input: process.stdin, output: process.stderr, terminal: true });
  try {
    return (await new Promise<string>((resolve) => rl.question(question, resolve))).trim();
  } finally {
    rl.close();
  }
}

/** Ask for a secret: no echo on a terminal; Ctrl-C stops the program (exit 130). */
export async function askSecret(question: string): Promise<string> {
  if (!interactive()) return nextLine();
  const stdin = process.stdin;
  process.stderr.write(question);
  stdin.setRawMode(true);
  stdin.setEncoding('utf8');
  stdin.resume();
  let value = '';
  return new Promise<string>((resolve, reject) => {
    const finish = () => {
      stdin.off('data', onData);
      stdin.setRawMode(false);
      stdin.pause();
      process.stderr.write('\n');
    };
    const onData = (text: string) => {
      for (const ch of text) {
        if (ch === '\r' || ch === '\n' || ch === '\u0004' || ch === '\u0003') {
          finish();
          if (ch === '\u0003') reject(new ExitCode(130, 'cancelled'));
          else resolve(value);
          return;
        }
        if (ch === '\u007f' || ch === '\b') value = value.slice(0, -1);
        else if (ch >= ' ') value += ch;
      }
    };
    stdin.on('data', onData);
  });
}
