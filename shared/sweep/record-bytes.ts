/**
 * The sweep's hot output path: a variant's JSON line and CSV row written straight into byte
 * buffers, with no per-variant strings. The bytes are exactly those of `formatRecord` encoded as
 * UTF-8 (record-bytes.test.ts compares them over every status and a million random figures);
 * `formatRecord` stays the readable definition of the format.
 */
import type { VariantRecord } from './evaluate';
import { csvText, formatDesignPart } from './record-format';
import { ValueCache, type ParamSlots } from './param-slots';
import type { SpacePlan } from './space';

/** A growable byte buffer, reused from batch to batch. */
export class ByteBuffer {
  buf: Uint8Array;
  len = 0;
  /** The buffer's own memory (grown as needed); `buf` is this or a caller's target. */
  private own: Uint8Array;
  private target: Uint8Array | undefined;
  constructor(size = 1 << 16) {
    this.buf = this.own = new Uint8Array(size);
  }
  /** Make room for `n` more bytes. */
  ensure(n: number): void {
    if (this.len + n <= this.buf.length) return;
    const next = new Uint8Array(Math.max(this.own.length, this.buf.length * 2, this.len + n));
    next.set(this.buf.subarray(0, this.len));
    this.buf = this.own = next;
  }
  /** A copy of what was written (the buffer itself is reused). */
  take(): Uint8Array {
    const out = this.buf.slice(0, this.len);
    this.len = 0;
    return out;
  }
  /**
   * Start over, writing into `target` (a slot of shared memory that another thread reads), or
   * into the buffer's own memory when there is none. What outgrows `target` moves to own memory.
   */
  writeInto(target?: Uint8Array): void {
    this.target = target;
    this.buf = target ?? this.own;
    this.len = 0;
  }
  /** What was written since `writeInto`: a view of its target when it all fitted, else a copy. Starts over. */
  finish(): Uint8Array {
    if (this.target === undefined || this.buf !== this.target) return this.take();
    const out = this.target.subarray(0, this.len);
    this.len = 0;
    return out;
  }
  byte(b: number): void {
    this.ensure(1);
    this.buf[this.len++] = b;
  }
  /** Any string, as UTF-8. */
  text(s: string): void {
    this.ensure(s.length * 3);
    const b = this.buf;
    let n = this.len;
    for (let i = 0; i < s.length; i++) {
      const c = s.charCodeAt(i);
      if (c < 0x80) b[n++] = c;
      else if (c < 0x800) {
        b[n++] = 0xc0 | (c >> 6);
        b[n++] = 0x80 | (c & 63);
      } else {
        let cp = c;
        if (c >= 0xd800 && c <= 0xdfff) {
          const d = c <= 0xdbff && i + 1 < s.length ? s.charCodeAt(i + 1) : 0;
          if (d >= 0xdc00 && d <= 0xdfff) {
            cp = 0x10000 + ((c - 0xd800) << 10) + (d - 0xdc00);
            i++;
          } else cp = 0xfffd; // a lone surrogate, as TextEncoder writes it
        }
        if (cp < 0x10000) {
          b[n++] = 0xe0 | (cp >> 12);
        } else {
          b[n++] = 0xf0 | (cp >> 18);
          b[n++] = 0x80 | ((cp >> 12) & 63);
        }
        b[n++] = 0x80 | ((cp >> 6) & 63);
        b[n++] = 0x80 | (cp & 63);
      }
    }
    this.len = n;
  }
  /** Pre-encoded bytes. */
  raw(bytes: Uint8Array): void {
    const m = bytes.length;
    this.ensure(m);
    if (m > 32) {
      this.buf.set(bytes, this.len);
      this.len += m;
      return;
    }
    // a call to set() costs more than copying a short key byte by byte
    const b = this.buf;
    let n = this.len;
    for (let i = 0; i < m; i++) b[n++] = bytes[i];
    this.len = n;
  }
  /** Bytes [from, to) of another buffer (what was just written there, to write it here too). */
  copyFrom(src: ByteBuffer, from: number): void {
    const m = src.len - from;
    this.ensure(m);
    const b = this.buf, a = src.buf;
    let n = this.len;
    for (let i = from; i < src.len; i++) b[n++] = a[i];
    this.len = n;
  }
  /** A non-negative integer below 2^53. */
  uint(v: number): void {
    this.ensure(16);
    const b = this.buf;
    if (v < 10) {
      b[this.len++] = 48 + v;
      return;
    }
    let digits = 1;
    for (let p = 10; p <= v; p *= 10) digits++;
    let n = this.len + digits;
    this.len = n;
    while (v >= 1) {
      const q = Math.floor(v / 10);
      b[--n] = 48 + (v - q * 10);
      v = q;
    }
  }
  /**
   * `String(Math.round(v · 10^d) / 10^d)` for finite v, written without building the string: the
   * rounded integer's digits with the point set d places from the right and trailing zeros dropped.
   * That is the shortest text of the rounded value whenever the spacing of doubles there is far
   * below 10^-d; outside the ranges where that holds (and where JavaScript switches to exponent
   * notation) it falls back to String.
   */
  rounded(v: number, d: 3 | 6 | 9): void {
    const scale = d === 6 ? 1e6 : d === 9 ? 1e9 : 1e3;
    const r = Math.round(v * scale);
    const a = Math.abs(r);
    if (a === 0) {
      this.byte(48);
      return;
    }
    // |value| < 1e8 (d = 6), < 1e5 (d = 9), < 1e11 (d = 3): ulp ≤ 1.5e-8, 1.5e-11, 1.5e-5, far below 10^-d.
    // |value| ≥ 1e-6: JavaScript writes smaller magnitudes in exponent notation.
    if (a >= 1e14 || a < scale * 1e-6) {
      this.text(String(r / scale));
      return;
    }
    this.ensure(24);
    const b = this.buf;
    if (r < 0) b[this.len++] = 45;
    const whole = Math.floor(a / scale);
    let frac = a - whole * scale;
    this.uint(whole);
    if (frac === 0) return;
    let places = d;
    while (frac % 10 === 0) {
      frac /= 10;
      places--;
    }
    b[this.len++] = 46;
    // zero-padded fraction of `places` digits
    let n = this.len + places;
    this.len = n;
    for (let i = 0; i < places; i++) {
      const q = Math.floor(frac / 10);
      b[--n] = 48 + (frac - q * 10);
      frac = q;
    }
  }
  /** `JSON.stringify(s)` of a string. */
  jsonString(s: string): void {
    for (let i = 0; i < s.length; i++) {
      const c = s.charCodeAt(i);
      if (c < 0x20 || c === 34 || c === 92 || c > 0x7e) {
        this.text(JSON.stringify(s));
        return;
      }
    }
    this.ensure(s.length + 2);
    const b = this.buf;
    let n = this.len;
    b[n++] = 34;
    for (let i = 0; i < s.length; i++) b[n++] = s.charCodeAt(i);
    b[n++] = 34;
    this.len = n;
  }
  /** A CSV cell: quoted (with doubled quotes) when it holds a quote, comma or line break. */
  csvString(s: string): void {
    this.text(csvText(s));
  }
}

