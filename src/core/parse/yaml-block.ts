/**
 * The fast reader of plain block YAML, the way model descriptions are written: nested block
 * mappings of plain keys, block lists of scalars, single-line plain or quoted scalars, blank
 * lines and comments at the left margin. It reads that subset in one linear pass, without the
 * YAML machinery, and gives exactly what the YAML path (`yaml.ts`, `yaml-build.ts`) gives for the
 * same text: plain scalars resolve by the YAML 1.2 core schema (YAML 1.2.2, section 10.3.2:
 * null, bool, int in bases 8, 10 and 16, float, .inf and .nan), keys are checked the same way,
 * and the bounds on tokens and entries refuse with the same messages.
 * `test/parse/yaml-fast-path.test.ts` holds the two readers to that on the fixtures and on
 * generated texts.
 *
 * Anything outside the subset (flow collections, anchors, tags, multi-line or escaped scalars,
 * tabs, carriage returns, indented comments, documents, compact lists under a key, keys that
 * are not plain words, nesting past `MAX_NESTING`) returns null: the YAML path reads it, or says
 * why it cannot.
 */
import {
  EntryNotes,
  checkKey,
  lineIndex,
  sourceDocument,
  type PathLink,
  type SourceDocument,
  type SourceMapping,
  type SourceValue,
} from './source-document.js';
import { MAX_ENTRIES, MAX_NESTING, MAX_TOKENS, YamlLimitError, countYamlTokens } from './yaml.js';
import { yamlLimitError } from './yaml-build.js';
import { nullRecord } from '../null-record.js';

/** A plain key is a word of letters, digits, `_` and `-`, starting with a letter or `_`. */
function isKeyChar(c: number, first: boolean): boolean {
  const letter = (c >= 0x41 && c <= 0x5a) || (c >= 0x61 && c <= 0x7a) || c === 0x5f;
  return letter || (!first && ((c >= 0x30 && c <= 0x39) || c === 0x2d));
}
/** Words the core schema reads as null or a boolean: as keys they are not text. */
const NOT_TEXT_KEYS = new Set([
  'null',
  'Null',
  'NULL',
  'true',
  'True',
  'TRUE',
  'false',
  'False',
  'FALSE',
]);
/** Characters that give a plain scalar's first character another meaning (YAML 1.2.2, 5.3). */
const INDICATORS = new Set([...'-?:,[]{}#&*!|>\'"%@`']);

/** Tokens below `MAX_TOKENS` past which the lexer counts them instead of this reader. */
const TOKEN_MARGIN = 50_000;

/** Thrown inside the reader when the text leaves the subset: take the YAML path. */
class NotForFastPath extends Error {}

interface Frame {
  indent: number;
  kind: 'map' | 'seq';
  value: SourceMapping | SourceValue[];
  notes: ReturnType<EntryNotes['open']>;
  path: PathLink;
  /** Offset of the first entry: where the YAML syntax tree places the collection. */
  offset: number;
  items: number;
}

/** A key written with nothing after it: its value is the block below it, or null. */
interface Pending {
  frame: Frame;
  key: string;
  at: number;
  indent: number;
  end: number;
}

/**
 * Reads `text` (already through `checkText`) as plain block YAML, or returns null when it is
 * not in the subset. Throws `ReadError` for forbidden and duplicate keys and for more than
 * `MAX_TOKENS` tokens or `MAX_ENTRIES` entries, as the YAML path does; `YamlLimitError` carries
 * the bounds, as `composeYaml` throws them.
 */
export function readBlockYaml(text: string, file: string): SourceDocument | null {
  if (/[\t\r]/.test(text)) return null;
  try {
    // First the shape and the bounds, building nothing; then the values, keys checked as they
    // come: the YAML path's order (tokens, entries, then keys).
    new BlockReader(text, file, false).read();
    return new BlockReader(text, file, true).read();
  } catch (error) {
    if (error instanceof NotForFastPath) return null;
    throw error;
  }
}

class BlockReader {
  private readonly notes = new EntryNotes();
  private readonly lineAt: (offset: number) => number;
  private readonly stack: Frame[] = [];
  /** Collections in the order they close, for the place the entries bound names. */
  private readonly closed: { offset: number; items: number }[] = [];
  private pending: Pending | null = null;
  private entries = 0;
  private comments = 0;
  /** Lexical tokens the YAML lexer makes of the lines read, counted from above. */
  private tokens = 1;

  constructor(
    private readonly text: string,
    private readonly file: string,
    /** False for the first pass: shape and bounds only, no key checks. */
    private readonly build: boolean,
  ) {
    this.lineAt = lineIndex(text);
  }

