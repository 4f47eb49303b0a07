/**
 * The fast reader of `*.json` files, without the YAML machinery: a first linear pass measures
 * nesting and entries before anything is built (the bounds and messages of the YAML pipeline,
 * `yaml.ts`), `JSON.parse` holds the text to JSON syntax (`checkJson`), and a second pass builds
 * the values and notes where each entry was written. Values, lines and literals are those the
 * YAML path gives for the same text (JSON is YAML 1.2 flow style; numbers resolve as YAML's core
 * schema resolves them: `parseInt` for integers, `parseFloat` for the rest);
 * `test/parse/json-fast-path.test.ts` holds the two paths to that on the fixtures and on
 * generated texts.
 *
 * Returns null where the YAML path reads the text differently or refuses it with a message of
 * its own (a carriage return not followed by a line feed, a top level that is not an object):
 * the caller then takes the YAML path, which says why. Nesting past `MAX_NESTING` is refused
 * here, at the line the YAML path names, without parsing.
 */
import { ReadError } from './errors.js';
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
import { checkJson, jsonStandIn, jsonSyntaxErrorOffset } from './json-syntax.js';
import { FLOW_DEPTH_CUTOFF, MAX_ENTRIES, MAX_NESTING, YamlLimitError } from './yaml.js';
import { yamlLimitError } from './yaml-build.js';
import { nullRecord } from '../null-record.js';

const OPEN_OBJECT = 0x7b;
const CLOSE_OBJECT = 0x7d;
const OPEN_LIST = 0x5b;
const CLOSE_LIST = 0x5d;
const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const COMMA = 0x2c;
const COLON = 0x3a;

/** Thrown inside the reader when the text is not what `checkJson` promised: take the YAML path. */
class NotForFastPath extends Error {}

const isSpace = (c: number): boolean => c === 0x20 || c === 0x0a || c === 0x0d || c === 0x09;

/** Offset just past the string whose opening quote is at `start`. */
function stringEnd(text: string, start: number): number {
  for (let j = start + 1; ;) {
    const q = text.indexOf('"', j);
    if (q === -1) throw new NotForFastPath();
    let b = q - 1;
    while (text.charCodeAt(b) === BACKSLASH) b--;
    if ((q - 1 - b) % 2 === 0) return q + 1;
    j = q + 1;
  }
}

/**
 * Reads JSON `text` from `file`: holds it to JSON syntax (`checkJson`, which throws the syntax
 * error), then into a document, or null when the YAML path must read it. Throws `ReadError` for
 * more than `MAX_ENTRIES` entries (counted before `JSON.parse` builds anything, so a 4 MiB file
 * of tiny entries is refused in one pass), forbidden and duplicate keys, as the YAML path does.
 */
export function readJsonSource(text: string, file: string): SourceDocument | null {
  let measured: Measured | 'unreadable';
  try {
    measured = measure(text);
  } catch (error) {
    if (!(error instanceof NotForFastPath)) throw error;
    measured = 'unreadable';
  }
  const bounds = measured === 'unreadable' ? measured : measured.bounds;
  // A syntax error is named before a bound, as on the YAML path: JSON's own grammar decides
  // without building anything. Past a bound `JSON.parse` is not run at all (it would build every
  // value first: 2 million nested lists took 2 s and 275 MiB), so the grammar words the error.
  if (measured !== 'unreadable' && measured.bounds !== 'within') {
    const fault = jsonSyntaxErrorOffset(jsonStandIn(text));
    if (fault !== -1) {
      const what =
        fault >= text.length
          ? 'the text ends before the JSON value does'
          : `unexpected character ${JSON.stringify(text[fault])}`;
      throw new ReadError(file, lineIndex(text)(fault), `is not valid JSON: ${what}`);
    }
    if (measured.bounds === 'too deep') {
      throw yamlLimitError(
        new YamlLimitError('nesting', lineIndex(text)(tooDeepAt(measured))),
        file,
      );
    }
    throw new ReadError(
      file,
      lineIndex(text)(entriesPastLimit(text, measured.entries)),
      `holds more than ${MAX_ENTRIES} keys and list items; a model file holds a few hundred (label maps a few ten thousand)`,
    );
  }
  checkJson(text, file);
  // YAML takes a lone carriage return for a line break JSON does not know, and reads the text
  // otherwise; the YAML path keeps doing so.
  if (bounds !== 'within' || /\r(?!\n)/.test(text)) return null;
  try {
    const reader = new JsonBuilder(text, file);
    const value = reader.document();
    return value === null ? null : sourceDocument(value, text, reader.notes, reader.lineAt);
  } catch (error) {
    if (error instanceof NotForFastPath) return null;
    throw error;
  }
}

