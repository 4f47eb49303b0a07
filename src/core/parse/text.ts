/**
 * A file's bytes as text a reader may parse: strict UTF-8 (`utf8.ts`), no byte-order mark, no
 * NUL (so no binary data and no UTF-16), no U+FFFD a lenient decoder left behind, no lone
 * surrogate, and a bounded length. Every refusal is a `ReadError` naming the file and line.
 */
import { ReadError } from './errors.js';
import { decodeUtf8 } from './utf8.js';

/** Longest text accepted, in UTF-16 code units (default: `8388608`, 8 Mi). */
export const MAX_TEXT_LENGTH = 8 * 1024 * 1024;

/** U+FEFF, the byte-order mark: dropped at the start of a text. */
export const BOM = '\uFEFF';

/**
 * Bytes of a file as text: strict UTF-8 (a byte sequence that is not UTF-8 is refused, never
 * replaced), a leading byte-order mark dropped, and the text checks of `checkText` applied
 * (no NUL, so no binary or UTF-16 data; bounded length). Throws `ReadError` naming `path`.
 */
export function decodeText(bytes: Uint8Array, path: string): string {
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)) {
    throw new ReadError(
      path,
      1,
      'starts with a UTF-16 byte-order mark; expected UTF-8 text (save the file as UTF-8)',
    );
  }
  const decoded = decodeUtf8(bytes);
  if (!decoded.ok) {
    const at = decoded.offset;
    const hex = Array.from(bytes.subarray(at, at + 4), (b) => b.toString(16).padStart(2, '0')).join(
      ' ',
    );
    throw new ReadError(
      path,
      decoded.line,
      `is not UTF-8 text: bytes ${hex} at byte offset ${at} do not form a UTF-8 character (save the file as UTF-8)`,
    );
  }
  let text = decoded.text;
  // The decoder drops the mark itself; this covers a doubled one.
  if (text.startsWith(BOM)) text = text.slice(1);
  checkText(text, path);
  return text;
}

/** Refuses text no model file holds: too long, NUL, U+FFFD, lone surrogates. */
export function checkText(text: string, file: string): void {
  if (text.length > MAX_TEXT_LENGTH) {
    throw new ReadError(
      file,
      null,
      `is ${text.length} characters long; model files are limited to ${MAX_TEXT_LENGTH}`,
    );
  }
  const lineOfIndex = (i: number): number => {
    let line = 1;
    for (let j = text.indexOf('\n'); j !== -1 && j < i; j = text.indexOf('\n', j + 1)) line++;
    return line;
  };
  const nul = text.indexOf('\0');
  if (nul !== -1) {
    throw new ReadError(
      file,
      lineOfIndex(nul),
      'contains a NUL character, so it is binary data or UTF-16 text; expected UTF-8 text',
    );
  }
  const replacement = text.indexOf('\uFFFD');
  if (replacement !== -1) {
    throw new ReadError(
      file,
      lineOfIndex(replacement),
      'contains U+FFFD, the character a lenient decoder puts in place of bytes that are not UTF-8; save the file as UTF-8',
    );
  }
  const lone = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.exec(text);
  if (lone) {
    throw new ReadError(
      file,
      lineOfIndex(lone.index),
      'contains a lone UTF-16 surrogate, which no UTF-8 file can hold; save the file as UTF-8',
    );
  }
}
