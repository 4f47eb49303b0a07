/**
 * The one adapter for the GitHub REST API: what each call sends and what its answer means, never
 * what the action makes of it (the living report comment is `src/action/report-comment.ts`, the
 * review suggestions `src/action/review-suggestions.ts`). Octokit with the retry plugin (5xx and
 * connection failures, with growing waits) and the throttling plugin (primary and secondary rate
 * limits, waiting as long as GitHub asks, within a bound). Errors leave as `ApiError`; the token
 * never reaches a log line or an error message.
 */
import { getProxyUrl } from '@actions/http-client/lib/proxy';
import type * as OctokitStack from './octokit.js';
import type { ChangedFile } from '../core/changes.js';
import type { PlannedSuggestion } from '../core/render/suggestions.js';
import { ContentTooLargeError, MAX_CONFIG_BYTES } from './content-limit.js';

/** GitHub lists at most this many files of a pull request (REST API documentation, "List pull requests files"). */
export const PULL_REQUEST_FILE_CAP = 3000;

/** A failed API call. `status` is the HTTP status; 500 also stands for a connection failure. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly operation: string,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** A 403 that is not a rate limit: the token may not do this, e.g. comment from a fork's read-only token. */
export function isPermissionError(error: unknown): boolean {
  return error instanceof ApiError && error.status === 403 && !/rate limit/i.test(error.message);
}

/** The resource is not there (or the token may not see it). */
export function isNotFoundError(error: unknown): boolean {
  return error instanceof ApiError && (error.status === 404 || error.status === 410);
}

export interface Comment {
  id: number;
  /** Link to the comment on github.com. */
  url: string;
  body: string;
  /** Login of the author, null for a deleted account. */
  author: string | null;
}

export interface PullRequestInfo {
  number: number;
  baseSha: string;
  headSha: string;
  labels: string[];
  /** Head and base live in different repositories. */
  isFork: boolean;
  /** Files GitHub counts as changed (may exceed what the file list returns). */
  changedFiles: number;
  /** `open`, or `closed` (merged pull requests too). */
  state: 'open' | 'closed';
}

/** A pull request as GitHub's list gives it. */
export interface PullRequestSummary {
  number: number;
  headSha: string;
  /** `owner:branch` of the head. */
  headLabel: string;
}

export interface PullRequestFiles {
  files: ChangedFile[];
  /** GitHub's list stops at `PULL_REQUEST_FILE_CAP` files; more may have changed. */
  truncated: boolean;
}

/** One entry of a commit's recursive git tree, as the trees API lists it. */
export interface GitTreeEntry {
  /** Octal mode as git writes it: `100644`, `100755`, `120000`, `160000`, `040000`. */
  mode: string;
  /** `blob`, `tree` or `commit` (a submodule). */
  type: string;
  sha: string;
  /** Bytes of a blob; null for trees and submodules. */
  size: number | null;
}

/** A commit's whole tree by path; `truncated` when GitHub cut the listing short. */
export interface GitTree {
  truncated: boolean;
  entries: Map<string, GitTreeEntry>;
}

/** A GraphQL answer as GitHub sends it: data, and errors with the path of the field that failed. */
export interface GraphqlAnswer {
  data?: unknown;
  errors?: { message?: unknown; type?: unknown; path?: unknown }[];
}

