/**
 * One reader for JSON and YAML text, built for untrusted text from forks: bounded size, nesting,
 * entries and alias expansion, no prototype-altering keys, no binary text. It keeps the 1-based
 * line of every key and the source text of every scalar.
 *
 * JSON files are held to JSON's grammar (`json-syntax.ts`) and read by the fast JSON reader
 * (`json-read.ts`); YAML files written as plain block YAML, the way model descriptions are, by
 * the fast block reader (`yaml-block.ts`); everything else, and what those readers leave to it,
 * goes through the one YAML pipeline (`yaml.ts`, `yaml-build.ts`). All give the same values,
 * lines, literals and refusals for the same text. Decoding and text checks: `text.ts`, `utf8.ts`.
 *
 * The YAML pipeline costs far more per byte than the fast readers (a flow mapping of 50,000
 * entries in 4 MiB took 1.5–2.6 s of CPU, a folded scalar of 4 million blank lines 6.7 s and
 * 561 MiB), so a model file the fast readers leave to it is held to a smaller budget, checked
 * before anything is built: `MAX_FULL_YAML_LENGTH` characters, `MAX_FULL_YAML_LINES` lines and
 * `MAX_FULL_YAML_TOKENS` lexical tokens (counted by the lexer alone).
 */
import { ReadError } from './errors.js';
import { readJsonSource } from './json-read.js';
import { quoteValue, truncate } from './quote.js';
import { sourceDocument, type SourceDocument, type SourceMapping } from './source-document.js';
import { BOM, checkText } from './text.js';
import { MAX_TOKENS, YamlLimitError, composeYaml, type ComposedYaml } from './yaml.js';
import { YamlBuilder, yamlLimitError } from './yaml-build.js';
import { readBlockYaml } from './yaml-block.js';
import { isMap, isScalar, isSeq } from 'yaml';
import type { YAMLError } from 'yaml';

export type { PathSegment } from './quote.js';
export {
  FORBIDDEN_KEYS,
  type SourceDocument,
  type SourceMapping,
  type SourceValue,
} from './source-document.js';
export { MAX_TEXT_LENGTH, decodeText } from './text.js';
export { jsonSyntaxErrorOffset } from './json-syntax.js';
export { MAX_ALIASES, MAX_ALIAS_VALUES, MAX_ENTRIES, MAX_NESTING, MAX_TOKENS } from './yaml.js';

/**
 * Characters of a model file the fast readers leave to the YAML pipeline (default: `1048576`,
 * 1 Mi): a double-quoted scalar of 2 million escapes in 4 MiB took 1.1 s to compose.
 */
export const MAX_FULL_YAML_LENGTH = 1024 * 1024;
/**
 * Lines of such a file (default: `100000`): the composer folds a block scalar line by line
 * (4 million blank lines: 6.7 s, 561 MiB).
 */
export const MAX_FULL_YAML_LINES = 100_000;
/**
 * Lexical tokens of such a file (default: `25000`, a sixteenth of `MAX_TOKENS`; a model file
 * holds a few hundred): lexing, parsing and composing cost 5–15 µs a token (200,000 tokens of a
 * flow mapping: 1.0–1.3 s; 48,000 of JSON with carriage returns, 0.8–1.1 s under a load of 13).
 */
export const MAX_FULL_YAML_TOKENS = 25_000;

/** Why a file is left to the YAML pipeline, for its budget's messages. */
function fullYamlForm(json: boolean): string {
  return json
    ? 'JSON the JSON reader leaves to the YAML reader (a top level that is not an object, or a carriage return without a line feed)'
    : 'YAML written outside plain block style (flow collections, anchors, tags, quoted, escaped or multi-line scalars, indented comments, tabs, or carriage returns without line feeds)';
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
  if (json) {
    const read = readJsonSource(text, file);
    if (read !== null) return read;
  } else {
    const read = readBlockYaml(text, file);
    if (read !== null) return read;
  }
  checkFullYamlBudget(text, file, json);
  return readYamlSource(text, file, json, MAX_FULL_YAML_TOKENS);
}

