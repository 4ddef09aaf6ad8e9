/**
 * JUnit XML for CI: one <testsuite> per group of cases, one <testcase> per reference case,
 * <failure> for a drifted case and <error> for one that could not be read or recomputed.
 */

/** One test case of the report. */
export interface JunitCase {
  name: string;
  classname: string;
  file?: string;
  /** Seconds. */
  time?: number;
  failure?: { message: string; text: string };
  error?: { message: string; text: string };
}

/** One test suite: a folder of cases, say. */
export interface JunitSuite { name: string; cases: JunitCase[] }

// Characters XML 1.0 does not allow at all: most C0 controls, lone surrogates, U+FFFE and U+FFFF.
const FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/**
 * Escape text for XML character data or a double-quoted attribute. Characters XML 1.0 cannot
 * carry become U+FFFD; in attributes tabs and line breaks are written as character references
 * so that they survive attribute normalisation.
 */
export function escapeXml(text: string, attribute = false): string {
  const s = text
    .replace(FORBIDDEN, '\uFFFD')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
  return attribute ? s.replace(/\t/g, '&#9;').replace(/\n/g, '&#10;').replace(/\r/g, '&#13;') : s.replace(/\r/g, '&#13;');
}

const attr = (name: string, value: string | number) => ` ${name}="${escapeXml(String(value), true)}"`;
const seconds = (t: number | undefined) => (t === undefined || !Number.isFinite(t) ? 0 : Number(t.toFixed(3)));

function testcase(c: JunitCase): string {
  const head = `    <testcase${attr('name', c.name)}${attr('classname', c.classname)}${c.file ? attr('file', c.file) : ''}${attr('time', seconds(c.time))}`;
  const body: string[] = [];
  if (c.failure) body.push(`      <failure${attr('message', c.failure.message)}${attr('type', 'drift')}>${escapeXml(c.failure.text)}</failure>`);
  if (c.error) body.push(`      <error${attr('message', c.error.message)}${attr('type', 'invalid')}>${escapeXml(c.error.text)}</error>`);
  return body.length ? `${head}>\n${body.join('\n')}\n    </testcase>` : `${head}/>`;
}

const count = (cases: readonly JunitCase[]) => ({
  tests: cases.length,
  failures: cases.filter((c) => c.failure).length,
  errors: cases.filter((c) => c.error && !c.failure).length,
  time: cases.reduce((s, c) => s + seconds(c.time), 0),
});

/**
 * The whole report, with totals on <testsuites> and on each <testsuite>.
 * @param name - name of the run
 */
export function junitXml(suites: readonly JunitSuite[], name = 'panelpoint check'): string {
  const all = count(suites.flatMap((s) => s.cases));
  const lines = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<testsuites${attr('name', name)}${attr('tests', all.tests)}${attr('failures', all.failures)}${attr('errors', all.errors)}${attr('time', seconds(all.time))}>`,
  ];
  for (const s of suites) {
    const n = count(s.cases);
    lines.push(`  <testsuite${attr('name', s.name)}${attr('tests', n.tests)}${attr('failures', n.failures)}${attr('errors', n.errors)}${attr('skipped', 0)}${attr('time', seconds(n.time))}>`);
    for (const c of s.cases) lines.push(testcase(c));
    lines.push('  </testsuite>');
  }
  lines.push('</testsuites>');
  return lines.join('\n') + '\n';
}