export interface GitHubClient {
  /** Every file of a pull request, paginated. */
  listPullRequestFiles(owner: string, repo: string, number: number): Promise<PullRequestFiles>;
  /**
   * Bytes of a regular file at `ref`; null when absent, a directory, a submodule or a symlink.
   * Throws `ContentTooLargeError` past `MAX_CONFIG_BYTES` without downloading the file.
   */
  getFileContent(
    owner: string,
    repo: string,
    path: string,
    ref: string,
  ): Promise<Uint8Array | null>;
  /** Whether anything (a file, a symlink, a directory, a submodule) is at `path` in `ref`: false only on a 404. */
  pathExists(owner: string, repo: string, path: string, ref: string): Promise<boolean>;
  /** The oldest comment whose body starts with `marker`, written by the token's own identity; null when that identity is not known. */
  findComment(
    owner: string,
    repo: string,
    issueNumber: number,
    marker: string,
  ): Promise<Comment | null>;
  /** Every comment whose body starts with `marker` written by `login`, oldest first. */
  listMarkedComments(
    owner: string,
    repo: string,
    issueNumber: number,
    marker: string,
    login: string,
  ): Promise<Comment[]>;
  /** Deletes a comment; a comment already gone counts as deleted. */
  deleteComment(owner: string, repo: string, commentId: number): Promise<void>;
  /**
   * The login the token acts as, asked once: `GET /user` for a user's token, and for an app's
   * installation token (which `GET /user` refuses with 403) GraphQL's `viewer`, which gives the
   * app's bot account (`<app>[bot]`). Null when neither answers.
   */
  identity(): Promise<string | null>;
  /** The merge base of `base` and `head` (the compare API's `merge_base_commit`). */
  mergeBase(owner: string, repo: string, base: string, head: string): Promise<string>;
  /**
   * Every path that differs between two commits, from their recursive git trees (two requests,
   * whatever the number of files; no rename detection). Throws `ApiError` when GitHub cuts a tree
   * short (`truncated`), so a partial list is never taken for the whole.
   */
  listChangesBetween(
    owner: string,
    repo: string,
    base: string,
    head: string,
  ): Promise<ChangedFile[]>;
  /** A commit's recursive tree (one request per commit for the client's life; GitHub cuts it past 100,000 entries or 7 MB). */
  readTree?(owner: string, repo: string, ref: string): Promise<GitTree>;
  /**
   * One GraphQL query with its variables; the answer as sent, partial errors included (they are
   * the caller's to judge). Refused past `maxBytes` of answer, without holding more.
   */
  graphql?(
    query: string,
    variables: Record<string, unknown>,
    maxBytes: number,
  ): Promise<GraphqlAnswer>;
  /** A comment by id, null when it was deleted. */
  getComment(owner: string, repo: string, commentId: number): Promise<Comment | null>;
  /**
   * Not retried on its own: a create whose answer is lost may have landed, so `publishComment`
   * looks before it tries again.
   */
  createComment(owner: string, repo: string, issueNumber: number, body: string): Promise<Comment>;
  /** Throws `ApiError` 404 when the comment is gone; the caller then creates a new one. */
  updateComment(owner: string, repo: string, commentId: number, body: string): Promise<Comment>;
  getPullRequest(owner: string, repo: string, number: number): Promise<PullRequestInfo>;
  /** Open pull requests whose head is `head` (`owner:branch`), paginated. */
  listOpenPullRequests(owner: string, repo: string, head: string): Promise<PullRequestSummary[]>;
}

export interface ClientLog {
  debug(message: string): void;
  info(message: string): void;
  warn(message: string): void;
}

export interface GitHubClientOptions {
  /** REST API root, e.g. `GITHUB_API_URL` (default: `https://api.github.com`). */
  baseUrl?: string;
  log: ClientLog;
  /**
   * Login whose comments `findComment` may take over (default: `null`, the identity the token
   * authenticates as, see `identity`); never any other account, bot or not.
   */
  commentAuthor?: string | null;
  /** Milliseconds per second of every wait GitHub asks for; tests shrink it (default: `1000`). */
  msPerSecond?: number;
  /** Retries of one call after 5xx answers or connection failures (default: `3`). */
  retries?: number;
  /** Retries after a rate limit (default: `2`). */
  rateLimitRetries?: number;
  /** Longest rate-limit wait honoured, in seconds; a longer one fails the call (default: `120`). */
  maxRateLimitWaitSeconds?: number;
  /** Time one HTTP request may take, in milliseconds (default: `30000`). */
  requestTimeoutMs?: number;
}

type Stack = typeof OctokitStack;

/** The client class: Octokit with the REST methods, pagination, retries and rate-limit handling. */
const clientClass = (stack: Stack) =>
  stack.Octokit.plugin(
    stack.restEndpointMethods,
    stack.paginateRest,
    stack.retry,
    stack.throttling,
  );
/** The review suggestions' client class: the same without rate-limit handling. */
const reviewClass = (stack: Stack) =>
  stack.Octokit.plugin(stack.restEndpointMethods, stack.paginateRest, stack.retry);
type Octokit = InstanceType<ReturnType<typeof clientClass>>;

