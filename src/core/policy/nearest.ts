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
      let best = Math.min(previous[j] + 1, row[j - 1] + 1, previous[j - 1] + cost);
      if (i > 1 && j > 1 && s[i - 1] === t[j - 2] && s[i - 2] === t[j - 1]) best = Math.min(best, before[j - 2] + 1);
      row[j] = best;
    }
    before = previous;
    previous = row;
  }
  return previous[t.length];
}

/** The candidate closest to `name` (the first of equals, in the candidates' order), or null if none. */
export function nearestName(name: string, candidates: readonly string[]): string | null {
  let best: string | null = null;
  let bestDistance = Infinity;
  // Names longer than any candidate by far are noise, not typos; cap the work they cost.
  const probe = name.slice(0, 200);
  for (const candidate of candidates) {
    const distance = editDistance(probe, candidate);
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best;
}