type Bounds = 'within' | 'too deep' | 'too many';

interface Measured {
  bounds: Bounds;
  /** Offsets of the first and the last bracket that opens a level past `MAX_NESTING` (-1: none). */
  firstTooDeep: number;
  lastTooDeep: number;
  /** Deepest level reached. */
  deepest: number;
  /** Entries, as the YAML syntax tree counts them. */
  entries: number;
}

/**
 * The first pass, which builds nothing: whether nesting and entries are within `MAX_NESTING`
 * and `MAX_ENTRIES` (nesting first: the YAML path names the place of a deep one). Entries count
 * as the YAML syntax tree counts them: the items of a collection are its commas plus one, and
 * only `[]` and `{}` have none.
 */
function measure(text: string): Measured {
  const n = text.length;
  let depth = 0;
  let deepest = 0;
  let entries = 0;
  let firstTooDeep = -1;
  let lastTooDeep = -1;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === QUOTE) i = stringEnd(text, i) - 1;
    else if (c === OPEN_OBJECT || c === OPEN_LIST) {
      depth++;
      if (depth > deepest) deepest = depth;
      if (depth === MAX_NESTING + 1) {
        if (firstTooDeep < 0) firstTooDeep = i;
        lastTooDeep = i;
      }
      const next = text.charCodeAt(i + 1);
      if (next !== CLOSE_OBJECT && next !== CLOSE_LIST) entries++;
    } else if (c === CLOSE_OBJECT || c === CLOSE_LIST) depth--;
    else if (c === COMMA) entries++;
  }
  const bounds = deepest > MAX_NESTING ? 'too deep' : entries > MAX_ENTRIES ? 'too many' : 'within';
  return { bounds, firstTooDeep, lastTooDeep, deepest, entries };
}

/**
 * Offset of the collection the YAML pipeline names for nesting past `MAX_NESTING`: its lexer
 * pass stops past `FLOW_DEPTH_CUTOFF` at the first bracket past the level, and below that its
 * tree walk, which visits a collection and then its children last to first, meets the last one.
 */
function tooDeepAt(measured: Measured): number {
  return measured.deepest > FLOW_DEPTH_CUTOFF ? measured.firstTooDeep : measured.lastTooDeep;
}

/**
 * Offset of the collection at which the YAML pipeline's count of entries passes `MAX_ENTRIES`:
 * it visits a collection, then its child collections last to first, each with all it holds,
 * which is the reverse of the order in which collections close. Run only on a file past the
 * bound; `total` is its count of entries (from `measure`).
 */
function entriesPastLimit(text: string, total: number): number {
  // Counted from the last collection to close back, the count passes the bound at the last
  // collection whose entries closed before it number fewer than `total - MAX_ENTRIES`: one
  // forward pass finds it, holding only the open collections (before: every closed one, 1 s
  // for 2 million).
  const before = total - MAX_ENTRIES;
  const openAt: number[] = [];
  const openItems: number[] = [];
  let closedEntries = 0;
  let found = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === QUOTE) i = stringEnd(text, i) - 1;
    else if (c === OPEN_OBJECT || c === OPEN_LIST) {
      const next = text.charCodeAt(i + 1);
      openAt.push(i);
      openItems.push(next === CLOSE_OBJECT || next === CLOSE_LIST ? 0 : 1);
    } else if (c === COMMA) {
      if (openItems.length > 0) openItems[openItems.length - 1]!++;
    } else if ((c === CLOSE_OBJECT || c === CLOSE_LIST) && openAt.length > 0) {
      const at = openAt.pop()!;
      if (closedEntries >= before) break;
      found = at;
      closedEntries += openItems.pop()!;
    }
  }
  return found;
}

/** The second pass: values and notes, keys checked as they come. */
class JsonBuilder {
  readonly notes = new EntryNotes();
  readonly lineAt: (offset: number) => number;
  private i = 0;

  constructor(
    private readonly text: string,
    private readonly file: string,
  ) {
    this.lineAt = lineIndex(text);
  }