  read(): SourceDocument {
    const text = this.text;
    let root: SourceMapping | null = null;
    for (let start = 0; start < text.length;) {
      const newline = text.indexOf('\n', start);
      const end = newline === -1 ? text.length : newline;
      const atEnd = newline === -1;
      let i = start;
      while (i < end && text.charCodeAt(i) === 0x20) i++;
      const indent = i - start;
      this.tokens += (indent > 0 ? 1 : 0) + (atEnd ? 0 : 1);
      if (i === end) {
        // A blank line.
      } else if (text[i] === '#') {
        if (indent !== 0) throw new NotForFastPath();
        this.comments++;
        this.tokens += 1;
      } else {
        if (root === null) {
          if (indent !== 0) throw new NotForFastPath();
          root = Object.create(null) as SourceMapping;
          this.push({
            indent: 0,
            kind: 'map',
            value: root,
            notes: this.notes.open(root),
            path: null,
            offset: i,
            items: 0,
          });
        }
        this.line(i, end, indent);
      }
      start = end + 1;
    }
    if (root === null) throw new NotForFastPath();
    this.settle(-1, -1, false);
    while (this.stack.length > 0) this.pop();
    if (!this.build) this.bounds();
    return sourceDocument(root, text, this.notes, this.lineAt);
  }

  /** One line of content starting at `i` (after `indent` spaces), ending at `end`. */
  private line(i: number, end: number, indent: number): void {
    const text = this.text;
    const item = text[i] === '-' && (i + 1 === end || text[i + 1] === ' ');
    this.settle(indent, i, item);
    while (this.stack[this.stack.length - 1]!.indent > indent) this.pop();
    const frame = this.stack[this.stack.length - 1]!;
    if (frame.indent !== indent) throw new NotForFastPath();
    if (frame.kind === 'seq') {
      if (!item) throw new NotForFastPath();
      this.listItem(frame, i, end);
    } else {
      if (item) throw new NotForFastPath();
      this.keyLine(frame, i, end, indent);
    }
  }

  /** Gives the pending key its value: the block opening on this line, or null. */
  private settle(indent: number, i: number, item: boolean): void {
    const pending = this.pending;
    if (pending === null) return;
    this.pending = null;
    const { frame, key, at } = pending;
    const out = frame.value as SourceMapping;
    if (indent > pending.indent) {
      if (this.stack.length >= MAX_NESTING) throw new NotForFastPath();
      const value: SourceMapping | SourceValue[] = item ? [] : nullRecord<SourceValue>();
      frame.notes.set(key, { at, start: -1, end: -1 });
      out[key] = value;
      this.push({
        indent,
        kind: item ? 'seq' : 'map',
        value,
        notes: this.notes.open(value),
        path: { parent: frame.path, segment: key },
        offset: i,
        items: 0,
      });
      return;
    }
    // A list at the key's own indentation belongs to the key in YAML: the YAML path reads it.
    if (indent === pending.indent && item) throw new NotForFastPath();
    frame.notes.set(key, { at, start: pending.end, end: pending.end });
    out[key] = null;
  }

  private keyLine(frame: Frame, i: number, end: number, indent: number): void {
    const text = this.text;
    let colon = i;
    while (colon < end && isKeyChar(text.charCodeAt(colon), colon === i)) colon++;
    if (colon === i) throw new NotForFastPath();
    const key = text.slice(i, colon);
    if (colon >= end || text[colon] !== ':') throw new NotForFastPath();
    if (colon + 1 < end && text[colon + 1] !== ' ') throw new NotForFastPath();
    if (NOT_TEXT_KEYS.has(key)) throw new NotForFastPath();
    if (this.build) checkKey(this.file, key, frame.path, frame.notes, () => this.lineAt(i));
    this.count(frame);
    this.tokens += 3;
    let v = colon + 1;
    while (v < end && text.charCodeAt(v) === 0x20) v++;
    if (v === end) {
      if (v > colon + 1) this.tokens += 1;
      this.pending = { frame, key, at: i, indent, end };
      // Placed now so the mapping keeps the order of the file.
      (frame.value as SourceMapping)[key] = null;
      return;
    }
    this.tokens += 1;
    const [value, vEnd] = this.scalar(v, end);
    frame.notes.set(key, { at: i, start: v, end: vEnd });
    (frame.value as SourceMapping)[key] = value;
  }

  private listItem(frame: Frame, i: number, end: number): void {
    const text = this.text;
    let v = i + 1;
    while (v < end && text.charCodeAt(v) === 0x20) v++;
    if (v === end) throw new NotForFastPath();
    const list = frame.value as SourceValue[];
    this.count(frame);
    this.tokens += 2;
    const [value, vEnd] = this.scalar(v, end);
    frame.notes.set(list.length, { at: v, start: v, end: vEnd });
    list.push(value);
  }

