/**
 * One reader for JSON and YAML text (JSON is read as YAML 1.2 flow style, which it is a subset
 * of, apart from duplicate keys, which are refused here). It keeps the 1-based line of every key
 * and the source text of every scalar, and it is built for untrusted text from forks: bounded
 * size, nesting and alias expansion, no prototype-altering keys, no binary text.
 */
import { Composer, Lexer, LineCounter, Parser, isAlias, isMap, isScalar, isSeq } from 'yaml';
import type { CST, Document, Node as YamlNode, YAMLError } from 'yaml';
import { elementAt } from '../element-at.js';
import { nullRecord } from '../null-record.js';
import { ReadError } from './errors.js';
import { dottedKey, quoteText, quoteValue, truncate } from './quote.js';
import type { PathSegment } from './quote.js';

export type { PathSegment } from './quote.js';

/** A value read from the file: mappings are null-prototype objects. */
export type SourceValue = null | boolean | number | string | SourceValue[] | SourceMapping;

/** A mapping read from the file. Built on `Object.create(null)`, so no key reaches a prototype. */
export interface SourceMapping {
  [key: string]: SourceValue;
}

export interface SourceDocument {
  /** The file's top-level mapping. */
  value: SourceMapping;
  /** 1-based line of the key at `path` (of the item, for a list index); null when absent. */
  lineOf(path: readonly PathSegment[]): number | null;
  /** The scalar at `path` exactly as written, quotes included; null for collections and absent paths. */
  literalOf(path: readonly PathSegment[]): string | null;
}

/** Deepest nesting of mappings and lists accepted; the top-level mapping is level 1 (default: `256`). */
export const MAX_NESTING = 256;
/** Alias expansions accepted per file, counting aliases met inside expanded content (default: `100`). */
export const MAX_ALIASES = 100;
/** Values that alias expansion may add to a file (default: `100000`). */
export const MAX_ALIAS_VALUES = 100_000;
/** Longest text accepted, in UTF-16 code units (default: `8388608`, 8 Mi). */
export const MAX_TEXT_LENGTH = 8 * 1024 * 1024;
/**
 * Mapping entries and list items a file may hold in all, counted on the syntax tree before any
 * value is built (default: `50000`). The largest published configs hold two label maps of about
 * 22,000 entries each (from memory: image classifiers over the 21,843 ImageNet-22k classes).
 */
export const MAX_ENTRIES = 50_000;
/**
 * Lexical tokens (keys, values, indicators, line breaks) read before the syntax tree is built
 * (default: `8 × MAX_ENTRIES`): a key-value line is about seven, and the count stops the read
 * of a file of tiny entries long before the parser would build them all.
 */
export const MAX_TOKENS = 8 * MAX_ENTRIES;

/** Keys refused anywhere: tools that merge parsed objects would turn them into prototype changes. */
export const FORBIDDEN_KEYS: readonly string[] = ['__proto__', 'constructor', 'prototype'];

const BOM = '\uFEFF';

/**
 * Bytes of a file as text: strict UTF-8 (a byte sequence that is not UTF-8 is refused, never
 * replaced), a leading byte-order mark dropped, and the text checks of `parseSource` applied
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
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    const at = firstInvalidUtf8(bytes);
    const line = lineAtByte(bytes, at);
    const hex = Array.from(bytes.subarray(at, at + 4), (b) => b.toString(16).padStart(2, '0')).join(
      ' ',
    );
    throw new ReadError(
      path,
      line,
      `is not UTF-8 text: bytes ${hex} at byte offset ${at} do not form a UTF-8 character (save the file as UTF-8)`,
    );
  }
  // A decoder with ignoreBOM false drops the mark itself; this covers a doubled one.
  if (text.startsWith(BOM)) text = text.slice(1);
  checkText(text, path);
  return text;
}

/**
 * Parses JSON or YAML `text` holding one document whose top level is a mapping.
 * Throws `ReadError` (naming `file` and the line) on bad text, bad syntax, duplicate or
 * forbidden keys, nesting deeper than `MAX_NESTING`, excessive aliasing or a non-mapping top level.
 */