/** Time one request of the review suggestions may take, in milliseconds. */
const REVIEW_TIMEOUT_MS = 30_000;

/**
 * The Octokit stack (`octokit.ts`) and the fetch its requests take to `baseUrl`: node-fetch, or,
 * when a proxy applies to that address (`https_proxy`, `HTTPS_PROXY` and the like, less
 * `no_proxy`, as `@actions/http-client` reads them), the toolkit's proxy-aware fetch.
 */
async function loadStack(baseUrl: string): Promise<Stack & { fetch: typeof globalThis.fetch }> {
  const stack = await import('./octokit.js');
  if (getProxyUrl(new URL(baseUrl)) === undefined)
    return { ...stack, fetch: stack.nodeFetch as unknown as typeof globalThis.fetch };
  const { proxyDefaults } = await import('./octokit-proxy.js');
  return {
    ...stack,
    fetch: (proxyDefaults.request?.fetch ?? globalThis.fetch) as typeof globalThis.fetch,
  };
}

/**
 * `fetch` with a time limit per request (`AbortSignal.timeout`) unless the caller passes a signal.
 * A request that runs out of time fails with the signal's `TimeoutError`, whichever fetch made it:
 * Octokit turns that into a status-500 `RequestError`, which the retry plugin retries (node-fetch
 * would reject with its own `AbortError`, which Octokit rethrows as it is, unretried).
 */
function timedFetch(fetch: typeof globalThis.fetch, timeoutMs: number): typeof globalThis.fetch {
  return async (url, init) => {
    if (init?.signal) return fetch(url, init);
    const signal = AbortSignal.timeout(timeoutMs);
    try {
      return await fetch(url, { ...init, signal });
    } catch (error) {
      throw signal.aborted ? (signal.reason as Error) : error;
    }
  };
}

/**
 * What the toolkit's `getOctokit` adds to a client's options: the token as `token …`
 * authorization, and the workflow run's orchestration id (`ACTIONS_ORCHESTRATION_ID`, characters
 * outside `[a-z0-9_.-]` as `_`) at the head of the user agent.
 */
function runnerOptions(token: string): { auth: string; userAgent?: string } {
  const id = (process.env.ACTIONS_ORCHESTRATION_ID ?? '').trim();
  return {
    auth: `token ${token}`,
    ...(id === ''
      ? {}
      : { userAgent: `actions_orchestration_id/${id.replace(/[^a-z0-9_.-]/gi, '_')}` }),
  };
}

/** Pages of comments read at most, 100 each: past that a pull request is not a place to search. */
const MAX_COMMENT_PAGES = 100;

/** The identity look-up of an installation token: a read, which changes nothing. */
const VIEWER_QUERY = 'query { viewer { login } }';

let clientCount = 0;

function toComment(data: {
  id: number;
  html_url: string;
  body?: string | null;
  user?: { login: string } | null;
}): Comment {
  return {
    id: data.id,
    url: data.html_url,
    body: data.body ?? '',
    author: data.user?.login ?? null,
  };
}

function toChangedFile(entry: {
  filename: string;
  status: string;
  previous_filename?: string;
}): ChangedFile {
  switch (entry.status) {
    case 'added':
    case 'copied':
      return { status: 'added', path: entry.filename, previousPath: null };
    case 'removed':
      return { status: 'deleted', path: entry.filename, previousPath: null };
    case 'renamed':
      return {
        status: 'renamed',
        path: entry.filename,
        previousPath: entry.previous_filename ?? null,
      };
    // `modified`, `changed` (mode only) and `unchanged` all keep the path.
    default:
      return { status: 'modified', path: entry.filename, previousPath: null };
  }
}

/** Reads a response stream, refusing it past `limit` bytes rather than holding it whole. */
async function readBounded(body: unknown, path: string, limit: number): Promise<Uint8Array> {
  if (body instanceof ArrayBuffer) {
    if (body.byteLength > limit) throw new ContentTooLargeError(path, body.byteLength, limit);
    return new Uint8Array(body);
  }
  if (typeof body === 'string')
    return readBounded(new TextEncoder().encode(body).buffer, path, limit);
  // A web stream (fetch's) or a Node stream (node-fetch's): both are async iterables, and leaving
  // the loop early, by the throw, cancels or destroys the stream.
  const chunks: Uint8Array[] = [];
  let total = 0;
  for await (const chunk of body as AsyncIterable<Uint8Array>) {
    total += chunk.byteLength;
    if (total > limit) throw new ContentTooLargeError(path, total, limit);
    chunks.push(chunk);
  }
  const bytes = new Uint8Array(total);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.byteLength;
  }
  return bytes;
}

