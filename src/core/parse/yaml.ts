/**
 * The project's one YAML pipeline (YAML 1.2, core schema, strict, through the `yaml` package's
 * lexer, parser and composer), with the bounds every reader of untrusted YAML shares: lexical
 * tokens counted before anything is parsed, a second document stopped at its start, nesting and
 * entries measured on the syntax tree before anything is composed, and one alias cap. Model
 * files (`source.ts`) and the policy (`policy/parse.ts`) both read YAML through it.
 */
import { Composer, Lexer, LineCounter, Parser } from 'yaml';
import type { CST, Document } from 'yaml';

/** Deepest nesting of mappings and lists accepted; the top-level mapping is level 1 (default: `256`). */
export const MAX_NESTING = 256;
/** Alias expansions accepted per file, counting aliases met inside expanded content (default: `100`). */
export const MAX_ALIASES = 100;
/**
 * Values that alias expansion may add to a file (default: `20000`): each costs as much to build
 * as a value written out, and 100 aliases of a 990-entry mapping (99,000 values from a 10 KB
 * file) took 0.7–0.9 s of CPU under a load of 13 when the bound was 100,000.
 */
export const MAX_ALIAS_VALUES = 20_000;
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

/**
 * Depth of flow brackets at which the lexer pass refuses a text without parsing it (default:
 * `4 × MAX_NESTING`); below it, the syntax tree decides, counting block levels as well.
 */
export const FLOW_DEPTH_CUTOFF = 4 * MAX_NESTING;

/** The lexer's zero-width markers (the `yaml` package's CST: DOCUMENT, SCALAR, FLOW_END). */
const DOCUMENT_MARK = '\x02';
const SCALAR_MARK = '\x1f';
const FLOW_END_MARK = '\x18';

/** 1-based line of `offset` in `text`: line feeds before it, plus one. */
function lineOfOffset(text: string, offset: number): number {
  let line = 1;
  for (let i = text.indexOf('\n'); i !== -1 && i < offset; i = text.indexOf('\n', i + 1)) line++;
  return line;
}

/** Which bound a YAML text crossed. */
export type YamlLimit = 'tokens' | 'documents' | 'nesting' | 'entries';

/** A YAML text crossed one of the pipeline's bounds; nothing was composed. */
export class YamlLimitError extends Error {
  override readonly name = 'YamlLimitError';
  constructor(
    readonly limit: YamlLimit,
    /** 1-based line where the bound was crossed (null: the whole text). */
    readonly line: number | null,
  ) {
    super(`YAML text past its ${limit} bound`);
  }
}

/** Lexical tokens of `text` as the pipeline counts them, stopping once past `MAX_TOKENS`. */
export function countYamlTokens(text: string): number {
  let n = 0;
  for (const lexeme of new Lexer().lex(text)) {
    void lexeme;
    if (++n > MAX_TOKENS) break;
  }
  return n;
}

/** A composed YAML document and the line lookup of its text. */
export interface ComposedYaml {
  /** The first (and only) document; its `errors` and `warnings` hold what the composer found. */
  doc: Document.Parsed;
  lineCounter: LineCounter;
  /** 1-based line of an offset in the text. */
  lineAt(offset: number): number;
}

/**
 * Composes the YAML document in `text`. Throws `YamlLimitError` before composing anything when
 * the text holds more than `MAX_TOKENS` lexical tokens, a second document, nesting deeper than
 * `MAX_NESTING` or more than `MAX_ENTRIES` entries; syntax errors are left in `doc.errors`.
 * `maxTokens`: a lower bound on tokens than `MAX_TOKENS`, for readers that allow less.
 * `uniqueKeys`: whether the composer itself refuses duplicate keys (it compares every key of a
 * mapping with every other, so readers of large files check them in one pass instead).
 */
export function composeYaml(
  text: string,
  options: { uniqueKeys: boolean; maxTokens?: number },
): ComposedYaml {
  const maxTokens = options.maxTokens ?? MAX_TOKENS;
  // One pass of the lexer alone, stopped at MAX_TOKENS, bounds what the parser builds; its
  // lexemes are then handed to the parser, so the text is lexed once.
  // Flow collections are counted too: a chain of brackets far deeper than MAX_NESTING costs the
  // parser seconds (190,000 levels in 380 KB took 2.7 s), so it is refused here, at the line of
  // the first bracket past MAX_NESTING, before the parser builds it.
  const lexemes: string[] = [];
  let flowDepth = 0;
  let offset = 0;
  let tooDeepAt = -1;
  for (const lexeme of new Lexer().lex(text)) {
    if (lexemes.length >= maxTokens) throw new YamlLimitError('tokens', null);
    lexemes.push(lexeme);
    if (lexeme === '{' || lexeme === '[') {
      flowDepth++;
      if (flowDepth > MAX_NESTING && tooDeepAt < 0) tooDeepAt = offset;
      if (flowDepth > FLOW_DEPTH_CUTOFF)
        throw new YamlLimitError('nesting', lineOfOffset(text, tooDeepAt));
    } else if ((lexeme === '}' || lexeme === ']') && flowDepth > 0) flowDepth--;
    // The lexer's markers of a document, a scalar and a cut flow take no room in the text.
    if (lexeme !== DOCUMENT_MARK && lexeme !== SCALAR_MARK && lexeme !== FLOW_END_MARK)
      offset += lexeme.length;
  }

  const lineCounter = new LineCounter();
  const lineAt = (offset: number): number => lineCounter.linePos(offset).line;
  // Tokens are taken one top-level item at a time, and a second document stops the reading: a
  // million empty documents cost one, not a million composed documents.
  const tokens: CST.Token[] = [];
  let documents = 0;
  const parser = new Parser(lineCounter.addNewLine);
  lineCounter.addNewLine(0);
  const take = (produced: Generator<CST.Token, void>): void => {
    for (const token of produced) {
      if (token.type === 'document' && ++documents > 1) {
        throw new YamlLimitError('documents', lineAt(token.offset));
      }
      tokens.push(token);
    }
  };
  for (const lexeme of lexemes) take(parser.next(lexeme));
  take(parser.end());
  lexemes.length = 0;

  // The composer recurses once per level; refusing deep input before it runs keeps the stack safe.
  const crossed = measureTree(tokens);
  if (crossed !== null) throw new YamlLimitError(crossed.limit, lineAt(crossed.offset));

  const composer = new Composer({
    version: '1.2',
    schema: 'core',
    uniqueKeys: options.uniqueKeys,
    strict: true,
    prettyErrors: false,
  });
  const docs = Array.from(composer.compose(tokens, true, text.length));
  return { doc: docs[0]!, lineCounter, lineAt };
}

/**
 * The first collection nested deeper than `MAX_NESTING` or the one whose entries bring the count
 * past `MAX_ENTRIES`, or null; walks the syntax tree without recursion.
 */
function measureTree(
  tokens: readonly CST.Token[],
): { limit: 'nesting' | 'entries'; offset: number } | null {
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
    if (level > MAX_NESTING) return { limit: 'nesting', offset: token.offset };
    entries += token.items.length;
    if (entries > MAX_ENTRIES) return { limit: 'entries', offset: token.offset };
    for (const item of token.items as CST.CollectionItem[]) {
      if (item.key) stack.push([item.key, level]);
      if (item.value) stack.push([item.value, level]);
    }
  }
  return null;
}
