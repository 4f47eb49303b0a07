/**
 * Moves that git does not see as renames. A model config moved to another folder and rewritten
 * (minified, keys reordered, a dialect switched) shares too little text with its old self for
 * git's similarity score, so it shows as a deleted file plus an added one, and an added file is
 * judged alone: every base-against-head rule would drop out. Deleted and added model configs are
 * paired here by what they describe (the normalised model description, not the text) and judged
 * as one change.
 */
import type { ModelSpec } from './model.js';

/** One side of a possible move: a repository path and the model its version there describes. */
export interface MoveCandidate {
  path: string;
  spec: ModelSpec;
}

/** A deleted config and the added config it became. */
export interface Move {
  from: string;
  to: string;
}

/**
 * The architecture a move keeps (model name, depth, widths, heads, vocabulary, experts, encoder):
 * what a config changed in place under review keeps too, while spans, positions, precisions and
 * serving may change and are what the base-against-head rules judge.
 */
function fingerprint(spec: ModelSpec): string {
  return JSON.stringify([
    spec.name,
    spec.layers,
    spec.hidden,
    spec.heads,
    spec.kvHeads,
    spec.headDim,
    spec.ffn,
    spec.gated,
    spec.vocab,
    spec.tied,
    spec.bias,
    spec.experts,
    spec.encoder,
  ]);
}

/** Top-level fields of the description two versions share: the closest pair in a bucket goes first. */
function likeness(a: ModelSpec, b: ModelSpec): number {
  let same = 0;
  for (const key of Object.keys(a) as (keyof ModelSpec)[])
    if (JSON.stringify(a[key]) === JSON.stringify(b[key])) same += 1;
  return same;
}

/** Pairs scored in one bucket at most; past that, a bucket pairs in path order (bounded work). */
const MAX_SCORED_PAIRS = 10_000;

/**
 * Pairs each added config with a deleted one of the same architecture, at most one each: the
 * most alike first, ties by path. Configs without a partner stay as they are.
 */
export function pairMoves(
  deleted: readonly MoveCandidate[],
  added: readonly MoveCandidate[],
): Move[] {
  const buckets = new Map<string, { gone: MoveCandidate[]; new: MoveCandidate[] }>();
  for (const [list, side] of [
    [deleted, 'gone'],
    [added, 'new'],
  ] as const) {
    for (const candidate of list) {
      const key = fingerprint(candidate.spec);
      let bucket = buckets.get(key);
      if (!bucket) buckets.set(key, (bucket = { gone: [], new: [] }));
      bucket[side].push(candidate);
    }
  }
  const moves: Move[] = [];
  for (const bucket of buckets.values()) {
    if (bucket.gone.length === 0 || bucket.new.length === 0) continue;
    const byPath = (a: MoveCandidate, b: MoveCandidate) =>
      a.path < b.path ? -1 : a.path > b.path ? 1 : 0;
    bucket.gone.sort(byPath);
    bucket.new.sort(byPath);
    if (bucket.gone.length * bucket.new.length > MAX_SCORED_PAIRS) {
      for (let i = 0; i < Math.min(bucket.gone.length, bucket.new.length); i += 1)
        moves.push({ from: bucket.gone[i]!.path, to: bucket.new[i]!.path });
      continue;
    }
    const scored = bucket.gone.flatMap((gone, g) =>
      bucket.new.map((made, n) => ({ g, n, score: likeness(gone.spec, made.spec) })),
    );
    scored.sort((a, b) => b.score - a.score || a.g - b.g || a.n - b.n);
    const usedGone = new Set<number>();
    const usedNew = new Set<number>();
    for (const { g, n } of scored) {
      if (usedGone.has(g) || usedNew.has(n)) continue;
      usedGone.add(g);
      usedNew.add(n);
      moves.push({ from: bucket.gone[g]!.path, to: bucket.new[n]!.path });
    }
  }
  return moves;
}