/** One review comment as the adapter needs it. */
export interface ReviewComment {
  id: number;
  path: string;
  /** Line it is on now at head; null once the line is outdated. */
  line: number | null;
  startLine: number | null;
  body: string;
  /** The author is a bot account (the workflow token writes as `github-actions[bot]`). */
  byBot: boolean;
}

export interface ReviewTarget {
  owner: string;
  repo: string;
  pull: number;
  /** The head commit the suggestions are written against. */
  headSha: string;
}

/**
 * Review comments, for the review suggestions (REST: "List review comments on a pull request",
 * "Create a review comment for a pull request", "Update a review comment for a pull request",
 * "Delete a review comment for a pull request", and the pull request's file list for the diff).
 */
export interface ReviewApi {
  /** Every review comment of the pull request, paginated. */
  listReviewComments(target: ReviewTarget): Promise<ReviewComment[]>;
  createReviewComment(target: ReviewTarget, suggestion: PlannedSuggestion): Promise<void>;
  updateReviewComment(target: ReviewTarget, id: number, body: string): Promise<void>;
  deleteReviewComment(target: ReviewTarget, id: number): Promise<void>;
  /** Each changed file's unified diff (`patch`), absent for binary or very large files. */
  listPatches(target: ReviewTarget): Promise<Map<string, string>>;
}

/** The REST calls, with the runner's request defaults and the retry plugin; the Octokit stack loads on first use. */
export function createReviewApi(token: string, options: { baseUrl?: string }): ReviewApi {
  let octokit: InstanceType<ReturnType<typeof reviewClass>> | null = null;
  const client = async () => {
    if (octokit) return octokit;
    const baseUrl = options.baseUrl ?? 'https://api.github.com';
    const stack = await loadStack(baseUrl);
    octokit = new (reviewClass(stack))({
      ...runnerOptions(token),
      baseUrl,
      request: { fetch: timedFetch(stack.fetch, REVIEW_TIMEOUT_MS) },
      retry: { retries: 2 },
    });
    return octokit;
  };
  return {
    async listReviewComments({ owner, repo, pull }) {
      const kit = await client();
      const entries = await kit.paginate(kit.rest.pulls.listReviewComments, {
        owner,
        repo,
        pull_number: pull,
        per_page: 100,
      });
      return entries.map((c) => ({
        id: c.id,
        path: c.path,
        line: c.line ?? null,
        startLine: c.start_line ?? null,
        body: c.body,
        byBot: c.user?.type === 'Bot',
      }));
    },
    async createReviewComment({ owner, repo, pull, headSha }, s) {
      const kit = await client();
      await kit.rest.pulls.createReviewComment({
        owner,
        repo,
        pull_number: pull,
        commit_id: headSha,
        path: s.path,
        body: s.body,
        line: s.line,
        side: 'RIGHT',
        ...(s.startLine < s.line ? { start_line: s.startLine, start_side: 'RIGHT' as const } : {}),
        request: { retries: 0 },
      });
    },
    async updateReviewComment({ owner, repo }, id, body) {
      const kit = await client();
      await kit.rest.pulls.updateReviewComment({ owner, repo, comment_id: id, body });
    },
    async deleteReviewComment({ owner, repo }, id) {
      const kit = await client();
      await kit.rest.pulls.deleteReviewComment({ owner, repo, comment_id: id });
    },
    async listPatches({ owner, repo, pull }) {
      const kit = await client();
      const entries = await kit.paginate(kit.rest.pulls.listFiles, {
        owner,
        repo,
        pull_number: pull,
        per_page: 100,
      });
      return new Map(
        entries
          .filter((e) => typeof e.patch === 'string')
          .map((e) => [e.filename, e.patch as string]),
      );
    },
  };
}

