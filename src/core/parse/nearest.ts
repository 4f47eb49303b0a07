import { elementAt } from '../element-at.js';

/**
 * Edit distance between two names: insertions, deletions, substitutions and swaps of two
 * neighbouring characters each cost 1 (optimal string alignment distance, Damerau 1964),
 * compared case-insensitively so `HeadRoom` is 0 from `headroom`.
 */
export function editDistance(a: string, b: string): number {
  const s = a.toLowerCase();
  const t = b.toLowerCase();
  // Three rolling rows: the swap step looks two rows back.
  let before = new Array<number>(t.length + 1).fill(0);
  let previous = Array.from({ length: t.length + 1 }, (_, j) => j);
  for (let i = 1; i <= s.length; i += 1) {
    const row = new Array<number>(t.length + 1);
    row[0] = i;
    for (let j = 1; j <= t.length; j += 1) {
      const cost = s[i - 1] === t[j - 1] ? 0 : 1;
      let best = Math.min(
        elementAt(previous, j) + 1,
        elementAt(row, j - 1) + 1,
        elementAt(previous, j - 1) + cost,
      );
      if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1])
        best = Math.min(best, elementAt(before, j - 2) + 1);
      row[j] = best;
    }
    before = previous;
    previous = row;
  }
  return elementAt(previous, t.length);
}

/**
 * The candidate a mistyped `name` most likely meant, or null when none is plausibly meant: the
 * closest within max(2, length / 3) edits (first of equals, in the candidates' order), else a
 * candidate that is a prefix of the name or has it as a prefix (`minimum` → `min`).
 */
export function nearestName(name: string, candidates: readonly string[]): string | null {
  // Names longer than any candidate by far are noise, not typos; cap the work they cost.
  const probe = name.slice(0, 200);
  const allowed = Math.max(2, Math.floor(probe.length / 3));
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const distance = editDistance(probe, candidate);
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  if (best !== null && bestDistance <= allowed) return best;
  const lower = probe.toLowerCase();
  return (
    candidates.find((candidate) => {
      const other = candidate.toLowerCase();
      return (
        Math.min(other.length, lower.length) >= 3 &&
        (lower.startsWith(other) || other.startsWith(lower))
      );
    }) ?? null
  );
}