  /** The top-level mapping, or null when the top level is not an object. */
  document(): SourceMapping | null {
    this.skipSpace();
    if (this.text.charCodeAt(this.i) !== OPEN_OBJECT) return null;
    const value = this.value(null) as SourceMapping;
    this.skipSpace();
    if (this.i !== this.text.length) throw new NotForFastPath();
    return value;
  }

  private skipSpace(): void {
    const text = this.text;
    let i = this.i;
    while (isSpace(text.charCodeAt(i))) i++;
    this.i = i;
  }

  /** The value at the cursor (after any space), leaving the cursor just past it. */
  private value(path: PathLink): SourceValue {
    const text = this.text;
    const c = text.charCodeAt(this.i);
    if (c === OPEN_OBJECT) return this.mapping(path);
    if (c === OPEN_LIST) return this.list(path);
    if (c === QUOTE) return this.string();
    return this.scalar();
  }

  private mapping(path: PathLink): SourceMapping {
    const text = this.text;
    const out: SourceMapping = nullRecord();
    const notes = this.notes.open(out);
    this.i++;
    this.skipSpace();
    if (text.charCodeAt(this.i) === CLOSE_OBJECT) {
      this.i++;
      return out;
    }
    for (;;) {
      this.skipSpace();
      const at = this.i;
      if (text.charCodeAt(at) !== QUOTE) throw new NotForFastPath();
      const key = this.string();
      checkKey(this.file, key, path, notes, () => this.lineAt(at));
      this.skipSpace();
      if (text.charCodeAt(this.i) !== COLON) throw new NotForFastPath();
      this.i++;
      this.skipSpace();
      const start = this.i;
      const first = text.charCodeAt(start);
      const scalar = first !== OPEN_OBJECT && first !== OPEN_LIST;
      // Noted before the value is built, as the YAML path does, so errors come in the same order.
      const place = { at, start: scalar ? start : -1, end: -1 };
      notes.set(key, place);
      out[key] = this.value({ parent: path, segment: key });
      if (scalar) place.end = this.i;
      this.skipSpace();
      const next = text.charCodeAt(this.i++);
      if (next === CLOSE_OBJECT) return out;
      if (next !== COMMA) throw new NotForFastPath();
    }
  }

  private list(path: PathLink): SourceValue[] {
    const text = this.text;
    const out: SourceValue[] = [];
    const notes = this.notes.open(out);
    this.i++;
    this.skipSpace();
    if (text.charCodeAt(this.i) === CLOSE_LIST) {
      this.i++;
      return out;
    }
    for (let index = 0; ; index++) {
      this.skipSpace();
      const start = this.i;
      const first = text.charCodeAt(start);
      const scalar = first !== OPEN_OBJECT && first !== OPEN_LIST;
      const place = { at: start, start: scalar ? start : -1, end: -1 };
      notes.set(index, place);
      out.push(this.value({ parent: path, segment: index }));
      if (scalar) place.end = this.i;
      this.skipSpace();
      const next = text.charCodeAt(this.i++);
      if (next === CLOSE_LIST) return out;
      if (next !== COMMA) throw new NotForFastPath();
    }
  }

  /** The string whose opening quote is at the cursor: its text as JSON (and YAML) decode it. */
  private string(): string {
    const start = this.i;
    const end = stringEnd(this.text, start);
    this.i = end;
    const body = this.text.slice(start + 1, end - 1);
    // Escapes are rare in configs; JSON.parse decodes the few strings that hold them.
    return body.includes('\\') ? (JSON.parse(this.text.slice(start, end)) as string) : body;
  }

  /** A number, true, false, null, or a bare NaN, Infinity or -Infinity. */
  private scalar(): SourceValue {
    const text = this.text;
    const start = this.i;
    let end = start;
    for (;;) {
      const c = text.charCodeAt(end);
      if (Number.isNaN(c) || isSpace(c) || c === COMMA || c === CLOSE_OBJECT || c === CLOSE_LIST)
        break;
      end++;
    }
    this.i = end;
    const word = text.slice(start, end);
    switch (word) {
      case 'true':
        return true;
      case 'false':
        return false;
      case 'null':
        return null;
      case 'NaN':
      case 'Infinity':
      case '-Infinity':
        return Number(word);
    }
    if (!JSON_NUMBER.test(word)) throw new NotForFastPath();
    // YAML's core schema: integers through parseInt, base 10; floats through parseFloat.
    return /[.eE]/.test(word) ? parseFloat(word) : parseInt(word, 10);
  }
}

const JSON_NUMBER = /^-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?$/;
