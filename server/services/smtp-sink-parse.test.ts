import { describe, expect, it } from 'vitest';
import { decodeWords, parseMail } from './smtp-sink-parse';

const crlf = (lines: string[]) => Buffer.from(lines.join('\r\n'), 'utf8');

describe('parseMail', () => {
  it('reads folded, encoded headers and a quoted-printable body with soft breaks', () => {
    const m = parseMail(crlf([
      'From: Panelpoint <noreply@panelpoint.example>', 'To: a@b.example', 'Subject: =?UTF-8?Q?R=C3=A9sum=C3=A9_of?=', ' =?UTF-8?Q?_the_run?=',
      'Content-Type: text/plain; charset=utf-8', 'Content-Transfer-Encoding: quoted-printable', '',
      'Link: http://x/accept?=', 'token=3Dabc', '=C3=9Cmlaut', '',
    ]));
    expect(m.subject).toBe('Résumé of the run');
    expect(m.to).toBe('a@b.example');
    expect(m.text).toBe('Link: http://x/accept?token=abc\nÜmlaut\n');
  });

  it('takes text and html from a multipart message, base64 included, nested parts searched', () => {
    const m = parseMail(crlf([
      'Subject: =?utf-8?B?VMOkZ2Vy?=', 'Content-Type: multipart/mixed; boundary="outer"', '',
      '--outer', 'Content-Type: multipart/alternative; boundary=inner', '',
      '--inner', 'Content-Type: text/plain; charset=utf-8', 'Content-Transfer-Encoding: base64', '', Buffer.from('Grüße\n').toString('base64'),
      '--inner', 'Content-Type: text/html; charset=utf-8', '', '<p>Grüße</p>',
      '--inner--', '--outer', 'Content-Type: application/pdf', '', 'JVBERi0=', '--outer--', '',
    ]));
    expect(m.subject).toBe('Täger');
    expect(m.text).toBe('Grüße\n');
    // 8-bit html bytes read as their charset (utf-8), not latin1
    expect(m.html).toBe('<p>Grüße</p>');
  });

  it('decodes adjacent encoded words without the space between them, keeps plain words', () => {
    expect(decodeWords('=?UTF-8?Q?a?= =?UTF-8?Q?b?= c')).toBe('ab c');
    expect(decodeWords('plain subject')).toBe('plain subject');
  });

  it('a message without a body gives empty text', () => {
    expect(parseMail(crlf(['Subject: hi', ''])).text).toBe('');
  });
});