/** UTF-8 bytes of a string. */
function bytesOf(s: string): Uint8Array {
  const b = new ByteBuffer(s.length * 3 + 1);
  b.text(s);
  return b.take();
}
const K = {
  index: bytesOf('{"index":'), id: bytesOf(',"id":"'), params: bytesOf('","params":{'), status: bytesOf('},"status":"'),
  joints: bytesOf('","joints":'), members: bytesOf(',"members":'), reactions: bytesOf(',"reactions":'), k: bytesOf(',"k":'), s: bytesOf(',"s":'),
  critical: bytesOf(',"critical":'), true: bytesOf('true'), false: bytesOf('false'), null: bytesOf('null'),
  peakTension: bytesOf(',"peakTension":'), peakCompression: bytesOf(',"peakCompression":'), maxDisplacement: bytesOf(',"maxDisplacement":'),
  value: bytesOf('{"value":'), member: bytesOf(',"member":'), node: bytesOf(',"node":'), combination: bytesOf(',"combination":'),
  ratio: bytesOf(',"spanOverDeflection":'), reason: bytesOf(',"reason":'), emptyPeak: bytesOf(',,,'),
};

/** Cached text of one parameter value: its JSON and CSV forms. */
interface ValueText { json: Uint8Array; csv: Uint8Array }

function valueTextOf(v: number | string | undefined): ValueText {
  const json = typeof v === 'number' ? (Number.isFinite(v) ? String(v) : 'null') : JSON.stringify(v);
  const csv = typeof v === 'number' ? String(v) : csvText(String(v ?? ''));
  const jb = bytesOf(json);
  return { json: jb, csv: csv === json ? jb : bytesOf(csv) };
}
const VALUES_KEPT = 1 << 16;

/** Writes records of one study into a JSON Lines buffer and a CSV buffer. */
export class RecordEncoder {
  readonly jsonl = new ByteBuffer(1 << 20);
  readonly csv = new ByteBuffer(1 << 19);
  private readonly names: readonly string[];
  private readonly nameKeys: Uint8Array[];
  private readonly values: Map<number | string, ValueText>[];
  private readonly reasons = new Map<string, ValueText>();

  /** With slots: parameter texts by dimension digit, read for the variant the slots last read. */
  private readonly bySlot?: ValueCache<ValueText>;

