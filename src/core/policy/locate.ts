/**
 * Line lookup inside a parsed YAML document: from a key path (as the schema validator reports
 * it) to the node and its 1-based line.
 */
import { isAlias, isMap, isScalar, isSeq } from 'yaml';
import type { Document, LineCounter, Node } from 'yaml';

export type KeyPath = readonly (string | number)[];

export interface Located {
  /** The value at the path, null when the path does not exist. */
  value: Node | null;
  /** The mapping key naming the last segment, when the last step was into a mapping. */
  key: Node | null;
  /** The deepest node that exists along the path (the document root at worst). */
  nearest: Node | null;
}

function keyText(key: unknown): string | null {
  return isScalar(key) ? String(key.value) : null;
}

export function nodeAt(doc: Document, path: KeyPath): Located {
  let node = doc.contents ?? null;
  let key: Node | null = null;
  let nearest: Node | null = node;
  for (const segment of path) {
    // Aliases stand for their anchor; the guard on alias count already ran in toJS.
    if (node && isAlias(node)) node = node.resolve(doc) ?? null;
    if (node && isMap(node)) {
      const pair = node.items.find((item) => keyText(item.key) === String(segment));
      if (!pair) return { value: null, key: null, nearest };
      key = (pair.key ?? null) as Node | null;
      node = (pair.value ?? null) as Node | null;
      nearest = node ?? key;
    } else if (node && isSeq(node)) {
      const item = node.items[Number(segment)];
      if (item === undefined) return { value: null, key: null, nearest };
      key = null;
      node = (item ?? null) as Node | null;
      nearest = node ?? nearest;
    } else {
      return { value: null, key: null, nearest };
    }
  }
  return { value: node, key, nearest };
}

/** 1-based line where a node starts, null for a node without a place in the source. */
export function lineOf(lineCounter: LineCounter, node: Node | null | undefined): number | null {
  const offset = node?.range?.[0];
  return typeof offset === 'number' ? lineCounter.linePos(offset).line : null;
}

/** Key path written the way users read it: `overrides[0].limits.headroom`. */
export function formatKeyPath(path: KeyPath): string {
  let text = '';
  for (const segment of path) {
    if (typeof segment === 'number') text += `[${segment}]`;
    else text += text === '' ? segment : `.${segment}`;
  }
  return text;
}
