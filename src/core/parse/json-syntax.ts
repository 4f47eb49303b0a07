/**
 * JSON syntax (RFC 8259) for files named `*.json`: YAML would read a broken `config.json` (a bare
 * word, a trailing comma) that JSON loaders refuse, so JSON files are first held to JSON's own
 * grammar. `JSON.parse` decides; where its message carries no position, a hand-written grammar
 * (`jsonSyntaxErrorOffset`) finds the offset, so the error names the line.
 */
import { ReadError } from './errors.js';

/**
 * Strict JSON syntax, as the JSON loaders of the checkpoint libraries apply it: their Python
 * reader also takes bare NaN, Infinity and -Infinity, so those pass here too (and read as numbers).
 */
export function checkJson(text: string, file: string): void {
  const standIn = jsonStandIn(text);
  try {
    JSON.parse(standIn);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const at = /at position (\d+)/.exec(message);
    const lineCol = /\(line (\d+) column \d+\)/.exec(message);
    let line: number | null = null;
    if (at) line = text.slice(0, Number(at[1])).split('\n').length;
    else if (lineCol) line = Number(lineCol[1]);
    else {
      // Some engine messages ("Unexpected token …") carry no position: find it with the grammar.
      const offset = jsonSyntaxErrorOffset(standIn);
      if (offset >= 0) line = text.slice(0, offset).split('\n').length;
    }
    const reason = message
      .replace(/ in JSON at position \d+.*$/s, '')
      .replace(/ \(line \d+ column \d+\)$/, '')
      .replace(/, (\.\.\.)?".*$/s, '');
    throw new ReadError(file, line, `is not valid JSON: ${reason}`);
  }
}

/**
 * `text` with each bare NaN, Infinity and -Infinity outside strings replaced by a number of the
 * same length (`0` and spaces), so JSON's grammar accepts them and error positions stay true.
 */
export function jsonStandIn(text: string): string {
  if (!/NaN|Infinity/.test(text)) return text;
  return text.replace(/"(?:[^"\\]|\\.)*"|-?Infinity|NaN/g, (m) =>
    m.startsWith('"') ? m : `0${' '.repeat(m.length - 1)}`,
  );
}

const JSON_NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const HEX4 = /[0-9a-fA-F]{4}/y;
/** Characters that may follow a backslash in a JSON string, besides `u`: `" \ / b f n r t`. */
const JSON_ESCAPES = new Set([0x22, 0x5c, 0x2f, 0x62, 0x66, 0x6e, 0x72, 0x74]);
const OPEN_OBJECT = 0x7b;
const CLOSE_OBJECT = 0x7d;
const OPEN_LIST = 0x5b;
const CLOSE_LIST = 0x5d;
const isJsonSpace = (c: number): boolean => c === 0x20 || c === 0x09 || c === 0x0a || c === 0x0d;

/**
 * Offset of the first character JSON's grammar (RFC 8259) does not allow there, the text's
 * length when it ends early, or -1 when it is valid JSON. A loop with an explicit stack, so any
 * nesting depth is safe; it builds nothing, so it also decides texts too large to parse.
 */
export function jsonSyntaxErrorOffset(text: string): number {
  const n = text.length;
  // The open brackets, as bytes: a plain array of millions of numbers cost the collector more
  // than the scan (2 million nested lists: 0.46 s).
  let stack = new Uint8Array(64);
  let depth = 0;
  let i = 0;
  let expect: 'value' | 'key' | 'colon' | 'next' | 'done' = 'value';
  const after = () => (depth === 0 ? 'done' : 'next');
  /** Index after the string opening at `i`, or -(offset + 1) of the fault. */
  const stringEnd = (start: number): number => {
    for (let j = start + 1; j < n; j += 1) {
      const c = text.charCodeAt(j);
      if (c === 0x22) return j + 1;
      if (c < 0x20) return -(j + 1);
      if (c === 0x5c) {
        const e = text.charCodeAt(j + 1);
        if (e === 0x75) {
          HEX4.lastIndex = j + 2;
          if (!HEX4.test(text)) return -(j + 1);
          j += 5;
        } else if (JSON_ESCAPES.has(e)) j += 1;
        else return -(j + 2);
      }
    }
    return -(n + 1);
  };
  for (;;) {
    while (i < n && isJsonSpace(text.charCodeAt(i))) i += 1;
    if (i >= n) return expect === 'done' ? -1 : n;
    const c = text.charCodeAt(i);
    if (expect === 'done') return i;
    if (expect === 'colon') {
      if (c !== 0x3a) return i;
      i += 1;
      expect = 'value';
    } else if (expect === 'next') {
      const top = depth > 0 ? stack[depth - 1] : undefined;
      if (c === 0x2c) {
        i += 1;
        expect = top === OPEN_OBJECT ? 'key' : 'value';
      } else if (
        (c === CLOSE_OBJECT && top === OPEN_OBJECT) ||
        (c === CLOSE_LIST && top === OPEN_LIST)
      ) {
        i += 1;
        depth -= 1;
        expect = after();
      } else return i;
    } else if (expect === 'key' || c === 0x22) {
      if (c !== 0x22) return i;
      const end = stringEnd(i);
      if (end < 0) return -end - 1;
      i = end;
      expect = expect === 'key' ? 'colon' : after();
    } else if (c === OPEN_OBJECT || c === OPEN_LIST) {
      if (depth === stack.length) {
        const grown = new Uint8Array(stack.length * 2);
        grown.set(stack);
        stack = grown;
      }
      stack[depth++] = c;
      i += 1;
      while (i < n && isJsonSpace(text.charCodeAt(i))) i += 1;
      if (text.charCodeAt(i) === (c === OPEN_OBJECT ? CLOSE_OBJECT : CLOSE_LIST)) {
        i += 1;
        depth -= 1;
        expect = after();
      } else expect = c === OPEN_OBJECT ? 'key' : 'value';
    } else {
      const literal =
        c === 0x74 && text.startsWith('true', i)
          ? 4
          : c === 0x66 && text.startsWith('false', i)
            ? 5
            : c === 0x6e && text.startsWith('null', i)
              ? 4
              : 0;
      if (literal > 0) i += literal;
      else {
        JSON_NUMBER.lastIndex = i;
        const number = JSON_NUMBER.exec(text);
        if (number === null) return i;
        i += number[0].length;
      }
      expect = after();
    }
  }
}
