/**
 * Just enough MIME reading for the development mailbox: headers, a single part or a multipart
 * body, and the quoted-printable and base64 transfer encodings (RFC 2045 §6.7, §6.8), plus
 * encoded words in headers (RFC 2047 §4). Not a general mail parser.
 */
export interface ParsedMail {
  headers: Record<string, string>;
  subject: string;
  from: string;
  to: string;
  text: string;
  html: string | null;
}

export function parseMail(raw: string): ParsedMail {
  const { headers, body } = splitHeaders(raw);
  const parts = collectParts(headers, body);
  const text = parts.find((p) => p.type === 'text/plain')?.content ?? '';
  const html = parts.find((p) => p.type === 'text/html')?.content ?? null;
  return {
    headers,
    subject: decodeWords(headers['subject'] ?? ''),
    from: decodeWords(headers['from'] ?? ''),
    to: decodeWords(headers['to'] ?? ''),
    text,
    html,
  };
}

function splitHeaders(raw: string): { headers: Record<string, string>; body: string } {
  const normalised = raw.replace(/\r\n/g, '\n');
  const end = normalised.indexOf('\n\n');
  const head = end === -1 ? normalised : normalised.slice(0, end);
  const body = end === -1 ? '' : normalised.slice(end + 2);
  const headers: Record<string, string> = {};
  // Folded header lines start with white space and continue the previous header (RFC 5322 §2.2.3).
  for (const line of head.replace(/\n[ \t]+/g, ' ').split('\n')) {
    const colon = line.indexOf(':');
    if (colon > 0) headers[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  return { headers, body };
}

interface Part {
  type: string;
  content: string;
}

function collectParts(headers: Record<string, string>, body: string): Part[] {
  const contentType = headers['content-type'] ?? 'text/plain';
  const type = contentType.split(';')[0].trim().toLowerCase();
  if (type.startsWith('multipart/')) {
    const boundary = /boundary="?([^";]+)"?/i.exec(contentType)?.[1];
    if (!boundary) return [];
    return body
      .split(`--${boundary}`)
      .slice(1)
      .filter((chunk) => !chunk.startsWith('--'))
      .flatMap((chunk) => {
        const inner = splitHeaders(chunk.replace(/^\n/, ''));
        return collectParts(inner.headers, inner.body);
      });
  }
  const encoding = (headers['content-transfer-encoding'] ?? '7bit').toLowerCase();
  return [{ type, content: decodeBody(body, encoding).replace(/\n$/, '') }];
}

function decodeBody(body: string, encoding: string): string {
  if (encoding === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (encoding === 'quoted-printable') return decodeQuotedPrintable(body);
  return body;
}

export function decodeQuotedPrintable(body: string): string {
  const joined = body.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < joined.length; i += 1) {
    const hex = joined.slice(i + 1, i + 3);
    if (joined[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(joined[i], 'utf8'));
    }
  }
  return Buffer.from(bytes).toString('utf8');
}

/** `=?UTF-8?Q?...?=` and `=?UTF-8?B?...?=` encoded words. */
export function decodeWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_match, _charset: string, kind: string, text: string) =>
      kind.toUpperCase() === 'B'
        ? Buffer.from(text, 'base64').toString('utf8')
        : decodeQuotedPrintable(text.replace(/_/g, ' ')),
    );
}

/** Every http(s) address in a text, in order, without duplicates. */
export function findLinks(text: string): string[] {
  return [...new Set(text.match(/https?:\/\/[^\s<>"')]+/g) ?? [])];
}
