import { describe, expect, it } from 'vitest';
import { ByteBuffer, RecordEncoder } from './record-bytes';
import { formatRecord } from './record-format';
import { emptyDesign } from './evaluate-design';
import type { VariantRecord } from './evaluate';

const decode = (b: Uint8Array) => new TextDecoder().decode(b);

/** A small deterministic generator (LCG constants of Numerical Recipes), for repeatable random figures. */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 4294967296);
}

describe('ByteBuffer.rounded: the same text as String() of the rounded value', () => {
  const cases: [number, 3 | 6 | 9][] = [
    [0, 6], [-0, 6], [1e-7, 6], [-4e-7, 6], [5e-7, 6], [0.1 + 0.2, 6], [845.4375000011303, 6], [-901.8000000011331, 6], [1e8 - 0.5, 6], [1.5e8, 6], [3e21, 6],
    [1e-9, 9], [4.2e-7, 9], [0.0123456789123, 9], [99999.123456789, 9], [2e5, 9], [1234.5675, 3], [-0.0004, 3], [1e12, 3],
  ];
  it.each(cases)('%s to %s places', (v, d) => {
    const b = new ByteBuffer(8);
    b.rounded(v, d);
    const scale = 10 ** d;
    expect(decode(b.take())).toBe(String(Math.round(v * scale) / scale));
  });
  it('agrees with String() on 300,000 random magnitudes from 1e-10 to 1e12, both signs', () => {
    const rnd = lcg(42);
    const b = new ByteBuffer(64);
    let bad = 0;
    for (let n = 0; n < 300_000; n++) {
      const v = (rnd() < 0.5 ? -1 : 1) * 10 ** (rnd() * 22 - 10) * (1 + rnd());
      const d = ([3, 6, 9] as const)[n % 3];
      b.rounded(v, d);
      const scale = 10 ** d;
      if (decode(b.take()) !== String(Math.round(v * scale) / scale)) bad++;
    }
    expect(bad).toBe(0);
  });
  it('writes integers and JSON strings as JSON.stringify does', () => {
    const b = new ByteBuffer(4);
    for (const v of [0, 7, 10, 99, 100, 123456789, 2 ** 53 - 1]) {
      b.uint(v);
      expect(decode(b.take())).toBe(String(v));
    }
    for (const s of ['B1', 'say "hi"', 'back\\slash', 'tab\there', 'unicode ψ — ok', 'nl\n']) {
      b.jsonString(s);
      expect(decode(b.take())).toBe(JSON.stringify(s));
    }
  });
});

function record(over: Partial<VariantRecord>): VariantRecord {
  return {
    index: 12, id: '0123456789abcdef', params: { span: 24, depth: 1.3333333333333333, panels: 8, supports: 'pin-roller' }, status: 'determinate',
    joints: 18, members: 33, reactions: 3, k: 0, s: 0, critical: false,
    peakTension: 845.4375000011303, peakTensionMember: 'B4', peakTensionCombination: 'C2',
    peakCompression: -901.8000000011331, peakCompressionMember: 'T4', peakCompressionCombination: 'C2',
    maxDisplacement: 0.012345678912, maxDisplacementNode: 'L4', maxDisplacementCombination: 'C2', spanOverDeflection: 1944.123456,
    reason: '', design: emptyDesign(), ...over,
  };
}

