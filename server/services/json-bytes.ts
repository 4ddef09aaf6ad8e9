/**
 * Reading JSON straight from its UTF-8 bytes, for the hot path of a push (runs-push-fast.ts): no
 * text of the whole line, no object per value, numbers decoded in place. Every method answers
 * "not here" (undefined, NaN, false) instead of throwing; the caller then hands the whole line to
 * JSON.parse, which reads what this reader leaves out (whitespace between tokens, escapes in the
 * strings it returns) or gives the real error.
 */

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const MINUS = 0x2d;
const DOT = 0x2e;
const ZERO = 0x30;
const NINE = 0x39;

/** 10^0..10^22: every one exact as a double (10^23 is not). */
const POW10 = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));
/** Significant digits that always fit a double's 53-bit mantissa exactly (10^15 < 2^53). */
const EXACT_DIGITS = 15;
const MAX_DEPTH = 64;

const isDigit = (c: number) => c >= ZERO && c <= NINE;
const isHex = (c: number) => isDigit(c) || (c >= 0x61 && c <= 0x66) || (c >= 0x41 && c <= 0x46);

/** Code points of a string, as JSON Schema's maxLength counts them (a surrogate pair is one). */
export function codePoints(s: string): number {
  let n = s.length;
  for (let i = 0; i < s.length - 1; i++) {
    const c = s.charCodeAt(i);
    if (c >= 0xd800 && c <= 0xdbff) {
      const d = s.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        n--;
        i++;
      }
    }
  }
  return n;
}

/** A cursor over the bytes of one JSON text; `pos` moves on as values are read. */
export class JsonBytes {
  pos = 0;
  /** Set by number(true): whether its text is exactly what String(value) gives (JSON.stringify's form). */
  canonical = false;
  private buf: Buffer;
  private end: number;

  constructor(buf: Buffer = Buffer.alloc(0)) {
    this.buf = buf;
    this.end = buf.length;
  }

  /** Start over on another text. */
  reset(buf: Buffer): void {
    this.buf = buf;
    this.pos = 0;
    this.end = buf.length;
  }

  atEnd(): boolean {
    return this.pos === this.end;
  }

  peek(): number {
    return this.pos < this.end ? this.buf[this.pos] : -1;
  }

  /** Step over byte `c` when it comes next. */
  byte(c: number): boolean {
    if (this.pos < this.end && this.buf[this.pos] === c) {
      this.pos++;
      return true;
    }
    return false;
  }

  /** Step over `bytes` when they come next. */
  lit(bytes: Uint8Array): boolean {
    const b = this.buf;
    const p = this.pos;
    if (p + bytes.length > this.end) return false;
    for (let i = 0; i < bytes.length; i++) if (b[p + i] !== bytes[i]) return false;
    this.pos = p + bytes.length;
    return true;
  }

  /** A whole number ≥ 0 written as plain digits (at most 15, no leading zero); −1 otherwise. */
  count(): number {
    const b = this.buf;
    let p = this.pos;
    if (p >= this.end || !isDigit(b[p])) return -1;
    if (b[p] === ZERO) {
      this.pos = p + 1;
      return isDigit(this.peek()) ? -1 : 0;
    }
    let n = 0;
    const stop = Math.min(this.end, p + EXACT_DIGITS + 1);
    for (; p < stop && isDigit(b[p]); p++) n = n * 10 + (b[p] - ZERO);
    if (p - this.pos > EXACT_DIGITS) return -1;
    this.pos = p;
    return n;
  }

  /**
   * A JSON number, or NaN when the text here is not one. Up to 15 significant digits and a power of
   * ten up to 22 the value is (digits as an integer) × or ÷ 10^k: both exact, so the one rounding
   * of IEEE arithmetic gives the nearest double, the value JSON.parse reads. Other numbers go
   * through Number(text), which rounds the same way.
   * @param canonical - also tell (in `canonical`) whether the text is the one JSON.stringify writes
   */
  number(canonical = false): number {
    const b = this.buf;
    const end = this.end;
    const start = this.pos;
    let p = start;
    const neg = p < end && b[p] === MINUS;
    if (neg) p++;
    if (p >= end || !isDigit(b[p])) return NaN;
    const zeroInt = b[p] === ZERO;
    let mantissa = 0;
    let significant = 0;
    let fraction = 0;
    let leadingZeros = 0;
    if (zeroInt) p++;
    else for (; p < end && isDigit(b[p]); p++, significant++) mantissa = mantissa * 10 + (b[p] - ZERO);
    let lastDigit = -1;
    if (p < end && b[p] === DOT) {
      p++;
      if (p >= end || !isDigit(b[p])) return NaN;
      for (; p < end && isDigit(b[p]); p++, fraction++) {
        lastDigit = b[p] - ZERO;
        if (significant === 0 && lastDigit === 0) leadingZeros++;
        else {
          mantissa = mantissa * 10 + lastDigit;
          significant++;
        }
      }
    }
    let exponent = 0;
    let hasExponent = false;
    if (p < end && (b[p] === 0x65 || b[p] === 0x45)) {
      hasExponent = true;
      p++;
      const expNeg = p < end && b[p] === MINUS;
      if (expNeg || (p < end && b[p] === 0x2b)) p++;
      if (p >= end || !isDigit(b[p])) return NaN;
      for (; p < end && isDigit(b[p]); p++) if (exponent < 10_000) exponent = exponent * 10 + (b[p] - ZERO);
      if (expNeg) exponent = -exponent;
    }
    this.pos = p;
    const scale = exponent - fraction;
    let value: number;
    if (significant <= EXACT_DIGITS && scale >= -22 && scale <= 22) {
      value = scale < 0 ? mantissa / POW10[-scale] : mantissa * POW10[scale];
      if (neg) value = -value;
    } else {
      value = Number(this.buf.toString('latin1', start, p));
    }
    if (canonical) {
      // String(value) writes the shortest digits that read back to the value, in plain notation from
      // 1e-6 up to 1e21. Up to 15 significant digits no two decimals share a double, so plain digits
      // with no trailing fraction zero and at most five zeros after "0." are that text (zero only as
      // "0"); anything else is compared with String(value).
      this.canonical = !hasExponent && significant <= EXACT_DIGITS && lastDigit !== 0 && leadingZeros <= 5 && !(neg && value === 0) &&
        !(zeroInt && significant === 0 && fraction > 0);
      if (!this.canonical) this.canonical = String(value) === this.buf.toString('latin1', start, p);
    }
    return value;
  }