export function parseSource(text: string, file: string): SourceDocument {
  if (text.startsWith(BOM)) text = text.slice(1);
  checkText(text, file);
  // YAML would read a broken config.json (a bare word, a trailing comma) that JSON loaders refuse.
  const json = /\.json$/i.test(file);
  if (json) checkJson(text, file);

  // A first, cheap pass: the lexer alone, stopped at MAX_TOKENS, bounds what the parser builds.
  let lexemes = 0;
  for (const lexeme of new Lexer().lex(text)) {
    void lexeme;
    if (++lexemes > MAX_TOKENS) {
      throw new ReadError(
        file,
        null,
        `holds more than ${MAX_TOKENS} syntax tokens (keys, values and punctuation); a model file holds a few thousand, label maps a few hundred thousand at most`,
      );
    }
  }

  const lineCounter = new LineCounter();
  const lineAt = (offset: number): number => lineCounter.linePos(offset).line;
  // Tokens are taken one top-level item at a time, and a second document stops the reading: a
  // million empty documents cost one, not a million composed documents.
  const tokens: CST.Token[] = [];
  let documents = 0;
  for (const token of new Parser(lineCounter.addNewLine).parse(text)) {
    if (token.type === 'document' && ++documents > 1) {
      throw new ReadError(
        file,
        lineAt(token.offset),
        'holds more than one YAML document; a model file holds one',
      );
    }
    tokens.push(token);
  }
  // The composer recurses once per level; refusing deep input before it runs keeps the stack safe.
  const shape = measureTree(tokens);
  if (shape.tooDeep !== null) {
    throw new ReadError(
      file,
      lineAt(shape.tooDeep),
      `nesting is deeper than ${MAX_NESTING} levels of mappings and lists; a model file needs a handful`,
    );
  }
  if (shape.tooMany !== null) {
    throw new ReadError(
      file,
      lineAt(shape.tooMany),
      `holds more than ${MAX_ENTRIES} keys and list items; a model file holds a few hundred (label maps a few ten thousand)`,
    );
  }

  const composer = new Composer({
    version: '1.2',
    schema: 'core',
    // Duplicate keys are found by the builder, one set lookup per key: the composer's own check
    // compares every key with every other (60,000 keys took 20–33 s).
    uniqueKeys: false,
    strict: true,
    prettyErrors: false,
  });
  const docs = Array.from(composer.compose(tokens, true, text.length));
  for (const doc of docs) {
    const problem = doc.errors[0] ?? doc.warnings[0];
    if (problem) throw syntaxError(problem, text, file, lineAt);
  }
  if (docs.length > 1) {
    throw new ReadError(
      file,
      lineAt(elementAt(docs, 1).range[0]),
      'holds more than one YAML document; a model file holds one',
    );
  }
  const [doc] = docs;
  const root = doc?.contents ?? null;
  if (doc === undefined || root === null || (isScalar(root) && root.value === null)) {
    throw new ReadError(file, null, 'is empty; expected a mapping of keys');
  }
  if (!isMap(root)) {
    const what = isSeq(root) ? 'a list' : isScalar(root) ? quoteValue(root.value) : 'not a mapping';
    throw new ReadError(
      file,
      lineAt(root.range?.[0] ?? 0),
      `top level is ${what}; expected a mapping of keys`,
    );
  }

  const builder = new Builder(doc, text, file, lineAt, json);
  const value = builder.build(root, [], 1) as SourceMapping;
  return {
    value,
    lineOf: (path) => builder.notesAt(value, path)?.line ?? null,
    literalOf: (path) => builder.notesAt(value, path)?.literal ?? null,
  };
}

/** What is known about one entry of a built mapping or list. */
interface EntryNotes {
  line: number;
  literal: string | null;
}

function checkText(text: string, file: string): void {
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

/**
 * Strict JSON syntax, as the JSON loaders of the checkpoint libraries apply it: their Python
 * reader also takes bare NaN, Infinity and -Infinity, so those pass here too (and read as numbers).
 */
function checkJson(text: string, file: string): void {
  // Same-length stand-ins keep error positions true to the file.
  const standIn = text.replace(/"(?:[^"\\]|\\.)*"|-?Infinity|NaN/g, (m) =>
    m.startsWith('"') ? m : `0${' '.repeat(m.length - 1)}`,
  );
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

/**
 * Offsets of the first collection nested deeper than `MAX_NESTING` and of the entry past
 * `MAX_ENTRIES`, or null; walks the syntax tree without recursion, before anything is composed.
 */
function measureTree(tokens: readonly CST.Token[]): {
  tooDeep: number | null;
  tooMany: number | null;
} {
  const stack: Array<[CST.Token, number]> = [];
  for (const token of tokens)
    if (token.type === 'document' && token.value) stack.push([token.value, 0]);
  let entries = 0;
  while (stack.length > 0) {
    const [token, depth] = stack.pop()!;
    if (
      token.type !== 'block-map' &&
      token.type !== 'block-seq' &&
      token.type !== 'flow-collection'
    )
      continue;
    const level = depth + 1;
    if (level > MAX_NESTING) return { tooDeep: token.offset, tooMany: null };
    entries += token.items.length;
    if (entries > MAX_ENTRIES) return { tooDeep: null, tooMany: token.offset };
    for (const item of token.items as CST.CollectionItem[]) {
      if (item.key) stack.push([item.key, level]);
      if (item.value) stack.push([item.value, level]);
    }
  }
  return { tooDeep: null, tooMany: null };
}