/**
 * Refuses a text the fast readers left to the YAML pipeline when it is longer than
 * `MAX_FULL_YAML_LENGTH` characters or has more than `MAX_FULL_YAML_LINES` lines (at the first
 * line past it); the token budget is counted by the pipeline's lexer pass.
 */
function checkFullYamlBudget(text: string, file: string, json: boolean): void {
  if (text.length > MAX_FULL_YAML_LENGTH) {
    throw new ReadError(
      file,
      null,
      `is ${text.length} characters long and is ${fullYamlForm(json)}; such a file is read up to ${MAX_FULL_YAML_LENGTH} characters; a larger file must be plain JSON or plain block YAML`,
    );
  }
  let breaks = 0;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) {
    if (++breaks >= MAX_FULL_YAML_LINES && i + 1 < text.length) {
      throw new ReadError(
        file,
        MAX_FULL_YAML_LINES + 1,
        `has more than ${MAX_FULL_YAML_LINES} lines and is ${fullYamlForm(json)}; such a file is read up to ${MAX_FULL_YAML_LINES} lines; a larger file must be plain JSON or plain block YAML`,
      );
    }
  }
}

/**
 * The YAML path alone: the bounded pipeline, then plain values built from the composed document
 * (`json`: bare NaN, Infinity and -Infinity read as numbers, as JSON files give them; `maxTokens`:
 * the lexical tokens allowed, `MAX_TOKENS` unless the caller allows fewer). `text`
 * has passed `checkText` (and `checkJson` for JSON). `parseSource` takes it for YAML files and for
 * JSON the fast reader leaves to it; the tests hold the two readers to the same results.
 */
export function readYamlSource(
  text: string,
  file: string,
  json: boolean,
  maxTokens: number = MAX_TOKENS,
): SourceDocument {
  let composed: ComposedYaml;
  try {
    composed = composeYaml(text, {
      // Duplicate keys are found by the builder, one set lookup per key: the composer's own check
      // compares every key with every other (60,000 keys took 20–33 s).
      uniqueKeys: false,
      maxTokens,
    });
  } catch (error) {
    if (error instanceof YamlLimitError && error.limit === 'tokens' && maxTokens < MAX_TOKENS) {
      throw new ReadError(
        file,
        null,
        `holds more than ${maxTokens} syntax tokens (keys, values and punctuation) and is ${fullYamlForm(json)}; such a file is read up to ${maxTokens} tokens; a larger file must be plain JSON or plain block YAML`,
      );
    }
    if (error instanceof YamlLimitError) throw yamlLimitError(error, file);
    throw error;
  }
  const doc = composed.doc;
  const lineAt = (offset: number): number => composed.lineAt(offset);
  const problem = doc.errors[0] ?? doc.warnings[0];
  if (problem) throw syntaxError(problem, text, file, lineAt);
  const root = doc.contents ?? null;
  if (root === null || (isScalar(root) && root.value === null)) {
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
  const builder = new YamlBuilder(doc, file, lineAt, json);
  const value = builder.build(root, null, 1) as SourceMapping;
  return sourceDocument(value, text, builder.notes, lineAt);
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
    const key = written ? truncate(written[1]!.trim()) : 'here';
    return new ReadError(file, line, `duplicate key ${key}; each key may appear once in a mapping`);
  }
  const reason = problem.message.split('\n')[0]!.replace(/ at line \d+, column \d+:?$/, '');
  // JSON readers meet YAML's wording for JSON's commonest slip; say what it usually means.
  const jsonHint =
    text.trimStart().startsWith('{') && problem.code !== 'BAD_DQ_ESCAPE'
      ? ' (in JSON: a missing comma or colon at or just before this line?)'
      : '';
  return new ReadError(file, line, `is not valid JSON or YAML: ${reason}${jsonHint}`);
}