describe('RecordEncoder: byte for byte the UTF-8 of formatRecord', () => {
  const names = ['span', 'depth', 'panels', 'supports'];
  const variants: [string, Partial<VariantRecord>][] = [
    ['stable', {}],
    ['indeterminate', { status: 'indeterminate', s: 1 }],
    ['unstable with a reason that needs quoting', { status: 'unstable', k: 1, s: 0, critical: true, reason: 'the reactions are "parallel", so — a mechanism', peakTension: 0, peakTensionMember: '' }],
    ['error', { status: 'error', reason: 'depth must be at least 0.1 m (got 0 m)\nand more', params: { span: 24, depth: 0, panels: 8, supports: 'a,b' } }],
    ['non-finite figures', { peakTension: NaN, maxDisplacement: Infinity, spanOverDeflection: NaN, params: { span: 24, depth: NaN, panels: 8, supports: 'pin-pin' } }],
    ['tiny displacement (exponent notation)', { maxDisplacement: 3e-7, peakCompression: -0 }],
    ['no tension at all', { peakTension: 0, peakTensionMember: '', peakTensionCombination: '' }],
  ];
  it.each(variants)('%s', (_label, over) => {
    const enc = new RecordEncoder(names);
    const r = record(over);
    enc.write(r);
    enc.write(r); // the caches give the same bytes the second time
    const out = formatRecord(r, names, { json: '', csv: '' });
    expect(decode(enc.jsonl.take())).toBe(out.json + out.json);
    expect(decode(enc.csv.take())).toBe(out.csv + out.csv);
  });
  it('with member design, sized and not', () => {
    const enc = new RecordEncoder(names, true);
    const sized = record({ design: { ...emptyDesign(), status: 'sized', weight: 12.3456, mass: 1258.88, maxUtilisation: 0.91234, maxUtilisationMember: 'T4', governingCheck: 'AISC 360-16 §E3', governingCombination: 'C2', deflectionOk: true, sections: 'chords=SHS 100x5; web=CHS 60.3x4', reason: '' } });
    for (const r of [sized, record({})]) {
      enc.write(r);
      const out = formatRecord(r, names, { json: '', csv: '' }, true);
      expect(decode(enc.jsonl.take())).toBe(out.json);
      expect(decode(enc.csv.take())).toBe(out.csv);
    }
  });
  it('grows its buffers for long batches and keeps every line', () => {
    const enc = new RecordEncoder(names);
    const rnd = lcg(3);
    let expected = '';
    for (let i = 0; i < 5000; i++) {
      const r = record({ index: i, params: { span: 24, depth: 0.8 + rnd() * 3, panels: 8 + 2 * (i % 3), supports: 'pin-roller' }, peakTension: rnd() * 1e4, peakCompression: -rnd() * 1e4 });
      enc.write(r);
      expected += formatRecord(r, names, { json: '', csv: '' }).json;
    }
    expect(decode(enc.jsonl.take())).toBe(expected);
  });
});

describe('ByteBuffer.text: UTF-8 as TextEncoder writes it', () => {
  it.each(['plain', 'ψ — €', 'emoji 😀 end', 'lone \ud800 high', 'lone \udc00 low', 'end \ud83d', ''])('%j', (s) => {
    const b = new ByteBuffer(1);
    b.text(s);
    expect([...b.take()]).toEqual([...new TextEncoder().encode(s)]);
  });
});

describe('ByteBuffer.writeInto: bytes written straight into a shared slot', () => {
  it('returns a view of the slot when the bytes fit, and starts over', () => {
    const slot = new Uint8Array(new SharedArrayBuffer(32)); // text() asks for room for 3 bytes a character
    const b = new ByteBuffer(4);
    b.writeInto(slot);
    b.text('truss,7');
    const out = b.finish();
    expect(decode(out)).toBe('truss,7');
    expect(out.buffer).toBe(slot.buffer); // no copy
    expect(b.len).toBe(0);
  });
  it('moves to its own memory when the slot overflows, keeping every byte', () => {
    const slot = new Uint8Array(new SharedArrayBuffer(8));
    const b = new ByteBuffer(4);
    b.writeInto(slot);
    b.text('0123456');
    b.text('789abcdef');
    const out = b.finish();
    expect(decode(out)).toBe('0123456789abcdef');
    expect(out.buffer).not.toBe(slot.buffer);
    b.writeInto(slot); // the next batch is given the slot again
    b.text('xy');
    expect(decode(b.finish())).toBe('xy');
  });
  it('writes into its own memory without a slot, as take() does', () => {
    const b = new ByteBuffer(2);
    b.writeInto(undefined);
    b.text('Howe');
    expect(decode(b.finish())).toBe('Howe');
  });
});