  /**
   * The scalar from `v` to the end of the line (a comment after a space aside): its value and
   * where its text ends. Plain scalars resolve by the core schema; quoted ones must hold no
   * escape.
   */
  private scalar(v: number, end: number): [SourceValue, number] {
    const text = this.text;
    const first = text[v]!;
    let valueEnd: number;
    let value: SourceValue;
    if (first === '"' || first === "'") {
      const close = text.slice(0, end).indexOf(first, v + 1);
      if (close === -1) throw new NotForFastPath();
      const body = text.slice(v + 1, close);
      if (first === '"' && body.includes('\\')) throw new NotForFastPath();
      if (first === "'" && text[close + 1] === "'") throw new NotForFastPath();
      valueEnd = close + 1;
      value = body;
      this.tokens += 1;
    } else {
      // `-1` and `-.5` are plain; a leading indicator otherwise means something else.
      if (INDICATORS.has(first) && !(first === '-' && /[0-9.]/.test(text[v + 1] ?? '')))
        throw new NotForFastPath();
      // A comment starts at a ` #` within the line (searched in the line only: linear in all).
      const hash = text.slice(v, end).indexOf(' #');
      valueEnd = hash === -1 ? end : v + hash;
      while (text.charCodeAt(valueEnd - 1) === 0x20) valueEnd--;
      const written = text.slice(v, valueEnd);
      if (/: |:$|[[\]{},]|^---|^\.\.\./.test(written)) throw new NotForFastPath();
      value = coreScalar(written);
      this.tokens += 2;
    }
    // What may follow: spaces, then a comment after a space.
    let rest = valueEnd;
    while (rest < end && text.charCodeAt(rest) === 0x20) rest++;
    if (rest < end && (text[rest] !== '#' || rest === valueEnd)) throw new NotForFastPath();
    if (rest > valueEnd) this.tokens += 1;
    if (rest < end) this.tokens += 1;
    return [value, valueEnd];
  }

  private count(frame: Frame): void {
    frame.items++;
    this.entries++;
  }

  private push(frame: Frame): void {
    this.stack.push(frame);
  }

  private pop(): void {
    const frame = this.stack.pop()!;
    // A list or mapping opened under a key but left without entries is not in the subset.
    if (frame.items === 0) throw new NotForFastPath();
    this.closed.push({ offset: frame.offset, items: frame.items });
  }

  /**
   * The YAML pipeline's bounds, in its order: lexical tokens (counted by its own lexer when the
   * count from above could pass `MAX_TOKENS`), then entries. Comment lines can add entries to
   * the syntax tree the count here does not see; near the bound the YAML path decides.
   */
  private bounds(): void {
    // The count from above matches the lexer on the subset; within a margin of the bound, the
    // lexer itself decides.
    if (this.tokens > MAX_TOKENS - TOKEN_MARGIN && countYamlTokens(this.text) > MAX_TOKENS) {
      throw yamlLimitError(new YamlLimitError('tokens', null), this.file);
    }
    if (this.entries + this.comments <= MAX_ENTRIES) return;
    if (this.comments > 0) throw new NotForFastPath();
    // The pipeline visits a collection, then its child collections last to first: the reverse
    // of the order in which they close.
    let entries = 0;
    for (let k = this.closed.length - 1; k >= 0; k--) {
      entries += this.closed[k]!.items;
      if (entries > MAX_ENTRIES) {
        throw yamlLimitError(
          new YamlLimitError('entries', this.lineAt(this.closed[k]!.offset)),
          this.file,
        );
      }
    }
  }
}

/**
 * A plain scalar by the YAML 1.2 core schema (YAML 1.2.2, section 10.3.2), in the order of its
 * table: null, bool, then integers in bases 8, 10 and 16, then .inf/.nan, floats with an
 * exponent and without; anything else is text.
 */
export function coreScalar(s: string): SourceValue {
  if (/^(?:~|[Nn]ull|NULL)?$/.test(s)) return null;
  if (/^(?:[Tt]rue|TRUE)$/.test(s)) return true;
  if (/^(?:[Ff]alse|FALSE)$/.test(s)) return false;
  if (/^0o[0-7]+$/.test(s)) return parseInt(s.slice(2), 8);
  if (/^[-+]?[0-9]+$/.test(s)) return parseInt(s, 10);
  if (/^0x[0-9a-fA-F]+$/.test(s)) return parseInt(s.slice(2), 16);
  if (/^(?:[-+]?\.(?:inf|Inf|INF))$/.test(s))
    return s[0] === '-' ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY;
  if (/^(?:\.nan|\.NaN|\.NAN)$/.test(s)) return NaN;
  if (/^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/.test(s)) return parseFloat(s);
  if (/^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/.test(s)) return parseFloat(s);
  return s;
}
