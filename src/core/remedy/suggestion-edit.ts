/**
 * A remedy as a replacement of whole lines of the model file, for a review suggestion: the lines
 * it replaces and the text that replaces them, valid for the file (JSON stays JSON, YAML stays
 * YAML). Every edit is checked by reading the edited file again: the model it describes must
 * carry exactly the remedy's values, or no edit is offered.
 */
import { readModel } from '../parse/read-model.js';
import { changeEntries, currentValue } from './apply-change.js';
import { jsonValue, yamlValue, type FilePatch } from './file-patch.js';
import type { Change } from '../report/types.js';

/** Lines `startLine`..`endLine` (1-based, inclusive) of the file at head, replaced by `replacement`. */
export interface LineEdit {
  startLine: number;
  endLine: number;
  /** The new lines, joined by the file's line ending, without a final one. */
  replacement: string;
}

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** A JSON scalar (string, number, literal) after `"key":` on one line. */
const JSON_SCALAR = String.raw`("(?:[^"\\]|\\.)*"|[-+]?[0-9][0-9.eE+-]*|true|false|null)`;

function setOnLine(
  line: string,
  key: string,
  value: string,
  format: 'json' | 'yaml',
): string | null {
  if (format === 'json') {
    const pattern = new RegExp(`("${escapeRegExp(key)}"\\s*:\\s*)${JSON_SCALAR}`);
    return pattern.test(line)
      ? line.replace(pattern, (_, lead: string) => `${lead}${value}`)
      : null;
  }
  const pattern = new RegExp(
    `^(\\s*(?:-\\s+)?${escapeRegExp(key)}\\s*:\\s*)([^#\\s][^#]*?)(\\s*(?:#.*)?)$`,
  );
  return pattern.test(line)
    ? line.replace(
        pattern,
        (_, lead: string, _old: string, tail: string) => `${lead}${value}${tail}`,
      )
    : null;
}

/** New keys of a JSON patch as one line after `anchor` (a `"key": scalar` line), fixing the commas. */
function insertAfter(anchor: string, patch: FilePatch): [string, string] | null {
  const fresh = patch.edits.filter((e) => e.line === null);
  const blocks = new Set(fresh.map((e) => e.key.split('.').slice(0, -1).join('.')));
  if (blocks.size !== 1) return null;
  const match = /^(\s*)"[^"]*"\s*:\s*[^{[]*?(,?)\s*$/.exec(anchor);
  if (!match) return null;
  const [, indent, comma] = match as unknown as [string, string, string];
  const [block] = [...blocks] as [string];
  const ordered = [...fresh].sort((a, b) =>
    a.field === 'position.scaling.kind' ? -1 : b.field === 'position.scaling.kind' ? 1 : 0,
  );
  const body = ordered.map((e) => `"${e.key.split('.').pop()}": ${jsonValue(e.field, e.value)}`);
  const text = block === '' ? body.join(`, `) : `"${block.split('.').pop()}": {${body.join(', ')}}`;
  if (block.includes('.')) return null;
  const head = comma === ',' ? anchor : `${anchor.replace(/\s*$/, '')},`;
  return [head, `${indent}${text}${comma}`];
}

/**
 * The line edit that applies `patch` (the model-file part of `change`) to `text`, anchored at
 * `anchorLine` for keys the file does not have yet; null when the edit cannot be made on whole
 * lines or the edited file does not read back with the remedy's values.
 */
export function lineEdit(
  text: string,
  path: string,
  patch: FilePatch,
  change: Change,
  anchorLine: number | null,
): LineEdit | null {
  if (patch.target !== 'model') return null;
  const eol = text.includes('\r\n') ? '\r\n' : '\n';
  const lines = text.split(eol);
  const edited = [...lines];
  const touched = new Set<number>();
  for (const edit of patch.edits.filter((e) => e.line !== null)) {
    const index = (edit.line as number) - 1;
    const key = edit.key.split('.').pop() as string;
    const value =
      patch.format === 'json' ? jsonValue(edit.field, edit.value) : yamlValue(edit.value);
    const next =
      edited[index] === undefined ? null : setOnLine(edited[index], key, value, patch.format);
    if (next === null) return null;
    edited[index] = next;
    touched.add(index);
  }
  let inserted: string | null = null;
  if (patch.edits.some((e) => e.line === null)) {
    if (patch.format !== 'json' || anchorLine === null || edited[anchorLine - 1] === undefined)
      return null;
    const pair = insertAfter(edited[anchorLine - 1]!, patch);
    if (pair === null) return null;
    edited[anchorLine - 1] = pair[0];
    inserted = pair[1];
    touched.add(anchorLine - 1);
  }
  if (touched.size === 0) return null;
  const first = Math.min(...touched);
  const last = Math.max(...touched);
  // A suggestion replaces one range: a short one, so a reviewer sees every line it changes.
  if (last - first > 5) return null;
  const replacement = edited.slice(first, last + 1);
  if (inserted !== null) replacement.splice(anchorLine! - first, 0, inserted);
  const result = [...lines.slice(0, first), ...replacement, ...lines.slice(last + 1)].join(eol);
  try {
    const spec = readModel(result, path).spec;
    for (const [field, value] of changeEntries(change)) {
      if (!patch.edits.some((e) => e.field === field)) continue;
      if (currentValue(spec, field) !== value) return null;
    }
  } catch {
    return null;
  }
  return { startLine: first + 1, endLine: last + 1, replacement: replacement.join(eol) };
}