function syntaxError(
  problem: YAMLError,
  text: string,
  file: string,
  lineAt: (offset: number) => number,
): ReadError {
  const start = problem.pos[0];
  const line = lineAt(start);
  if (problem.code === 'DUPLICATE_KEY') {
    const written = /^("(?:[^"\\\n]|\\.)*"|'(?:[^'\n]|'')*'|[^:,{}[\]\n]+)/.exec(
      text.slice(start, start + 1024),
    );
    const key = written ? truncate(elementAt(written, 1).trim()) : 'here';
    return new ReadError(file, line, `duplicate key ${key}; each key may appear once in a mapping`);
  }
  const [firstLine = ''] = problem.message.split('\n');
  const reason = firstLine.replace(/ at line \d+, column \d+:?$/, '');
  // JSON readers meet YAML's wording for JSON's commonest slip; say what it usually means.
  const jsonHint =
    text.trimStart().startsWith('{') && problem.code !== 'BAD_DQ_ESCAPE'
      ? ' (in JSON: a missing comma or colon at or just before this line?)'
      : '';
  return new ReadError(file, line, `is not valid JSON or YAML: ${reason}${jsonHint}`);
}

/** Builds plain values from the composed document, noting each entry's line and literal beside its container. */
class Builder {
  private readonly notes = new WeakMap<object, Map<PathSegment, EntryNotes>>();
  private aliases = 0;
  private aliasValues = 0;
  private readonly expanding = new Set<YamlNode>();
  private insideAlias = 0;

  constructor(
    private readonly doc: Document.Parsed,
    private readonly text: string,
    private readonly file: string,
    private readonly lineAt: (offset: number) => number,
    private readonly json: boolean,
  ) {}

  build(node: unknown, path: PathSegment[], level: number): SourceValue {
    if (this.insideAlias > 0 && ++this.aliasValues > MAX_ALIAS_VALUES) {
      throw new ReadError(
        this.file,
        this.nodeLine(node),
        `aliases expand to more than ${MAX_ALIAS_VALUES} values; a model file needs far fewer`,
      );
    }
    if (isAlias(node)) return this.expand(node, path, level);
    if (isScalar(node)) return this.scalar(node, path);
    if (level > MAX_NESTING) {
      throw new ReadError(
        this.file,
        this.nodeLine(node),
        `nesting is deeper than ${MAX_NESTING} levels of mappings and lists once aliases are expanded`,
      );
    }
    if (isMap(node)) {
      const out: SourceMapping = nullRecord<SourceValue>();
      const notes = new Map<PathSegment, EntryNotes>();
      this.notes.set(out, notes);
      for (const pair of node.items) {
        const key = this.key(pair.key, path, notes);
        notes.set(key, { line: this.nodeLine(pair.key), literal: this.literal(pair.value) });
        out[key] =
          pair.value === null || pair.value === undefined
            ? null
            : this.build(pair.value, [...path, key], level + 1);
      }
      return out;
    }
    if (isSeq(node)) {
      const out: SourceValue[] = [];
      const notes = new Map<PathSegment, EntryNotes>();
      this.notes.set(out, notes);
      node.items.forEach((item, i) => {
        notes.set(i, { line: this.nodeLine(item), literal: this.literal(item) });
        out.push(
          item === null || item === undefined ? null : this.build(item, [...path, i], level + 1),
        );
      });
      return out;
    }
    throw new ReadError(this.file, this.nodeLine(node), 'holds a value of an unsupported kind');
  }

  /** Notes on the entry `path` leads to inside `root`, or undefined when the path is not there. */
  notesAt(root: SourceMapping, path: readonly PathSegment[]): EntryNotes | undefined {
    if (path.length === 0) return undefined;
    let container: unknown = root;
    for (let i = 0; i < path.length - 1; i++) {
      if (container === null || typeof container !== 'object') return undefined;
      const segment = elementAt(path, i);
      const step: unknown = (container as Record<string, unknown>)[String(segment)];
      if (!this.has(container, segment)) return undefined;
      container = step;
    }
    if (container === null || typeof container !== 'object') return undefined;
    const last = path[path.length - 1];
    return this.notes.get(container)?.get(Array.isArray(container) ? Number(last) : String(last));
  }

