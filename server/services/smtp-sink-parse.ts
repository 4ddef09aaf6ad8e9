/**
 * Just enough MIME to read what the sink catches: unfolded headers, RFC 2047 encoded words in
 * them, quoted-printable and base64 bodies, and the text/plain and text/html parts of a
 * multipart message (nested parts searched depth first). The raw message is kept anyway.
 */

export interface ParsedMail {
  headers: [name: string, value: string][];
  subject: string;
  from?: string;
  to?: string;
  messageId?: string;
  text: string;
  html?: string;
}

const decoderFor = (charset: string | undefined) => {
  try {
    return new TextDecoder((charset ?? 'utf-8').toLowerCase().replace(/^us-ascii$/, 'utf-8'));
  } catch {
    return new TextDecoder('utf-8');
  }
};

function quotedPrintable(text: string, header = false): Buffer {
  const src = header ? text.replace(/_/g, ' ') : text.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < src.length; i++) {
    const hex = src[i] === '=' ? src.slice(i + 1, i + 3) : '';
    if (/^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(src[i], 'utf8'));
    }
  }
  return Buffer.from(bytes);
}

/** Decode `=?charset?Q|B?...?=` words; whitespace between adjacent words is dropped (RFC 2047 §6.2). */
export function decodeWords(value: string): string {
  return value
    .replace(/(\?=)\s+(=\?)/g, '$1$2')
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_, charset: string, enc: string, data: string) =>
      decoderFor(charset.split('*')[0]).decode(enc.toUpperCase() === 'B' ? Buffer.from(data, 'base64') : quotedPrintable(data, true)));
}

function splitHead(raw: string): { head: string; body: string } {
  const m = /\r?\n\r?\n/.exec(raw);
  return m ? { head: raw.slice(0, m.index), body: raw.slice(m.index + m[0].length) } : { head: raw, body: '' };
}

function parseHeaders(head: string): [string, string][] {
  const out: [string, string][] = [];
  for (const line of head.split(/\r?\n/)) {
    if (/^[ \t]/.test(line) && out.length) out[out.length - 1][1] += ' ' + line.trim();
    else if (line.includes(':')) out.push([line.slice(0, line.indexOf(':')).trim(), line.slice(line.indexOf(':') + 1).trim()]);
  }
  return out;
}

const header = (h: [string, string][], name: string) => h.find(([k]) => k.toLowerCase() === name)?.[1];

/** `text/plain; charset=utf-8` → type and parameters (lower-case names). */
function contentType(value: string | undefined): { type: string; params: Record<string, string> } {
  const [type, ...rest] = (value ?? 'text/plain').split(';');
  const params: Record<string, string> = {};
  for (const p of rest) {
    const i = p.indexOf('=');
    if (i > 0) params[p.slice(0, i).trim().toLowerCase()] = p.slice(i + 1).trim().replace(/^"(.*)"$/, '$1');
  }
  return { type: type.trim().toLowerCase(), params };
}

function decodeBody(body: string, encoding: string | undefined, charset: string | undefined): string {
  const enc = (encoding ?? '7bit').toLowerCase();
  const bytes = enc === 'base64' ? Buffer.from(body.replace(/\s+/g, ''), 'base64') : enc === 'quoted-printable' ? quotedPrintable(body) : Buffer.from(body, 'latin1');
  return decoderFor(charset).decode(bytes);
}

/** The text/plain and text/html of one entity, searching multipart entities depth first. */
function bodies(entity: string, depth = 0): { text?: string; html?: string } {
  const { head, body } = splitHead(entity);
  const h = parseHeaders(head);
  const ct = contentType(header(h, 'content-type'));
  if (ct.type.startsWith('multipart/') && ct.params.boundary && depth < 8) {
    const found: { text?: string; html?: string } = {};
    const parts = body.split(`--${ct.params.boundary}`).slice(1);
    for (const part of parts) {
      if (part.startsWith('--')) break;
      // The line break before a boundary belongs to the boundary (RFC 2046 §5.1.1).
      const b = bodies(part.replace(/^\r?\n/, '').replace(/\r?\n$/, ''), depth + 1);
      found.text ??= b.text;
      found.html ??= b.html;
    }
    return found;
  }
  const decoded = decodeBody(body, header(h, 'content-transfer-encoding'), ct.params.charset);
  if (ct.type === 'text/html') return { html: decoded };
  if (ct.type === 'text/plain') return { text: decoded };
  return {};
}

/** Read a raw RFC 5322 message (as bytes, the sink keeps them as they came). */
export function parseMail(raw: Buffer): ParsedMail {
  const source = raw.toString('latin1');
  const { head } = splitHead(source);
  // Raw 8-bit header bytes (SMTPUTF8) are UTF-8; encoded words carry their own charset.
  const headers = parseHeaders(head).map(([k, v]) => [k, decodeWords(Buffer.from(v, 'latin1').toString('utf8'))] as [string, string]);
  const b = bodies(source);
  const get = (name: string) => header(headers, name);
  return {
    headers,
    subject: get('subject') ?? '',
    from: get('from'),
    to: get('to'),
    messageId: get('message-id'),
    text: (b.text ?? '').replace(/\r\n/g, '\n'),
    ...(b.html !== undefined ? { html: b.html.replace(/\r\n/g, '\n') } : {}),
  };
}
