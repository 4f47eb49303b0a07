/**
 * The gate's content source over the GitHub API, for a checkout without the history: every
 * version of every changed file in as few requests as the API allows, instead of one contents
 * request per version.
 *
 * 1. What is at each path: for a commit with many paths to read, its recursive tree (one REST
 *    request, `GET /repos/{owner}/{repo}/git/trees/{sha}?recursive=1`, mode, object id and size of
 *    every path); for a few paths, or a tree GitHub cut short, GraphQL `file(path:)` fields of the
 *    commit, `FIELDS_PER_QUERY` a query.
 * 2. The texts of the regular files by object id, GraphQL `object(oid:)` fields on `Blob`,
 *    `FIELDS_PER_QUERY` and `TEXT_BYTES_PER_QUERY` a query, each object read once however many
 *    paths share it.
 *
 * Nothing from a pull request is written into a query's text: paths, commits and object ids are
 * variables, and aliases are generated (`c0`, `f0`, `b0`, …).
 *
 * Fail closed: a path is absent only when the API says so (a complete tree without it, or a
 * `file` field that is null for a commit that exists); a commit the API does not find is an error.
 * A text is taken only when it is exactly the blob: its UTF-8 bytes must hash to the object id
 * (git's object format: SHA-1, or SHA-256 for 64-digit ids, over `blob <size>\0<bytes>`), so a
 * text GitHub decoded, cut short or refused as binary, a field that failed, and anything over
 * `MAX_CONFIG_BYTES` is read through the REST contents API (`getFileContent`), whose failures stay
 * errors and which refuses a large file from its size. When GraphQL fails as a whole, every file
 * left is read that way.
 */
import { createHash } from 'node:crypto';
import type { ContentRequest, ContentSource } from '../core/gate.js';
import { MAX_CONFIG_BYTES } from './content-limit.js';
import type { GitHubClient, GitTree, GraphqlAnswer } from './github-rest.js';

/** Aliased fields in one GraphQL query, paths or blobs. */
export const FIELDS_PER_QUERY = 100;

/** Bytes of blob text asked for in one query; a single larger blob (up to `MAX_CONFIG_BYTES`) goes alone. */
export const TEXT_BYTES_PER_QUERY = 4 * 1024 * 1024;

/** Answer bound for blob texts: JSON writes a byte of text as at most 6 characters (`\u0000`). */
const textAnswerLimit = (textBytes: number) => 6 * textBytes + 1024 * 1024;

/** Answer bound for a query of paths' modes, ids and sizes (about 150 bytes a path). */
const LOOKUP_ANSWER_BYTES = 4 * 1024 * 1024;

/** A file's mode, object id and size (null where the API gives none). */
interface Entry {
  mode: number;
  oid: string;
  size: number | null;
}

/** What a look at a path found: an entry, nothing there (null), a failure, or `rest`: read it through REST. */
type Found = Entry | null | Error | 'rest';

export interface ApiContentOptions {
  owner: string;
  repo: string;
  /** Told once, when GraphQL fails as a whole and the REST contents API reads the files left. */
  warn?: (message: string) => void;
  /** Aliased fields per GraphQL query (default: `FIELDS_PER_QUERY`). */
  fieldsPerQuery?: number;
  /** Text bytes per GraphQL query (default: `TEXT_BYTES_PER_QUERY`). */
  textBytesPerQuery?: number;
  /** REST reads at once (default: 8, as the gate reads a source without `readMany`). */
  concurrency?: number;
}

/** Git's object id of a blob with these bytes: SHA-1 (40 hex digits) or SHA-256 (64) of `blob <size>\0<bytes>`. */
export function gitBlobId(bytes: Uint8Array, hexDigits = 40): string {
  return createHash(hexDigits === 64 ? 'sha256' : 'sha1')
    .update(`blob ${bytes.byteLength}\u0000`)
    .update(bytes)
    .digest('hex');
}