/** Whether an error from the API is a refusal to write (a read-only token, as forks get). */
export function isWriteRefused(error: unknown): boolean {
  const status = (error as { status?: unknown } | null)?.status;
  return (
    status === 403 || (status === 404 && /not accessible/i.test(String((error as Error).message)))
  );
}

/**
 * Whether a GraphQL document only reads: it starts with a selection set or `query`, and the word
 * `mutation` or `subscription` appears nowhere in it (a name or a string that holds the word
 * counts against it: a doubtful document is spaced as a write).
 */
export function isReadOnlyQuery(document: string): boolean {
  return /^\s*(?:query\b|\{)/.test(document) && !/(?:mutation|subscription)/i.test(document);
}

export function createGitHubClient(token: string, options: GitHubClientOptions): GitHubClient {
  const msPerSecond = options.msPerSecond ?? 1000;
  const rateLimitRetries = options.rateLimitRetries ?? 2;
  const maxWait = options.maxRateLimitWaitSeconds ?? 120;
  const timeoutMs = options.requestTimeoutMs ?? 30_000;
  const commentAuthor = options.commentAuthor ?? null;

  /** Whatever octokit or a plugin logs passes here first: the token is cut out of every line. */
  const redact = (args: unknown[]): string => {
    const show = (arg: unknown): string => {
      if (arg instanceof Error) return arg.message;
      if (typeof arg === 'string') return arg;
      try {
        return JSON.stringify(arg) ?? String(arg);
      } catch {
        // Circular request objects: their shape is not worth a crash in a log call.
        return String(arg);
      }
    };
    let text = args.map(show).join(' ');
    if (token.length >= 4) text = text.split(token).join('***');
    return text;
  };
  const log = {
    debug: (...args: unknown[]) => options.log.debug(redact(args)),
    info: (...args: unknown[]) => options.log.info(redact(args)),
    warn: (...args: unknown[]) => options.log.warn(redact(args)),
    error: (...args: unknown[]) => options.log.warn(redact(args)),
  };

  const limitHandler =
    (kind: string) =>
    (
      retryAfter: number,
      request: { method: string; url: string },
      _octokit: unknown,
      retryCount: number,
    ): boolean => {
      const retrying = retryCount < rateLimitRetries && retryAfter <= maxWait;
      log.warn(
        `GitHub ${kind} on ${request.method} ${request.url}: ${retrying ? `waiting ${retryAfter} s, then retry ${retryCount + 1} of ${rateLimitRetries}` : `not retrying (asked to wait ${retryAfter} s; retries used ${retryCount} of ${rateLimitRetries}, longest wait ${maxWait} s)`}`,
      );
      return retrying;
    };

  clientCount += 1;
  const limiterId = `context-reach-${clientCount}`;
  let octokit!: Octokit;
  /**
   * The client for GraphQL queries that change nothing (never a mutation): GitHub counts such a
   * query like a GET (REST documentation, "Rate limits for the REST API", "Calculating points for
   * the secondary rate limit": 1 point, a mutation 5), but the throttling plugin spaces every
   * request to /graphql like a write, so a look-up would hold the next real write back a second.
   * Same token, retries, timeouts, log and rate-limit handling, the same concurrency limiter id;
   * queries still run one at a time. Writes never go through it (`readOnlyQuery`).
   */
  let queries!: Octokit;
  let loading: Promise<void> | null = null;
  // The Octokit stack is loaded and built on the first call (see `octokit.ts` for why).
  const connect = () =>
    (loading ??= loadStack(options.baseUrl ?? 'https://api.github.com').then((stack) => {
      const { Bottleneck } = stack;
      // GitHub asks integrations to space writes a second apart, and more for writes that
      // notify people; the throttling plugin's own spacing (1 s, 3 s), per client and scaled
      // like every other wait GitHub asks for.
      const spaced = (name: string, seconds: number) =>
        new Bottleneck.Group({
          id: `${limiterId}-${name}`,
          maxConcurrent: 1,
          minTime: seconds * msPerSecond,
        });
      const notifications = spaced('notifications', 3);
      const Client = clientClass(stack);
      const build = (write: InstanceType<typeof Bottleneck.Group>) =>
        new Client({
          ...runnerOptions(token),
          baseUrl: options.baseUrl ?? 'https://api.github.com',
          log,
          request: { fetch: timedFetch(stack.fetch, timeoutMs) },
          retry: { retries: options.retries ?? 3, retryAfterBaseValue: msPerSecond },
          throttle: {
            // One limiter set per client: spacing between writes is per run, not shared across clients.
            id: limiterId,
            write,
            notifications,
            retryAfterBaseValue: msPerSecond,
            onRateLimit: limitHandler('rate limit'),
            onSecondaryRateLimit: limitHandler('secondary rate limit'),
          },
        });
      octokit = build(spaced('write', 1));
      queries = build(spaced('query', 0));
    }));

  /** The client a GraphQL document goes through: the unspaced one only for a read-only query. */
  const readOnlyQuery = (document: string): Octokit =>
    isReadOnlyQuery(document) ? queries : octokit;

  async function call<T>(operation: string, run: () => Promise<T>): Promise<T> {
    try {
      await connect();
      return await run();
    } catch (error) {
      if (error instanceof ApiError || error instanceof ContentTooLargeError) throw error;
      const status =
        typeof (error as { status?: unknown }).status === 'number'
          ? (error as { status: number }).status
          : 0;
      const reason = redact([(error as Error).message ?? String(error)]);
      throw new ApiError(
        status,
        `GitHub API ${operation} failed${status ? ` with status ${status}` : ''}: ${reason}`,
        operation,
      );
    }
  }

  let identityAsked: Promise<string | null> | null = null;
  const identity = (): Promise<string | null> =>
    (identityAsked ??= (async () => {
      if (commentAuthor !== null) return commentAuthor;
      try {
        return await call(
          'read the authenticated user',
          async () => (await octokit.rest.users.getAuthenticated()).data.login,
        );
      } catch (error) {
        // An installation token (the workflow's own, or an app's) may not read /user: 403.
        if (
          !(error instanceof ApiError) ||
          (error.status !== 403 && error.status !== 401 && error.status !== 404)
        )
          throw error;
      }
      try {
        return await call('read the authenticated identity (GraphQL viewer)', async () => {
          const answer = await readOnlyQuery(VIEWER_QUERY).graphql<{
            viewer?: { login?: unknown };
          }>(VIEWER_QUERY);
          return typeof answer.viewer?.login === 'string' && answer.viewer.login !== ''
            ? answer.viewer.login
            : null;
        });
      } catch (error) {
        log.warn(
          `Could not tell which account the token acts as (${error instanceof Error ? error.message : String(error)}); the report comment is recognised by the author of the comment this run writes.`,
        );
        return null;
      }
    })());

  const isOurs = (
    comment: { body?: string | null; user?: { login: string } | null },
    marker: string,
    login: string,
  ): boolean => (comment.body ?? '').startsWith(marker) && comment.user?.login === login;

  const markedComments = (
    owner: string,
    repo: string,
    issueNumber: number,
    marker: string,
    login: string | Promise<string | null>,
    firstOnly: boolean,
  ) =>
    call(`list comments of #${issueNumber}`, async () => {
      const listing = octokit.paginate.iterator(octokit.rest.issues.listComments, {
        owner,
        repo,
        issue_number: issueNumber,
        per_page: 100,
      });
      const pages = listing[Symbol.asyncIterator]();
      // The first page is asked at once, while the identity may still be on its way: the
      // look-up then takes one round trip after it, not two.
      let next = pages.next();
      next.catch(() => undefined);
      const author = await login;
      if (author === null) return [];
      const found: Comment[] = [];
      let read = 0;
      for (;;) {
        const page = await next;
        if (page.done) break;
        for (const comment of page.value.data) {
          if (!isOurs(comment, marker, author)) continue;
          found.push(toComment(comment));
          if (firstOnly) return found;
        }
        read += 1;
        if (read >= MAX_COMMENT_PAGES) {
          log.warn(
            `Stopped looking for the report comment after ${read * 100} comments on #${issueNumber}.`,
          );
          break;
        }
        next = pages.next();
      }
      return found.sort((a, b) => a.id - b.id);
    });

  type TreeItem = { path?: string; mode?: string; type?: string; sha?: string; size?: number };
  /**
   * Each commit's tree is asked for once per client: the cut file list is completed from the two
   * commits' trees (`listChangesBetween`), and the content source looks up the same commits'
   * paths in them (`graphql-contents.ts`). A failed read is forgotten, so a later call asks again.
   */
  const trees = new Map<string, Promise<GitTree>>();
  const readTree = (owner: string, repo: string, commit: string): Promise<GitTree> => {
    const key = `${owner}/${repo}\u0000${commit}`;
    let tree = trees.get(key);
    if (tree === undefined) {
      tree = askTree(owner, repo, commit);
      trees.set(key, tree);
      tree.catch(() => trees.delete(key));
    }
    return tree;
  };
  const askTree = (owner: string, repo: string, commit: string): Promise<GitTree> =>
    call(`read the tree of ${commit}`, async () => {
      const { data } = await octokit.rest.git.getTree({
        owner,
        repo,
        tree_sha: commit,
        recursive: 'true',
      });
      const entries = new Map<string, GitTreeEntry>();
      for (const item of data.tree as TreeItem[]) {
        if (typeof item.path !== 'string') continue;
        entries.set(item.path, {
          mode: item.mode ?? '',
          type: item.type ?? '',
          sha: item.sha ?? '',
          size: typeof item.size === 'number' ? item.size : null,
        });
      }
      return { truncated: data.truncated, entries };
    });
  const treeOf = async (owner: string, repo: string, commit: string) => {
    const tree = await readTree(owner, repo, commit);
    if (tree.truncated) {
      throw new ApiError(
        0,
        `GitHub cut the file tree of ${commit} short (over its 100,000 entries or 7 MB), so the changed files cannot all be listed; check out with fetch-depth: 0 so the action reads the whole change from git`,
        'read a tree',
      );
    }
    const entries = new Map<string, string>();
    for (const [path, item] of tree.entries)
      if (item.type !== 'tree') entries.set(path, `${item.mode} ${item.sha}`);
    return entries;
  };

  return {
    listPullRequestFiles(owner, repo, number) {
      return call(`list files of pull request #${number}`, async () => {
        const entries = await octokit.paginate(octokit.rest.pulls.listFiles, {
          owner,
          repo,
          pull_number: number,
          per_page: 100,
        });
        const files = entries.map(toChangedFile);
        return { files, truncated: files.length >= PULL_REQUEST_FILE_CAP };
      });
    },

    getFileContent(owner, repo, path, ref) {
      return call(`read ${path} at ${ref}`, async () => {
        let data: unknown;
        try {
          ({ data } = await octokit.rest.repos.getContent({ owner, repo, path, ref }));
        } catch (error) {
          if ((error as { status?: number }).status === 404) return null;
          throw error;
        }
        if (Array.isArray(data) || data === null || typeof data !== 'object') return null;
        const item = data as {
          type: string;
          path: string;
          size: number;
          encoding?: string;
          content?: string;
        };
        // GitHub answers a symlink to a file in the repository with that file: its path gives it away.
        if (item.type !== 'file' || item.path !== path) return null;
        if (item.size > MAX_CONFIG_BYTES)
          throw new ContentTooLargeError(path, item.size, MAX_CONFIG_BYTES);
        if (item.size === 0) return new Uint8Array(0);
        if (item.encoding === 'base64' && item.content) {
          const bytes = Buffer.from(item.content, 'base64');
          if (bytes.byteLength > MAX_CONFIG_BYTES)
            throw new ContentTooLargeError(path, bytes.byteLength, MAX_CONFIG_BYTES);
          return new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength);
        }
        // Files over 1 MB come without content (encoding "none"); the raw media type carries them.
        const raw = await octokit.rest.repos.getContent({
          owner,
          repo,
          path,
          ref,
          mediaType: { format: 'raw' },
          request: { parseSuccessResponseBody: false },
        });
        return readBounded(raw.data, path, MAX_CONFIG_BYTES);
      });
    },

    pathExists(owner, repo, path, ref) {
      return call(`look for ${path} at ${ref}`, async () => {
        try {
          await octokit.rest.repos.getContent({ owner, repo, path, ref });
          return true;
        } catch (error) {
          if ((error as { status?: number }).status === 404) return false;
          throw error;
        }
      });
    },

    async findComment(owner, repo, issueNumber, marker) {
      return (await markedComments(owner, repo, issueNumber, marker, identity(), true))[0] ?? null;
    },

    listMarkedComments(owner, repo, issueNumber, marker, login) {
      return markedComments(owner, repo, issueNumber, marker, login, false);
    },

    deleteComment(owner, repo, commentId) {
      return call(`delete comment ${commentId}`, async () => {
        try {
          await octokit.rest.issues.deleteComment({ owner, repo, comment_id: commentId });
        } catch (error) {
          if ((error as { status?: number }).status !== 404) throw error;
        }
      });
    },

    identity,

    mergeBase(owner, repo, base, head) {
      return call(`compare ${base}...${head}`, async () => {
        const { data } = await octokit.rest.repos.compareCommitsWithBasehead({
          owner,
          repo,
          basehead: `${base}...${head}`,
          per_page: 1,
        });
        return data.merge_base_commit.sha;
      });
    },

    readTree,

    graphql(query, variables, maxBytes) {
      return call('run a GraphQL query', async () => {
        // The answer is read as a stream, so a bound holds however much GitHub sends.
        const response = await readOnlyQuery(query).request('POST /graphql', {
          query,
          variables,
          request: { parseSuccessResponseBody: false },
        });
        const bytes = await readBounded(response.data, 'the GraphQL answer', maxBytes).catch(
          (error: unknown) => {
            if (!(error instanceof ContentTooLargeError)) throw error;
            throw new ApiError(
              0,
              `GitHub API run a GraphQL query failed: the answer passed ${maxBytes} bytes, more than the query can need`,
              'run a GraphQL query',
            );
          },
        );
        return JSON.parse(new TextDecoder().decode(bytes)) as GraphqlAnswer;
      });
    },

    async listChangesBetween(owner, repo, base, head) {
      const [before, after] = [await treeOf(owner, repo, base), await treeOf(owner, repo, head)];
      const changes: ChangedFile[] = [];
      for (const [path, entry] of after) {
        const old = before.get(path);
        if (old === undefined) changes.push({ status: 'added', path, previousPath: null });
        else if (old !== entry) changes.push({ status: 'modified', path, previousPath: null });
      }
      for (const path of before.keys())
        if (!after.has(path)) changes.push({ status: 'deleted', path, previousPath: null });
      return changes;
    },

    getComment(owner, repo, commentId) {
      return call(`read comment ${commentId}`, async () => {
        try {
          const { data } = await octokit.rest.issues.getComment({
            owner,
            repo,
            comment_id: commentId,
          });
          return toComment(data);
        } catch (error) {
          if ((error as { status?: number }).status === 404) return null;
          throw error;
        }
      });
    },

    createComment(owner, repo, issueNumber, body) {
      return call(`create a comment on #${issueNumber}`, async () => {
        const { data } = await octokit.rest.issues.createComment({
          owner,
          repo,
          issue_number: issueNumber,
          body,
          request: { retries: 0 },
        });
        return toComment(data);
      });
    },

    updateComment(owner, repo, commentId, body) {
      return call(`update comment ${commentId}`, async () => {
        const { data } = await octokit.rest.issues.updateComment({
          owner,
          repo,
          comment_id: commentId,
          body,
        });
        return toComment(data);
      });
    },

    getPullRequest(owner, repo, number) {
      return call(`read pull request #${number}`, async () => {
        const { data } = await octokit.rest.pulls.get({ owner, repo, pull_number: number });
        return {
          number: data.number,
          baseSha: data.base.sha,
          headSha: data.head.sha,
          labels: data.labels.map((label) => label.name),
          isFork: data.head.repo === null || data.head.repo.full_name !== data.base.repo.full_name,
          changedFiles: data.changed_files,
          state: data.state === 'open' ? 'open' : 'closed',
        };
      });
    },

    listOpenPullRequests(owner, repo, head) {
      return call(`list open pull requests of ${head}`, async () => {
        const entries = await octokit.paginate(octokit.rest.pulls.list, {
          owner,
          repo,
          state: 'open',
          head,
          per_page: 100,
        });
        return entries.map((entry) => ({
          number: entry.number,
          headSha: entry.head.sha,
          headLabel: entry.head.label,
        }));
      });
    },
  };
}
