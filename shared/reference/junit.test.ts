/**
 * JUnit XML: totals on <testsuites> and <testsuite>, one <testcase> per case, <failure> and
 * <error> bodies, and XML 1.0 escaping (the five predefined entities, forbidden characters).
 */
import { describe, expect, it } from 'vitest';
import { escapeXml, junitXml } from './junit';

describe('escapeXml', () => {
  it('escapes the five predefined entities', () => {
    expect(escapeXml(`a<b>&"c"'d'`)).toBe('a&lt;b&gt;&amp;&quot;c&quot;&apos;d&apos;');
  });

  it('replaces characters XML 1.0 forbids and keeps line breaks in attributes', () => {
    expect(escapeXml('x\u0000y\u001bz\uFFFF')).toBe('x\uFFFDy\uFFFDz\uFFFD');
    expect(escapeXml('lone \uD800 high, lone \uDC00 low, pair \uD83D\uDE00')).toBe('lone \uFFFD high, lone \uFFFD low, pair \uD83D\uDE00');
    expect(escapeXml('one\ntwo\tthree', true)).toBe('one&#10;two&#9;three');
    expect(escapeXml('one\ntwo')).toBe('one\ntwo');
  });
});

describe('junitXml', () => {
  const xml = junitXml([
    {
      name: 'examples/reference',
      cases: [
        { name: 'ok', classname: 'examples/reference', time: 0.0123 },
        { name: 'drifts <&>', classname: 'examples/reference', failure: { message: '1 figure out of tolerance\nBC3', text: 'BC3 want 64 got 65 & more' } },
      ],
    },
    { name: 'tests', cases: [{ name: 'broken', classname: 'tests', error: { message: 'invalid reference case', text: 'x.json:3:5 model: bad' } }] },
  ]);

  it('counts tests, failures and errors per suite and in total', () => {
    expect(xml.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<testsuites')).toBe(true);
    expect(xml).toMatch(/<testsuites name="panelpoint check" tests="3" failures="1" errors="1" time="0.012">/);
    expect(xml).toMatch(/<testsuite name="examples\/reference" tests="2" failures="1" errors="0" skipped="0" time="0.012">/);
    expect(xml).toMatch(/<testsuite name="tests" tests="1" failures="0" errors="1" skipped="0" time="0">/);
    expect(xml.match(/<testcase /g)).toHaveLength(3);
  });

  it('writes failure and error elements with escaped messages and bodies', () => {
    expect(xml).toContain('<testcase name="ok" classname="examples/reference" time="0.012"/>');
    expect(xml).toContain('<testcase name="drifts &lt;&amp;&gt;" classname="examples/reference" time="0">');
    expect(xml).toContain('<failure message="1 figure out of tolerance&#10;BC3" type="drift">BC3 want 64 got 65 &amp; more</failure>');
    expect(xml).toContain('<error message="invalid reference case" type="invalid">x.json:3:5 model: bad</error>');
  });
});