  /**
   * @param slots - the evaluator's parameter slots (with the plan they were made from): each record
   *   written must then be the variant they last read, as it is right after `evaluate`
   */
  constructor(paramNames: readonly string[], private readonly design = false, slots?: ParamSlots, plan?: SpacePlan) {
    this.names = paramNames;
    this.nameKeys = paramNames.map((n, i) => bytesOf(`${i ? ',' : ''}${JSON.stringify(n)}:`));
    this.values = paramNames.map(() => new Map());
    if (slots && plan) this.bySlot = new ValueCache(slots, (_i, v) => valueTextOf(v), plan);
  }

  private valueText(i: number, v: number | string | undefined): ValueText {
    const cache = this.values[i];
    const key = v ?? '';
    let t = cache.get(key);
    if (t === undefined) {
      t = valueTextOf(v);
      if (cache.size < VALUES_KEPT) cache.set(key, t);
    }
    return t;
  }

  /** Reasons repeat (one per unstable topology): encode each once. */
  private reasonText(reason: string): ValueText {
    let t = this.reasons.get(reason);
    if (t === undefined) {
      const b = new ByteBuffer(reason.length * 3 + 8);
      b.jsonString(reason);
      const json = b.take();
      b.csvString(reason);
      t = { json, csv: b.take() };
      if (this.reasons.size < VALUES_KEPT) this.reasons.set(reason, t);
    }
    return t;
  }

  /** Append one record to both buffers (the bytes of `formatRecord`). */
  write(r: VariantRecord): void {
    const J = this.jsonl, C = this.csv;
    // Each figure is formatted once, into the JSON line, and its bytes copied into the CSV row.
    J.raw(K.index);
    let at = J.len;
    J.uint(r.index);
    C.copyFrom(J, at);
    J.raw(K.id);
    at = J.len;
    J.text(r.id);
    C.byte(44); C.copyFrom(J, at);
    J.raw(K.params);
    const names = this.names;
    const bySlot = this.bySlot;
    for (let i = 0; i < names.length; i++) {
      const t = bySlot ? bySlot.get(i) : this.valueText(i, r.params[names[i]]);
      J.raw(this.nameKeys[i]); J.raw(t.json);
      C.byte(44); C.raw(t.csv);
    }
    J.raw(K.status); at = J.len; J.text(r.status); C.byte(44); C.copyFrom(J, at);
    this.count(K.joints, r.joints); this.count(K.members, r.members); this.count(K.reactions, r.reactions);
    this.count(K.k, r.k); this.count(K.s, r.s);
    J.raw(K.critical); J.raw(r.critical ? K.true : K.false);
    C.byte(44); C.raw(r.critical ? K.true : K.false);
    const stable = r.status === 'determinate' || r.status === 'indeterminate';
    this.peak(K.peakTension, stable, r.peakTension, 6, r.peakTensionMember, r.peakTensionCombination, K.member);
    this.peak(K.peakCompression, stable, r.peakCompression, 6, r.peakCompressionMember, r.peakCompressionCombination, K.member);
    this.peak(K.maxDisplacement, stable, r.maxDisplacement, 9, r.maxDisplacementNode, r.maxDisplacementCombination, K.node);
    J.raw(K.ratio);
    C.byte(44);
    if (stable && Number.isFinite(r.spanOverDeflection)) {
      at = J.len;
      J.rounded(r.spanOverDeflection, 3);
      C.copyFrom(J, at);
    } else J.raw(K.null);
    J.raw(K.reason);
    if (r.reason) {
      const t = this.reasonText(r.reason);
      J.raw(t.json);
      C.byte(44); C.raw(t.csv);
    } else {
      J.raw(K.null);
      C.byte(44);
    }
    if (this.design) {
      const d = formatDesignPart(r.design);
      J.text(d.json);
      C.text(d.csv);
    }
    J.byte(125); J.byte(10);
    C.byte(10);
  }

  /** `,"key":n` in the JSON line and `,n` in the CSV row. */
  private count(key: Uint8Array, n: number): void {
    const J = this.jsonl;
    J.raw(key);
    const at = J.len;
    J.uint(n);
    this.csv.byte(44);
    this.csv.copyFrom(J, at);
  }

  private peak(key: Uint8Array, stable: boolean, v: number, d: 6 | 9, who: string, combo: string, whoKey: Uint8Array): void {
    const J = this.jsonl, C = this.csv;
    J.raw(key);
    if (!(stable && who)) {
      J.raw(K.null);
      C.raw(K.emptyPeak);
      return;
    }
    J.raw(K.value);
    C.byte(44);
    if (Number.isFinite(v)) {
      const at = J.len;
      J.rounded(v, d);
      C.copyFrom(J, at);
    } else {
      J.raw(K.null);
      C.raw(K.null);
    }
    J.raw(whoKey); J.jsonString(who); J.raw(K.combination); J.jsonString(combo); J.byte(125);
    C.byte(44); C.text(who); C.byte(44); C.text(combo);
  }
}