/** A regular file, executable or not (git's modes 100644 and 100755): not a symlink, tree or submodule. */
const isRegular = (mode: number) => (mode & 0o170000) === 0o100000;

const asError = (error: unknown): Error =>
  error instanceof Error ? error : new Error(String(error));

const reason = (error: unknown) => (error instanceof Error ? error.message : String(error));

function chunks<T>(items: readonly T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

async function mapLimited<T>(
  items: readonly T[],
  limit: number,
  work: (item: T) => Promise<void>,
): Promise<void> {
  let next = 0;
  await Promise.all(
    Array.from({ length: Math.min(limit, items.length) }, async () => {
      while (next < items.length) await work(items[next++]!);
    }),
  );
}

/** The fields of an answer's `repository` by alias, and the aliases (`c0`, `c0/f3`, `b5`) whose fields failed. */
function aliasesOf(answer: GraphqlAnswer): {
  repository: Record<string, unknown> | null;
  failed: Set<string>;
  whole: string[];
} {
  const failed = new Set<string>();
  const whole: string[] = [];
  for (const error of answer.errors ?? []) {
    const path = Array.isArray(error.path) ? error.path : [];
    if (path[0] === 'repository' && path.length >= 2) failed.add(path.slice(1, 3).join('/'));
    else whole.push(typeof error.message === 'string' ? error.message : 'an error');
  }
  const data = answer.data as { repository?: unknown } | null | undefined;
  const repository =
    data && typeof data.repository === 'object' && data.repository !== null
      ? (data.repository as Record<string, unknown>)
      : null;
  return { repository, failed, whole };
}

/**
 * A content source reading through the API: `readMany` as above, `read` (the policy, one file)
 * through the REST contents API, and `exists` from what `readMany` already learnt where it can.
 */
export function createApiContentSource(
  api: GitHubClient,
  options: ApiContentOptions,
): Required<ContentSource> {
  const { owner, repo } = options;
  const perQuery = options.fieldsPerQuery ?? FIELDS_PER_QUERY;
  const textBytes = options.textBytesPerQuery ?? TEXT_BYTES_PER_QUERY;
  const concurrency = options.concurrency ?? 8;
  let graphqlWorks = api.graphql !== undefined;
  const trees = new Map<string, Promise<GitTree | Error>>();
  const directories = new WeakMap<GitTree, Set<string>>();
  /** What the lookups found, by `ref\0path`: an entry, or null for nothing there. */
  const known = new Map<string, Entry | null>();
  const key = (ref: string, path: string) => `${ref}\u0000${path}`;

  const readRest = (request: ContentRequest) =>
    api.getFileContent(owner, repo, request.path, request.ref);

  /** One GraphQL query; null (and GraphQL given up for this run) when it fails as a whole. */
  async function ask(
    query: string,
    variables: Record<string, unknown>,
    maxBytes: number,
  ): Promise<{ repository: Record<string, unknown>; failed: Set<string> } | null> {
    if (!graphqlWorks || !api.graphql) return null;
    let problem: string;
    try {
      const { repository, failed, whole } = aliasesOf(
        await api.graphql(query, { owner, name: repo, ...variables }, maxBytes),
      );
      if (repository !== null && whole.length === 0) return { repository, failed };
      problem = whole.length > 0 ? whole.join('; ') : 'the answer has no repository';
    } catch (error) {
      problem = reason(error);
    }
    graphqlWorks = false;
    options.warn?.(
      `Reading file contents through GitHub's GraphQL API failed (${problem}); the files left are read one request each through the REST contents API.`,
    );
    return null;
  }

  function treeOf(ref: string): Promise<GitTree | Error> {
    let tree = trees.get(ref);
    if (!tree) {
      tree = api.readTree!(owner, repo, ref).catch(asError);
      trees.set(ref, tree);
    }
    return tree;
  }

  /** The entry at `path` in a complete tree; a folder (listed, or only implied by its files) is a tree. */
  function inTree(tree: GitTree, path: string): Entry | null {
    const entry = tree.entries.get(path);
    if (entry)
      return {
        mode: entry.type === 'tree' ? 0o040000 : Number.parseInt(entry.mode, 8) || 0,
        oid: entry.sha,
        size: entry.size,
      };
    let folders = directories.get(tree);
    if (!folders) {
      folders = new Set();
      for (const listed of tree.entries.keys())
        for (let i = listed.indexOf('/'); i > 0; i = listed.indexOf('/', i + 1))
          folders.add(listed.slice(0, i));
      directories.set(tree, folders);
    }
    return folders.has(path) ? { mode: 0o040000, oid: '', size: null } : null;
  }

  /** Modes, ids and sizes of up to `perQuery` paths through GraphQL; null when GraphQL failed. */
  async function lookUpBatch(items: ContentRequest[]): Promise<Found[] | null> {
    const refs = [...new Set(items.map((item) => item.ref))];
    const declarations = ['$owner: String!', '$name: String!'];
    const variables: Record<string, unknown> = {};
    const commits = refs.map((ref, c) => {
      declarations.push(`$c${c}: String!`);
      variables[`c${c}`] = ref;
      const files = items.flatMap((item, f) =>
        item.ref === ref ? [`f${f}: file(path: $p${f}) { mode oid size }`] : [],
      );
      return `c${c}: object(expression: $c${c}) { __typename ... on Commit { ${files.join(' ')} } }`;
    });
    items.forEach((item, f) => {
      declarations.push(`$p${f}: String!`);
      variables[`p${f}`] = item.path;
    });
    const answer = await ask(
      `query(${declarations.join(', ')}) { repository(owner: $owner, name: $name) { ${commits.join(' ')} } }`,
      variables,
      LOOKUP_ANSWER_BYTES,
    );
    if (answer === null) return null;
    return items.map((item, f): Found => {
      const c = refs.indexOf(item.ref);
      if (answer.failed.has(`c${c}`) || answer.failed.has(`c${c}/f${f}`)) return 'rest';
      const commit = answer.repository[`c${c}`] as Record<string, unknown> | null | undefined;
      if (commit === null || commit === undefined)
        return new Error(`commit ${item.ref} was not found through the GitHub API`);
      if (commit.__typename !== 'Commit')
        return new Error(`${item.ref} names a ${String(commit.__typename)}, not a commit`);
      const file = commit[`f${f}`] as { mode?: unknown; oid?: unknown; size?: unknown } | null;
      if (file === null) return null;
      if (typeof file?.mode !== 'number' || typeof file.oid !== 'string') return 'rest';
      return {
        mode: file.mode,
        oid: file.oid,
        size: typeof file.size === 'number' ? file.size : null,
      };
    });
  }

  /** What is at every requested path: from trees for commits with many paths, else through GraphQL. */
  async function lookUp(requests: readonly ContentRequest[]): Promise<Found[]> {
    const found: Found[] = requests.map(() => 'rest');
    // Without GraphQL the texts come one request each anyway: a tree would only add to that.
    if (!graphqlWorks) return found;
    const byRef = new Map<string, number[]>();
    requests.forEach((request, i) =>
      byRef.set(request.ref, [...(byRef.get(request.ref) ?? []), i]),
    );
    const viaGraphql: number[] = [];
    for (const [ref, indices] of byRef) {
      // Two trees cost two requests whatever their size; fewer paths cost fewer GraphQL lookups.
      if (api.readTree && new Set(indices.map((i) => requests[i]!.path)).size > 2 * perQuery) {
        const tree = await treeOf(ref);
        if (tree instanceof Error) {
          for (const i of indices) found[i] = tree;
          continue;
        }
        if (!tree.truncated) {
          for (const i of indices) found[i] = inTree(tree, requests[i]!.path);
          continue;
        }
      }
      viaGraphql.push(...indices);
    }
    for (const batch of chunks(viaGraphql, perQuery)) {
      const result = await lookUpBatch(batch.map((i) => requests[i]!));
      if (result === null) break;
      batch.forEach((i, k) => (found[i] = result[k]!));
    }
    found.forEach((entry, i) => {
      if (entry === null || (typeof entry === 'object' && !(entry instanceof Error)))
        known.set(key(requests[i]!.ref, requests[i]!.path), entry);
    });
    return found;
  }

  /** Texts of blobs by object id, exactly their bytes; an id missing from the answer is read through REST. */
  async function readTexts(oids: string[]): Promise<Map<string, Uint8Array>> {
    const texts = new Map<string, Uint8Array>();
    const declarations = ['$owner: String!', '$name: String!'];
    const variables: Record<string, unknown> = {};
    const fields = oids.map((oid, b) => {
      declarations.push(`$o${b}: GitObjectID!`);
      variables[`o${b}`] = oid;
      return `b${b}: object(oid: $o${b}) { __typename ... on Blob { oid isBinary isTruncated text } }`;
    });
    const answer = await ask(
      `query(${declarations.join(', ')}) { repository(owner: $owner, name: $name) { ${fields.join(' ')} } }`,
      variables,
      textAnswerLimit(textBytes),
    );
    if (answer === null) return texts;
    oids.forEach((oid, b) => {
      if (answer.failed.has(`b${b}`)) return;
      const blob = answer.repository[`b${b}`] as Record<string, unknown> | null | undefined;
      if (!blob || blob.__typename !== 'Blob' || blob.isTruncated !== false) return;
      if (blob.isBinary !== false || typeof blob.text !== 'string') return;
      const bytes = new TextEncoder().encode(blob.text);
      if (gitBlobId(bytes, oid.length) === oid.toLowerCase()) texts.set(oid, bytes);
    });
    return texts;
  }

  async function readMany(
    requests: readonly ContentRequest[],
  ): Promise<(Uint8Array | null | Error)[]> {
    const answers: (Uint8Array | null | Error)[] = requests.map(() => null);
    const rest: number[] = [];
    const byOid = new Map<string, { size: number; indices: number[] }>();
    (await lookUp(requests)).forEach((entry, i) => {
      if (entry === 'rest') rest.push(i);
      else if (entry === null || entry instanceof Error) answers[i] = entry;
      else if (!isRegular(entry.mode)) answers[i] = null;
      // The REST read refuses it from the size GitHub states, as it did before.
      else if (entry.size === null || entry.size > MAX_CONFIG_BYTES) rest.push(i);
      else {
        const wanted = byOid.get(entry.oid) ?? { size: entry.size, indices: [] };
        wanted.indices.push(i);
        byOid.set(entry.oid, wanted);
      }
    });
    // Batches of at most `perQuery` blobs and `textBytes` of text (a larger blob alone).
    let batch: string[] = [];
    let batchBytes = 0;
    const flush = async () => {
      if (batch.length === 0) return;
      const texts = await readTexts(batch);
      for (const oid of batch) {
        const bytes = texts.get(oid);
        for (const i of byOid.get(oid)!.indices) {
          if (bytes) answers[i] = bytes;
          else rest.push(i);
        }
      }
      batch = [];
      batchBytes = 0;
    };
    for (const [oid, { size }] of byOid) {
      if (batch.length >= perQuery || (batch.length > 0 && batchBytes + size > textBytes))
        await flush();
      batch.push(oid);
      batchBytes += size;
    }
    await flush();
    await mapLimited(rest, concurrency, async (i) => {
      answers[i] = await readRest(requests[i]!).catch(asError);
    });
    return answers;
  }

  return {
    read: (ref, path) => readRest({ ref, path }),
    readMany,
    async exists(ref, path) {
      const entry = known.get(key(ref, path));
      if (entry !== undefined) return entry !== null;
      const tree = await trees.get(ref);
      if (tree && !(tree instanceof Error) && !tree.truncated) return inTree(tree, path) !== null;
      return api.pathExists(owner, repo, path, ref);
    },
  };
}
