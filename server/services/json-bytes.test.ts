import { describe, expect, it } from 'vitest';
import { codePoints, JsonBytes } from './json-bytes';

function lcg(seed: number) {
  let s = seed >>> 0;
  return () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 4294967296;
}

/** number(true) on the whole of `text`: the value, whether it read it all, and `canonical`. */
function readNumber(text: string) {
  const j = new JsonBytes(Buffer.from(text));
  const value = j.number(true);
  return { value, all: j.atEnd(), canonical: j.canonical };
}

describe('JsonBytes.number', () => {
  it('reads every way of writing 100,000 random doubles as JSON.parse does, and knows the text String() writes', () => {
    const rnd = lcg(7);
    const bad: string[] = [];
    for (let n = 0; n < 100_000 && bad.length < 5; n++) {
      const v = (rnd() < 0.5 ? -1 : 1) * 10 ** (rnd() * 30 - 12) * (1 + rnd());
      const texts = [String(v), v.toFixed(n % 21), v.toExponential(n % 21), v.toPrecision(1 + (n % 21)), String(Math.round(v)), String(Math.round(v * 1e6) / 1e6)];
      for (const t of texts) {
        if (!/^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?$/.test(t)) continue; // e.g. toFixed of 1e21
        const got = readNumber(t);
        const want = JSON.parse(t) as number;
        if (!Object.is(got.value, want) || !got.all || got.canonical !== (String(want) === t)) bad.push(`${t}: ${JSON.stringify(got)}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it('reads edge cases as JSON.parse does', () => {
    for (const t of ['0', '-0', '0.0', '-0.0', '1e-7', '0.000001', '0.0000001', '1e21', '100000000000000000000', '123456789012345', '1234567890123456', '9007199254740993', '1.7976931348623157e308', '5e-324', '1e400', '-1e-400', '0.1', '0.30000000000000004', '1E+2', '2e-0']) {
      const got = readNumber(t);
      expect({ t, value: got.value, all: got.all, canonical: got.canonical }).toEqual({ t, value: JSON.parse(t), all: true, canonical: String(JSON.parse(t)) === t });
    }
  });

  it('does not take what JSON does not allow', () => {
    for (const t of ['01', '1.', '.5', '+1', '-', '1e', '1e+', '--1', '-a', '0x10']) {
      const got = readNumber(t);
      expect({ t, ok: !Number.isNaN(got.value) && got.all }).toEqual({ t, ok: false });
    }
  });
});

describe('JsonBytes strings and values', () => {
  it('decodes strings as JSON.parse of the UTF-8 text does, invalid bytes included', () => {
    const cases = [Buffer.from('"plain"'), Buffer.from('"ψ — ok"'), Buffer.from('"say \\"hi\\" \\u00e9\\n"'), Buffer.from([0x22, 0x61, 0xff, 0xc3, 0x22]), Buffer.from([0x22, 0xe2, 0x88, 0x22])];
    for (const b of cases) {
      const j = new JsonBytes(b);
      expect(j.string(true)).toBe(JSON.parse(b.toString('utf8')));
      expect(j.atEnd()).toBe(true);
      expect(j.canonical).toBe(JSON.stringify(JSON.parse(b.toString('utf8'))) === b.toString('utf8'));
    }
    for (const t of ['"open', '"tab\there"', '"bad \\x escape"', 'plain']) expect(new JsonBytes(Buffer.from(t)).string()).toBeUndefined();
  });

  it('steps over exactly the values JSON.parse reads (no white space)', () => {
    const good = ['{}', '[]', '{"a":[1,-2.5e3,"x\\u0041",true,false,null,{"b":{}}]}', '"\\/\\b\\f\\n\\r\\t"', '[[[[]]]]'];
    const bad = ['{"a"}', '{"a":}', '[1,]', '{,}', '"\\u12"', '"\\q"', 'nul', '[1 ]', '{"a":1,}', '[' .repeat(70) + ']'.repeat(70)];
    for (const t of good) {
      const j = new JsonBytes(Buffer.from(t));
      expect({ t, ok: j.skipValue() && j.atEnd() }).toEqual({ t, ok: true });
    }
    for (const t of bad) {
      const j = new JsonBytes(Buffer.from(t));
      expect({ t, ok: j.skipValue() && j.atEnd() }).toEqual({ t, ok: false });
    }
  });

  it('counts code points as JSON Schema maxLength does', () => {
    expect([codePoints('abc'), codePoints('ψ𝄞'), codePoints('\ud834'), codePoints('')]).toEqual([3, 2, 1, 0]);
  });
});
