import { describe, expect, it } from 'vitest';
import { decodeQuotedPrintable, decodeWords, parseMail } from './mime';

const latin1 = (s: string) => Buffer.from(s, 'utf8').toString('latin1');

describe('MIME reading', () => {
  it('decodes RFC 2047 encoded words in B and Q form, joining adjacent ones', () => {
    expect(decodeWords('=?UTF-8?B?R3LDvMOfZQ==?=')).toBe('Grüße');
    expect(decodeWords('=?UTF-8?Q?Gr=C3=BC=C3=9Fe_aus?= =?UTF-8?Q?_Bern?=')).toBe('Grüße aus Bern');
    expect(decodeWords('plain text')).toBe('plain text');
  });

  it('decodes quoted-printable soft line breaks and escapes (RFC 2045 6.7)', () => {
    const out = new TextDecoder().decode(decodeQuotedPrintable('a=3Db=\r\nc =C3=A9'));
    expect(out).toBe('a=bc é');
  });

  it('reads subject, from, text and html of a multipart/alternative message', () => {
    const raw = [
      'From: Shop <shop@example.com>',
      'To: keeper@example.com',
      'Subject: =?UTF-8?Q?Lamp_check_=E2=80=93_due?=',
      'MIME-Version: 1.0',
      'Content-Type: multipart/alternative;',
      ' boundary="--b1"',
      '',
      '----b1',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Replace by 3 May =E2=80=93 see https://x.example/a?t=3D1',
      '----b1',
      'Content-Type: text/html; charset=utf-8',
      'Content-Transfer-Encoding: base64',
      '',
      Buffer.from('<p>Replace</p>').toString('base64'),
      '----b1--',
      '',
    ].join('\r\n');
    const mail = parseMail(raw, ['keeper@example.com']);
    expect(mail.subject).toBe('Lamp check – due');
    expect(mail.from).toBe('Shop <shop@example.com>');
    expect(mail.to).toEqual(['keeper@example.com']);
    expect(mail.text.trim()).toBe('Replace by 3 May – see https://x.example/a?t=1');
    expect(mail.html).toBe('<p>Replace</p>');
  });

  it('reads an 8-bit single-part body and falls back to the header recipients', () => {
    const raw = latin1('From: a@example.com\nTo: b@example.com, c@example.com\nSubject: Hi\n\nWärme\n');
    const mail = parseMail(raw);
    expect(mail.text).toBe('Wärme\n');
    expect(mail.to).toEqual(['b@example.com', 'c@example.com']);
  });

  it('turns an html-only body into text, keeping link targets', () => {
    const raw = 'Subject: x\nContent-Type: text/html\n\n<p>Open <a href="https://x.example/i">this</a></p>';
    expect(parseMail(raw).text).toBe('Open this (https://x.example/i)');
  });
});
