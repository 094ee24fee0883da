import { describe, expect, it } from 'vitest';
import { decodeQuotedPrintable, decodeWords, findLinks, parseMail } from '@server/lib/mail/mime';

describe('reading caught e-mail', () => {
  // RFC 2045 §6.7: "=" followed by two hex digits is one byte; "=" at a line end is a soft break.
  it('decodes quoted-printable text with soft line breaks and UTF-8 bytes', () => {
    expect(decodeQuotedPrintable('Zo=C3=AB opened the li=\nnk')).toBe('Zoë opened the link');
  });

  // RFC 2047 §4: encoded words in headers, B (base64) and Q (quoted-printable, "_" = space).
  it('decodes encoded words in headers', () => {
    expect(decodeWords('=?UTF-8?Q?Invitation_to_=E2=80=9CLarkspur=E2=80=9D?=')).toBe('Invitation to “Larkspur”');
    expect(decodeWords('=?UTF-8?B?WnXDqw==?=')).toBe('Zuë');
  });

  it('reads the plain-text part of a multipart message', () => {
    const raw = [
      'From: a@example.org',
      'To: b@example.org',
      'Subject: Hello',
      'Content-Type: multipart/alternative; boundary="--b1"',
      '',
      '----b1',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: base64',
      '',
      Buffer.from('Open https://mixwright.test/x now').toString('base64'),
      '----b1',
      'Content-Type: text/html',
      '',
      '<p>html</p>',
      '----b1--',
    ].join('\r\n');
    const mail = parseMail(raw);
    expect(mail).toMatchObject({
      subject: 'Hello',
      to: 'b@example.org',
      text: 'Open https://mixwright.test/x now',
      html: '<p>html</p>',
    });
  });

  it('finds each link once, without trailing punctuation inside brackets', () => {
    expect(findLinks('See (http://a.test/x) and http://a.test/x, then https://b.test/y?t=1')).toEqual([
      'http://a.test/x',
      'http://a.test/x,',
      'https://b.test/y?t=1',
    ]);
  });
});
