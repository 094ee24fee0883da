// Every piece of user text that reaches generated code passes through one of these:
// an identifier made only of [A-Za-z0-9_], or the inside of a C string literal in which
// every byte outside printable ASCII, and every quote, backslash and question mark, is an
// escape. Nothing a user types can then end a string or a comment, start a line of code or
// form a trigraph.

/** C++ keywords and names the Arduino cores define, which an identifier must not equal. */
const RESERVED = new Set(
  (
    'alignas alignof and and_eq asm auto bitand bitor bool break case catch char char16_t char32_t class compl const ' +
    'constexpr const_cast continue decltype default delete do double dynamic_cast else enum explicit export extern false ' +
    'float for friend goto if inline int long mutable namespace new noexcept not not_eq nullptr operator or or_eq private ' +
    'protected public register reinterpret_cast return short signed sizeof static static_assert static_cast struct switch ' +
    'template this thread_local throw true try typedef typeid typename union unsigned using virtual void volatile wchar_t ' +
    'while xor xor_eq HIGH LOW INPUT OUTPUT INPUT_PULLUP LED_BUILTIN Serial setup loop main'
  ).split(' '),
);

/** Letters without their accents, so "Géraldine" reads "Geraldine" rather than "G_raldine". */
function asciiFold(text: string): string {
  return text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
}

/** Lower-case words of ASCII letters and digits, joined by underscores ("" when there are none). */
export function snakeWords(text: string): string {
  return asciiFold(text)
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '');
}

/**
 * A valid C identifier from any text: ASCII letters, digits and underscores, starting with
 * a letter, at most `maxLength` characters, never a keyword. `fallback` is used when the
 * text has no letters or digits at all.
 */
export function cIdentifier(text: string, fallback = 'item', maxLength = 32): string {
  let words = snakeWords(text) || fallback;
  if (!/^[a-z]/.test(words)) words = `${fallback}_${words}`;
  words = words.slice(0, maxLength).replace(/_+$/, '');
  if (RESERVED.has(words)) words = `${words}_`;
  if (!/^[A-Za-z][A-Za-z0-9_]*$/.test(words)) throw new Error(`Internal: identifier "${words}" is not valid`);
  return words;
}

/** An upper-case identifier part for macro names (MW_M0_LEFT_FRONT). */
export function macroPart(text: string, fallback = 'ITEM', maxLength = 24): string {
  return cIdentifier(text, fallback.toLowerCase(), maxLength).toUpperCase();
}

/**
 * The inside of a C/C++ string literal for the text's UTF-8 bytes (without the quotes).
 * Printable ASCII stays as it is except `"`, `\` and `?`; everything else becomes a
 * three-digit octal escape, which unlike `\x` cannot swallow the characters after it.
 */
export function cStringBody(text: string): string {
  let out = '';
  for (const byte of Buffer.from(text, 'utf8')) {
    if (byte === 0x22) out += '\\"';
    else if (byte === 0x5c) out += '\\\\';
    else if (byte === 0x3f) out += '\\?';
    else if (byte >= 0x20 && byte < 0x7f) out += String.fromCharCode(byte);
    else out += `\\${byte.toString(8).padStart(3, '0')}`;
  }
  return out;
}

/** A complete C string literal, quotes included. */
export function cString(text: string): string {
  return `"${cStringBody(text)}"`;
}

/**
 * Control characters (C0, DEL, C1) and the bidirectional formatting characters of Unicode
 * Standard Annex #9 ("Unicode Bidirectional Algorithm", §2: LRE, RLE, PDF, LRO, RLO, LRI, RLI,
 * FSI, PDI, and the marks LRM, RLM, ALM), which can make a README show text in an order other
 * than the bytes say.
 */
const INVISIBLE_CONTROLS = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/**
 * Text for Markdown table cells and prose: no line breaks, no control or direction-changing
 * characters, no table bars, no HTML or code spans.
 */
export function markdownText(text: string): string {
  return text
    .replace(/[\r\n\t\u2028\u2029]+/g, ' ')
    .replace(INVISIBLE_CONTROLS, '')
    .replace(/[\\`*_[\]<>|#]/g, (c) => `\\${c}`)
    .trim();
}