  private has(container: object, segment: PathSegment): boolean {
    return Array.isArray(container)
      ? Number.isInteger(Number(segment)) && Number(segment) < container.length
      : Object.prototype.hasOwnProperty.call(container, String(segment));
  }

  /** A scalar's source text (quotes included); null for collections, aliases and empty values. */
  private literal(node: unknown): string | null {
    if (!isScalar(node) || !node.range) return null;
    return this.text.slice(node.range[0], node.range[1]);
  }

  private key(keyNode: unknown, path: PathSegment[], seen: Map<PathSegment, EntryNotes>): string {
    const line = this.nodeLine(keyNode);
    if (!isScalar(keyNode)) {
      throw new ReadError(
        this.file,
        line,
        `has a ${isAlias(keyNode) ? 'alias' : 'list or mapping'} as a key under ${this.where(path)}; keys must be plain text`,
      );
    }
    const raw = keyNode.value;
    if (
      raw === null ||
      (typeof raw !== 'string' && typeof raw !== 'number' && typeof raw !== 'boolean')
    ) {
      throw new ReadError(
        this.file,
        line,
        `has an empty or non-text key under ${this.where(path)}; keys must be plain text`,
      );
    }
    const key = String(raw);
    if (FORBIDDEN_KEYS.includes(key)) {
      throw new ReadError(
        this.file,
        line,
        `key ${quoteText(key)} under ${this.where(path)} is refused: tools that merge parsed objects would treat it as a prototype change; rename or remove it`,
        dottedKey([...path, key]),
      );
    }
    // Keys that differ only in type (1 and "1") are distinct to YAML but collide as object keys.
    if (seen.has(key)) {
      throw new ReadError(
        this.file,
        line,
        `duplicate key ${quoteText(key)} under ${this.where(path)}; each key may appear once in a mapping`,
        dottedKey([...path, key]),
      );
    }
    return key;
  }

  private scalar(
    node: { value: unknown; type?: string; range?: [number, number, number] | null },
    path: PathSegment[],
  ): SourceValue {
    const v = node.value;
    if (
      this.json &&
      node.type === 'PLAIN' &&
      (v === 'NaN' || v === 'Infinity' || v === '-Infinity')
    )
      return Number(v);
    if (v === null || typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean')
      return v;
    throw new ReadError(
      this.file,
      this.nodeLine(node),
      `${this.where(path)} holds a value of an unsupported kind; expected text, a number, a boolean or empty`,
    );
  }

  private expand(
    alias: {
      source: string;
      resolve(doc: Document): unknown;
      range?: [number, number, number] | null;
    },
    path: PathSegment[],
    level: number,
  ): SourceValue {
    const line = this.nodeLine(alias);
    if (++this.aliases > MAX_ALIASES) {
      throw new ReadError(
        this.file,
        line,
        `expands more than ${MAX_ALIASES} aliases; a model file needs few, and many suggest an expansion attack`,
      );
    }
    const target = alias.resolve(this.doc) as YamlNode | undefined;
    if (!target)
      throw new ReadError(
        this.file,
        line,
        `alias *${truncate(alias.source)} has no anchor &${truncate(alias.source)} before it`,
      );
    if (this.expanding.has(target)) {
      throw new ReadError(
        this.file,
        line,
        `alias *${truncate(alias.source)} refers to a value that contains it`,
      );
    }
    this.expanding.add(target);
    this.insideAlias++;
    try {
      return this.build(target, path, level);
    } finally {
      this.insideAlias--;
      this.expanding.delete(target);
    }
  }

  private where(path: PathSegment[]): string {
    return path.length === 0 ? 'the top level' : dottedKey(path);
  }

  private nodeLine(node: unknown): number {
    const range = (node as { range?: [number, number, number] | null } | null)?.range;
    return this.lineAt(range?.[0] ?? 0);
  }
}

function firstInvalidUtf8(bytes: Uint8Array): number {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  // Binary search on prefixes would split characters; walk the encoding instead.
  let i = 0;
  while (i < bytes.length) {
    const b = elementAt(bytes, i);
    const size =
      b < 0x80
        ? 1
        : b >= 0xc2 && b < 0xe0
          ? 2
          : b >= 0xe0 && b < 0xf0
            ? 3
            : b >= 0xf0 && b < 0xf5
              ? 4
              : 0;
    if (size === 0) return i;
    try {
      decoder.decode(bytes.subarray(i, i + size));
    } catch {
      return i;
    }
    i += size;
  }
  return i;
}

function lineAtByte(bytes: Uint8Array, at: number): number {
  let line = 1;
  for (let i = 0; i < at && i < bytes.length; i++) if (bytes[i] === 0x0a) line++;
  return line;
}
