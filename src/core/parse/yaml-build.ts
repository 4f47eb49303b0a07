/**
 * Plain values from a composed YAML document (`yaml.ts`): mappings without a prototype, each
 * entry's place noted beside its container (`source-document.ts`), keys refused in one pass
 * (forbidden names, duplicates by one set lookup each), aliases expanded within `MAX_ALIASES`
 * expansions and `MAX_ALIAS_VALUES` values, nesting within `MAX_NESTING` once expanded.
 */
import { isAlias, isMap, isScalar, isSeq } from 'yaml';
import type { Document, Node as YamlNode } from 'yaml';
import { ReadError } from './errors.js';
import { truncate } from './quote.js';
import type { PathSegment } from './quote.js';
import {
  EntryNotes,
  checkKey,
  pathOf,
  whereOf,
  type PathLink,
  type SourceMapping,
  type SourceValue,
} from './source-document.js';
import {
  MAX_ALIASES,
  MAX_ALIAS_VALUES,
  MAX_ENTRIES,
  MAX_NESTING,
  MAX_TOKENS,
  type YamlLimitError,
} from './yaml.js';
import { nullRecord } from '../null-record.js';

type Ranged = { range?: [number, number, number] | null } | null | undefined;

/** Builds plain values from the composed document, noting each entry's place beside its container. */
export class YamlBuilder {
  readonly notes = new EntryNotes();
  private aliases = 0;
  private aliasValues = 0;
  private readonly expanding = new Set<YamlNode>();
  private insideAlias = 0;

  constructor(
    private readonly doc: Document.Parsed,
    private readonly file: string,
    private readonly lineAt: (offset: number) => number,
    /** Whether the text is JSON: bare NaN, Infinity and -Infinity read as numbers. */
    private readonly json: boolean,
  ) {}

  build(node: unknown, path: PathLink, level: number): SourceValue {
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
      const out: SourceMapping = nullRecord();
      const notes = this.notes.open(out);
      for (const pair of node.items) {
        const key = this.key(pair.key, path, notes);
        const [start, end] = this.literalRange(pair.value);
        notes.set(key, { at: offsetOf(pair.key as Ranged), start, end });
        out[key] =
          pair.value === null || pair.value === undefined
            ? null
            : this.build(pair.value, { parent: path, segment: key }, level + 1);
      }
      return out;
    }
    if (isSeq(node)) {
      const out: SourceValue[] = [];
      const notes = this.notes.open(out);
      node.items.forEach((item, i) => {
        const [start, end] = this.literalRange(item);
        notes.set(i, { at: offsetOf(item as Ranged), start, end });
        out.push(
          item === null || item === undefined
            ? null
            : this.build(item, { parent: path, segment: i }, level + 1),
        );
      });
      return out;
    }
    throw new ReadError(this.file, this.nodeLine(node), 'holds a value of an unsupported kind');
  }

  /** A scalar's source range (quotes included); [-1, -1] for collections, aliases and empty values. */
  private literalRange(node: unknown): [number, number] {
    if (!isScalar(node) || !node.range) return [-1, -1];
    return [node.range[0], node.range[1]];
  }

  private key(keyNode: unknown, path: PathLink, seen: Map<PathSegment, unknown>): string {
    if (!isScalar(keyNode)) {
      throw new ReadError(
        this.file,
        this.nodeLine(keyNode),
        `has a ${isAlias(keyNode) ? 'alias' : 'list or mapping'} as a key under ${whereOf(pathOf(path))}; keys must be plain text`,
      );
    }
    const raw = keyNode.value;
    if (
      raw === null ||
      (typeof raw !== 'string' && typeof raw !== 'number' && typeof raw !== 'boolean')
    ) {
      throw new ReadError(
        this.file,
        this.nodeLine(keyNode),
        `has an empty or non-text key under ${whereOf(pathOf(path))}; keys must be plain text`,
      );
    }
    const key = String(raw);
    checkKey(this.file, key, path, seen, () => this.nodeLine(keyNode));
    return key;
  }

  private scalar(
    node: { value: unknown; type?: string; range?: [number, number, number] | null },
    path: PathLink,
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
      `${whereOf(pathOf(path))} holds a value of an unsupported kind; expected text, a number, a boolean or empty`,
    );
  }

  private expand(
    alias: {
      source: string;
      resolve(doc: Document): unknown;
      range?: [number, number, number] | null;
    },
    path: PathLink,
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

  private nodeLine(node: unknown): number {
    return this.lineAt(offsetOf(node as Ranged));
  }
}

function offsetOf(node: Ranged): number {
  return node?.range?.[0] ?? 0;
}

/** The message of a crossed bound of the YAML pipeline, for a model file, at its line. */
export function yamlLimitError(error: YamlLimitError, file: string): ReadError {
  const line = error.line;
  switch (error.limit) {
    case 'tokens':
      return new ReadError(
        file,
        null,
        `holds more than ${MAX_TOKENS} syntax tokens (keys, values and punctuation); a model file holds a few thousand, label maps a few hundred thousand at most`,
      );
    case 'documents':
      return new ReadError(file, line, 'holds more than one YAML document; a model file holds one');
    case 'nesting':
      return new ReadError(
        file,
        line,
        `nesting is deeper than ${MAX_NESTING} levels of mappings and lists; a model file needs a handful`,
      );
    case 'entries':
      return new ReadError(
        file,
        line,
        `holds more than ${MAX_ENTRIES} keys and list items; a model file holds a few hundred (label maps a few ten thousand)`,
      );
  }
}
