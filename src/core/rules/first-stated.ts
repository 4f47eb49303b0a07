import type { LocationMap } from '../model.js';

/** Where a finding about `paths` points: the first of them the file states, nulls when none is. */
export function firstStated(
  locations: LocationMap,
  paths: readonly string[] = [],
): { key: string | null; line: number | null } {
  for (const path of paths) {
    const found = locations[path];
    if (found) return { key: found.key, line: found.line };
  }
  return { key: null, line: null };
}
