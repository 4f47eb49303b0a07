/**
 * JSON Pointer (RFC 6901) over parsed documents, to pick a model block inside a larger file
 * (`--at /model`). Both the string form (`/a/b`) and the URI-fragment form (`#/a/b`, section 6)
 * are read.
 */
import { quoteText } from './quote.js';
import type { PathSegment } from './quote.js';

/** A pointer that is malformed or does not lead anywhere in the document. */
export class PointerError extends Error {
  override readonly name = 'PointerError';
  /** The pointer as given. */
  readonly pointer: string;
  /** The longest prefix that did resolve, as a pointer (`""` for the whole document). */
  readonly resolved: string;
  /** Segments of the longest prefix that did resolve, as document path segments. */
  readonly resolvedPath: PathSegment[];
  /** The problem, without the pointer. */
  readonly reason: string;

  constructor(pointer: string, resolvedPath: PathSegment[], reason: string) {
    const resolved = formatPointer(resolvedPath.map(String));
    super(`pointer ${JSON.stringify(pointer)} ${reason}`);
    this.pointer = pointer;
    this.resolved = resolved;
    this.resolvedPath = resolvedPath;
    this.reason = reason;
  }
}

/**
 * The reference tokens of `pointer`, unescaped (`~1` → `/`, then `~0` → `~`, RFC 6901 section 4).
 * `""` (or `"#"`) is the whole document. Throws `PointerError` on a malformed pointer.
 */
export function parsePointer(pointer: string): string[] {
  let text = pointer;
  if (text.startsWith('#')) {
    try {
      text = decodeURIComponent(text.slice(1));
    } catch {
      throw new PointerError(pointer, [], 'is not a valid URI fragment: a % escape is malformed');
    }
  }
  if (text === '') return [];
  if (!text.startsWith('/')) {
    throw new PointerError(pointer, [], `must start with "/" (for example "/${text}")`);
  }
  return text
    .slice(1)
    .split('/')
    .map((token) => {
      if (/~(?![01])/.test(token)) {
        throw new PointerError(
          pointer,
          [],
          `has "~" not followed by 0 or 1 in ${JSON.stringify(token)}; write "~0" for "~" and "~1" for "/"`,
        );
      }
      return token.replace(/~1/g, '/').replace(/~0/g, '~');
    });
}

/** The string form of a pointer to `tokens` (RFC 6901 section 5). */
export function formatPointer(tokens: readonly string[]): string {
  return tokens.map((t) => `/${t.replace(/~/g, '~0').replace(/\//g, '~1')}`).join('');
}

/**
 * The value `pointer` refers to inside `root`, with the document path that leads to it
 * (list indexes as numbers). Only own keys are followed. Throws `PointerError` saying where the
 * walk stopped and why.
 */
export function resolvePointer(
  root: unknown,
  pointer: string,
): { value: unknown; path: PathSegment[] } {
  const tokens = parsePointer(pointer);
  let current: unknown = root;
  const path: PathSegment[] = [];
  for (const token of tokens) {
    if (Array.isArray(current)) {
      if (token === '-')
        throw new PointerError(
          pointer,
          path,
          `stops at ${where(path)}: "-" names the position after the last item, which holds no value`,
        );
      if (!/^(0|[1-9][0-9]*)$/.test(token)) {
        throw new PointerError(
          pointer,
          path,
          `stops at ${where(path)}: that is a list, and ${JSON.stringify(token)} is not an index (0, 1, 2, … without leading zeros)`,
        );
      }
      const index = Number(token);
      if (index >= current.length) {
        throw new PointerError(
          pointer,
          path,
          `stops at ${where(path)}: index ${index} is past the end of a list of ${current.length}`,
        );
      }
      current = current[index];
      path.push(index);
    } else if (current !== null && typeof current === 'object') {
      if (!Object.prototype.hasOwnProperty.call(current, token)) {
        const keys = Object.keys(current);
        const some = keys
          .slice(0, 8)
          .map((k) => quoteText(k))
          .join(', ');
        throw new PointerError(
          pointer,
          path,
          `stops at ${where(path)}: no key ${JSON.stringify(token)} there${keys.length ? ` (keys: ${some}${keys.length > 8 ? ', …' : ''})` : ' (the mapping is empty)'}`,
        );
      }
      current = (current as Record<string, unknown>)[token];
      path.push(token);
    } else {
      throw new PointerError(
        pointer,
        path,
        `stops at ${where(path)}: that is ${current === null ? 'empty' : `a ${typeof current}`}, not a mapping or a list`,
      );
    }
  }
  return { value: current, path };
}

function where(path: readonly PathSegment[]): string {
  return path.length === 0 ? 'the top level' : JSON.stringify(formatPointer(path.map(String)));
}
