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
const JSON_ESCAPES = new Set(['"', '\\', '/', 'b', 'f', 'n', 'r', 't']);

/**
 * Offset of the first character JSON's grammar (RFC 8259) does not allow there, the text's
 * length when it ends early, or -1 when it is valid JSON. A loop with an explicit stack, so any
 * nesting depth is safe.
 */
export function jsonSyntaxErrorOffset(text: string): number {
  const n = text.length;
  const stack: string[] = [];
  let i = 0;
  let expect: 'value' | 'key' | 'colon' | 'next' | 'done' = 'value';
  const after = () => (stack.length === 0 ? 'done' : 'next');
  /** Index after the string opening at `i`, or -(offset + 1) of the fault. */
  const stringEnd = (start: number): number => {
    for (let j = start + 1; j < n; j += 1) {
      const c = text.charCodeAt(j);
      if (c === 0x22) return j + 1;
      if (c < 0x20) return -(j + 1);
      if (c === 0x5c) {
        const e = text[j + 1];
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(j + 2, j + 6))) return -(j + 1);
          j += 5;
        } else if (e !== undefined && JSON_ESCAPES.has(e)) j += 1;
        else return -(j + 2);
      }
    }
    return -(n + 1);
  };
  for (;;) {
    while (i < n && (text[i] === ' ' || text[i] === '\t' || text[i] === '\n' || text[i] === '\r'))
      i += 1;
    if (i >= n) return expect === 'done' ? -1 : n;
    const c = text[i];
    if (expect === 'done') return i;
    if (expect === 'colon') {
      if (c !== ':') return i;
      i += 1;
      expect = 'value';
    } else if (expect === 'next') {
      const top = stack[stack.length - 1];
      if (c === ',') {
        i += 1;
        expect = top === '{' ? 'key' : 'value';
      } else if ((c === '}' && top === '{') || (c === ']' && top === '[')) {
        i += 1;
        stack.pop();
        expect = after();
      } else return i;
    } else if (expect === 'key' || c === '"') {
      if (c !== '"') return i;
      const end = stringEnd(i);
      if (end < 0) return -end - 1;
      i = end;
      expect = expect === 'key' ? 'colon' : after();
    } else if (c === '{' || c === '[') {
      stack.push(c);
      i += 1;
      while (i < n && /[ \t\n\r]/.test(text[i]!)) i += 1;
      if (text[i] === (c === '{' ? '}' : ']')) {
        i += 1;
        stack.pop();
        expect = after();
      } else expect = c === '{' ? 'key' : 'value';
    } else {
      const literal = ['true', 'false', 'null'].find((word) => text.startsWith(word, i));
      JSON_NUMBER.lastIndex = i;
      const number = literal === undefined ? JSON_NUMBER.exec(text) : null;
      if (literal === undefined && number === null) return i;
      i += literal?.length ?? number![0].length;
      expect = after();
    }
  }
}
