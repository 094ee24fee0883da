// A small C/C++ lexer for the injection test: splits source into code, comments and string or
// character literals (with their escapes decoded to bytes), so the test can ask where user
// text ended up.

export interface Lexed {
  /** The source with every literal replaced by `""` and every comment by a space. */
  code: string;
  comments: string[];
  /** String literal contents, escapes decoded (UTF-8 bytes read back as text). */
  strings: string[];
}

function decodeEscapes(body: string): string {
  const bytes: number[] = [];
  for (let i = 0; i < body.length; i++) {
    const c = body[i];
    if (c !== '\\') {
      bytes.push(...Buffer.from(c, 'utf8'));
      continue;
    }
    const next = body[++i];
    const simple: Record<string, number> = {
      n: 10,
      t: 9,
      r: 13,
      '\\': 92,
      '"': 34,
      "'": 39,
      '?': 63,
      '0': 0,
      a: 7,
      b: 8,
      f: 12,
      v: 11,
    };
    if (/[0-7]/.test(next)) {
      let digits = next;
      while (digits.length < 3 && /[0-7]/.test(body[i + 1] ?? '')) digits += body[++i];
      bytes.push(parseInt(digits, 8));
    } else if (next === 'x') {
      let digits = '';
      while (/[0-9a-fA-F]/.test(body[i + 1] ?? '')) digits += body[++i];
      bytes.push(parseInt(digits, 16) & 0xff);
    } else if (next in simple) {
      bytes.push(simple[next]);
    } else {
      throw new Error(`Unknown escape \\${next}`);
    }
  }
  return Buffer.from(bytes).toString('utf8');
}

export function lexC(source: string): Lexed {
  let code = '';
  const comments: string[] = [];
  const strings: string[] = [];
  let i = 0;
  while (i < source.length) {
    const two = source.slice(i, i + 2);
    if (two === '//') {
      const end = source.indexOf('\n', i);
      const stop = end < 0 ? source.length : end;
      comments.push(source.slice(i + 2, stop));
      code += ' ';
      i = stop;
    } else if (two === '/*') {
      const end = source.indexOf('*/', i + 2);
      if (end < 0) throw new Error('Unterminated comment');
      comments.push(source.slice(i + 2, end));
      code += ' ';
      i = end + 2;
    } else if (source[i] === '"' || source[i] === "'") {
      const quote = source[i];
      let j = i + 1;
      while (j < source.length && source[j] !== quote) {
        if (source[j] === '\n') throw new Error(`Line break inside a literal at ${i}`);
        j += source[j] === '\\' ? 2 : 1;
      }
      if (j >= source.length) throw new Error('Unterminated literal');
      if (quote === '"') strings.push(decodeEscapes(source.slice(i + 1, j)));
      code += quote === '"' ? '""' : "' '";
      i = j + 1;
    } else {
      code += source[i++];
    }
  }
  return { code, comments, strings };
}