  /**
   * A string, decoded as UTF-8 (invalid bytes read as U+FFFD, as Buffer#toString and so JSON.parse
   * of the decoded line do); undefined when there is none here. A string with escapes is handed to
   * JSON.parse (rare in what the CLI writes).
   * @param canonical - also tell (in `canonical`) whether the text is the one JSON.stringify writes
   */
  string(canonical = false): string | undefined {
    const b = this.buf;
    if (this.pos >= this.end || b[this.pos] !== QUOTE) return undefined;
    const start = this.pos + 1;
    let ascii = true;
    let escaped = false;
    let p = start;
    for (; p < this.end; p++) {
      const c = b[p];
      if (c === QUOTE) break;
      if (c < 0x20) return undefined;
      if (c >= 0x80) ascii = false;
      else if (c === BACKSLASH) {
        escaped = true;
        p++; // the escaped byte cannot end the string; JSON.parse checks the escape
      }
    }
    if (p >= this.end) return undefined;
    this.pos = p + 1;
    if (!escaped) {
      // Nothing JSON.stringify would escape: no quote, backslash or control character, and no lone
      // surrogate (UTF-8 decoding never makes one).
      this.canonical = true;
      return ascii ? b.toString('latin1', start, p) : b.toString('utf8', start, p);
    }
    const raw = b.toString('utf8', start - 1, p + 1);
    let text: string;
    try {
      text = JSON.parse(raw) as string;
    } catch {
      return undefined;
    }
    if (canonical) this.canonical = JSON.stringify(text) === raw;
    return text;
  }

  /** The text of bytes `from`..`to` (a span already read), decoded as UTF-8. */
  text(from: number, to: number): string {
    return this.buf.toString('utf8', from, to);
  }

  /** Step over any valid string, escapes included. */
  skipString(): boolean {
    const b = this.buf;
    if (this.pos >= this.end || b[this.pos] !== QUOTE) return false;
    let p = this.pos + 1;
    for (; p < this.end; p++) {
      const c = b[p];
      if (c === QUOTE) {
        this.pos = p + 1;
        return true;
      }
      if (c < 0x20) return false;
      if (c === BACKSLASH) {
        const e = b[++p];
        if (e === 0x75) {
          if (p + 4 >= this.end || !isHex(b[p + 1]) || !isHex(b[p + 2]) || !isHex(b[p + 3]) || !isHex(b[p + 4])) return false;
          p += 4;
        } else if (e !== QUOTE && e !== BACKSLASH && e !== 0x2f && e !== 0x62 && e !== 0x66 && e !== 0x6e && e !== 0x72 && e !== 0x74) return false;
      }
    }
    return false;
  }

  /** Step over any JSON value written without whitespace (nested up to 64 deep). */
  skipValue(depth = 0): boolean {
    const c = this.peek();
    if (c === QUOTE) return this.skipString();
    if (c === MINUS || isDigit(c)) return !Number.isNaN(this.number());
    if (c === 0x74) return this.lit(TRUE);
    if (c === 0x66) return this.lit(FALSE);
    if (c === 0x6e) return this.lit(NULL);
    if ((c !== 0x7b && c !== 0x5b) || depth >= MAX_DEPTH) return false;
    const close = c === 0x7b ? 0x7d : 0x5d;
    this.pos++;
    if (this.byte(close)) return true;
    do {
      if (close === 0x7d && !(this.skipString() && this.byte(0x3a))) return false;
      if (!this.skipValue(depth + 1)) return false;
    } while (this.byte(0x2c));
    return this.byte(close);
  }
}

/** The bytes of an ASCII literal. */
export const ascii = (s: string): Buffer => Buffer.from(s, 'latin1');
export const TRUE = ascii('true');
export const FALSE = ascii('false');
export const NULL = ascii('null');
