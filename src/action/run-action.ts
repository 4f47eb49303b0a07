import type { ChangedFile } from '../core/changes.js';
import type { GateReport, Verdict } from '../core/report/types.js';
import { runGate, type ContentSource } from '../core/gate.js';
import { planAnnotations } from '../core/render/annotations.js';
import { commentRenderer } from '../core/render/comment.js';
import { renderFailure } from '../core/render/failure.js';
import { gateJsonParts } from '../core/render/gate-json.js';
import { COMMENT_MARKER } from '../core/render/notice.js';
import { VERSION } from '../core/version.js';
import { parseEvent, type EventInfo } from './event.js';
import { gitContentSource, type GitReader } from '../adapters/git.js';
import { createApiContentSource } from '../adapters/graphql-contents.js';
import {
  createReviewApi,
  isPermissionError,
  type Comment,
  type GitHubClient,
  type GitHubClientOptions,
  type ReviewApi,
  type ReviewComment,
  type ReviewTarget,
} from '../adapters/github-rest.js';
import { readSettings, type GetInput, type Settings } from './inputs.js';
import { publishComment } from './report-comment.js';
import { patchesNeeded, publishSuggestions, suggestionPaths } from './review-suggestions.js';
import { fitSummary, type RunnerOutput } from './runner-output.js';

/** Everything the action touches, passed in: the entry wires the real adapters, tests their own. */
export interface ActionDeps {
  env: Readonly<Record<string, string | undefined>>;
  getInput: GetInput;
  out: RunnerOutput;
  readJson: (path: string) => Promise<unknown>;
  /** Bytes of a local file, refused past `maxBytes` without reading it whole (publish mode's report). */
  readFile: (path: string, maxBytes: number) => Promise<Uint8Array>;
  /** Writes a report file; `text` may come in parts (the JSON report, a file at a time). */
  writeFile(path: string, text: string | Iterable<string>): Promise<void>;
  createGit(cwd: string): GitReader;
  createGitHub(token: string, options: GitHubClientOptions): GitHubClient;
  /** Review-comment calls for suggestions (default: the REST adapter's `createReviewApi`). */
  createReviews?(token: string, options: { baseUrl?: string }): ReviewApi;
}

export const FORK_NOTICE =
  'The token cannot comment on this pull request (a read-only token, as pull requests from forks get). The report is in the job summary and the annotations, and the verdict still decides the check. To get the comment on fork pull requests, use the two-workflow recipe in the README ("Pull requests from forks").';

export const COMMENT_FAILED_NOTICE =
  'The report comment could not be written; the report is in the job summary, the annotations and the JSON report, and the verdict still decides the check';

interface Changes {
  /** Where the pull request's changes start: the merge base when git knows it. */
  base: string;
  /** The base branch's commit from the event: the policy is read there. */
  policyRef: string;
  head: string;
  changes: ChangedFile[];
  source: ContentSource;
  notices: string[];
}

/**
 * `target` whose first call of `method` answers with `early` (the same request, asked earlier);
 * every later call asks again. `target` itself when nothing was asked early.
 */
function answeredOnce<T extends object, K extends keyof T>(
  target: T,
  method: K,
  early: Promise<unknown> | null,
): T {
  if (early === null) return target;
  let pending: Promise<unknown> | null = early;
  const call = target[method] as (...args: unknown[]) => unknown;
  return Object.assign(Object.create(target) as T, {
    [method]: (...args: unknown[]) => {
      const asked = pending;
      pending = null;
      return asked ?? call.apply(target, args);
    },
  });
}

/** Changes read from the local repository: the whole diff, every file through a few git processes. */
async function localChanges(
  git: GitReader,
  baseSha: string,
  headSha: string,
  start: string | null,
  policyPath: string,
): Promise<Changes> {
  // The policy comes from the base branch's commit, read while git finds the merge base and
  // lists the changes. Like the pull request's own diff, the changes are those since head left
  // the base branch, not the base branch's later commits.
  const source = gitContentSource(git, [{ ref: baseSha, path: policyPath }]);
  const from = start ?? (await git.mergeBase(baseSha, headSha).catch(() => null)) ?? baseSha;
  return {
    base: from,
    policyRef: baseSha,
    head: headSha,
    changes: await git.changedFiles(from, headSha),
    source,
    notices: [],
  };
}

/**
 * Base and head, the changed files and a way to read them: local git when it has both commits;
 * else a shallow fetch of the merge base, base and head into the checkout (one request for every
 * file); else the API: the file list through REST (a list GitHub cuts short is completed from the
 * two commits' trees, or the run fails closed), the contents through trees and GraphQL
 * (`graphql-contents.ts`).
 */
async function gatherChanges(
  event: EventInfo,
  base: string,
  git: GitReader,
  api: GitHubClient | null,
  {
    warn,
    onLocal,
    policyPath,
  }: {
    warn: (message: string) => void;
    /** The policy file, read from the base commit early when git has both commits. */
    policyPath: string;
    /** Called once git is known to have both commits, with the head's id, before it reads the changes. */
    onLocal: (headSha: string) => void;
  },
): Promise<Changes> {
  // A checkout without the history (or without git at all) falls back to the API.
  const local = (rev: string) => git.resolveCommit(rev).catch(() => null);
  // Both in one git process; when that fails as a whole, each on its own as before.
  const [baseSha = null, headSha = null] =
    (await git.resolveCommits([base, event.head]).catch(() => null)) ??
    (await Promise.all([local(base), local(event.head)]));
  if (baseSha !== null && headSha !== null) {
    onLocal(headSha);
    return localChanges(git, baseSha, headSha, null, policyPath);
  }
  if (api === null || event.pullNumber === null) {
    throw new Error(
      `The checkout lacks commit ${baseSha === null ? base : event.head} and there is ${api === null ? 'no token' : 'no pull request'} to ask the API instead; check out with fetch-depth: 0, or give a base input that exists.`,
    );
  }
  const mergeBase = await api
    .mergeBase(event.owner, event.repo, base, event.head)
    .catch(() => null);
  if (mergeBase !== null && (await git.fetchCommits([mergeBase, base, event.head]))) {
    const [fetchedBase, fetchedHead, fetchedStart] = await Promise.all([
      local(base),
      local(event.head),
      local(mergeBase),
    ]);
    if (fetchedBase !== null && fetchedHead !== null && fetchedStart !== null) {
      onLocal(fetchedHead);
      return localChanges(git, fetchedBase, fetchedHead, fetchedStart, policyPath);
    }
  }
  const listed = await api.listPullRequestFiles(event.owner, event.repo, event.pullNumber);
  let changes = listed.files;
  let start = base;
  if (listed.truncated) {
    // GitHub lists at most 3,000 files of a pull request (and compares at most 300): the two
    // commits' trees list every path. When even they are cut short, the run fails closed.
    const from = mergeBase ?? (await api.mergeBase(event.owner, event.repo, base, event.head));
    try {
      changes = await api.listChangesBetween(event.owner, event.repo, from, event.head);
    } catch (error) {
      throw new Error(
        `GitHub lists only the first ${listed.files.length.toLocaleString('en-US')} files of this pull request, and the full list could not be read (${error instanceof Error ? error.message : String(error)}); files past that would go unjudged, so nothing is judged. Check out with fetch-depth: 0 so the action reads the whole change from git.`,
        { cause: error },
      );
    }
    start = from;
  }
  return {
    base: start,
    policyRef: base,
    head: event.head,
    changes,
    // Every version in a few requests (trees and GraphQL), not one contents request each.
    source: createApiContentSource(api, { owner: event.owner, repo: event.repo, warn }),
    notices: [],
  };
}

function failsCheck(verdict: Verdict, failOn: Settings['failOn']): boolean {
  if (failOn === 'never') return false;
  return verdict === 'block' || (failOn === 'warn' && verdict === 'warn');
}

function setOutputs(
  out: RunnerOutput,
  report: Pick<GateReport, 'verdict' | 'blocking' | 'warnings'>,
  reportPath: string,
  commentUrl: string,
): void {
  out.output('verdict', report.verdict);
  out.output('blocking', String(report.blocking));
  out.output('warnings', String(report.warnings));
  out.output('report-json', reportPath);
  out.output('comment-url', commentUrl);
}

/** The action: settings, event, changes, one decision, then summary, annotations, files, comment, outputs. */
export async function runAction(deps: ActionDeps): Promise<void> {
  const { env, out } = deps;
  const settings = readSettings(deps.getInput, env);
  if (settings.token) out.secret(settings.token);
  const connect = () =>
    settings.token
      ? deps.createGitHub(settings.token, {
          baseUrl: env.GITHUB_API_URL,
          log: { debug: () => {}, info: (m) => out.info(m), warn: (m) => out.warning(m) },
        })
      : null;
  if (settings.publishReport !== null) {
    // Only publish mode reads a JSON report back, and with it ajv and the report's schema:
    // loaded when needed, so a judging run does not load them at start-up.
    const { runPublish } = await import('./publish.js');
    await runPublish(
      { env, out, readJson: deps.readJson, readFile: deps.readFile, api: connect() },
      { ...settings, publishReport: settings.publishReport },
    );
    return;
  }

  const payload = env.GITHUB_EVENT_PATH ? await deps.readJson(env.GITHUB_EVENT_PATH) : {};
  const event = parseEvent(env.GITHUB_EVENT_NAME ?? '', payload, settings.base, env.GITHUB_SHA);
  if (event.base === null) {
    out.notice(
      "This event has no base commit to compare with (a new branch's first push): nothing was judged. Give the base input to compare against a ref.",
    );
    setOutputs(out, { verdict: 'ok', blocking: 0, warnings: 0 }, '', '');
    return;
  }
  const api = connect();
  const git = deps.createGit(env.GITHUB_WORKSPACE ?? '.');
  // Labels added after the event (the usual way to apply a waiver) count on a re-run. Asked for
  // now, and awaited by the gate only when it decides, so the request (and loading the API
  // client) runs while git lists the changes and the gate measures them.
  const labelsAsked =
    api && event.pullNumber !== null
      ? api.getPullRequest(event.owner, event.repo, event.pullNumber).then(
          (pr) => pr.labels,
          () => event.labels,
        )
      : Promise.resolve(event.labels);
  // The reads the publishing starts with, asked as soon as git is known to have both commits, so
  // that they are answered while git reads the changes and the gate computes, and no write waits
  // on a read: which account the token acts as (the client keeps the answer; an error comes back
  // when the comment asks), then the report comment to edit, and our review comments. Only when
  // git gives the changes: reading them through the API uses the same GraphQL endpoint, whose
  // requests then keep their order. A comment another run writes meanwhile is found by the look
  // after the write (`publishComment`), as before; a failed read fails where it is awaited.
  let commentLookup: Promise<Comment | null> | null = null;
  let reviewsListed: Promise<ReviewComment[]> | null = null;
  const reviews =
    settings.suggestions === 'on' && event.pullNumber !== null && api
      ? (deps.createReviews ?? createReviewApi)(settings.token, { baseUrl: env.GITHUB_API_URL })
      : null;
  const reviewTarget = (headSha: string) =>
    event.pullNumber === null
      ? null
      : {
          owner: event.owner,
          repo: event.repo,
          pull: event.pullNumber,
          headSha,
          isFork: event.isFork,
        };
  const onLocal = (headSha: string) => {
    if (api === null || event.pullNumber === null) return;
    if (settings.comment === 'update') {
      api.identity().catch(() => undefined);
      commentLookup = api.findComment(event.owner, event.repo, event.pullNumber, COMMENT_MARKER);
      commentLookup.catch(() => undefined);
    }
    const target = reviewTarget(headSha);
    if (reviews && target && !target.isFork) {
      reviewsListed = reviews.listReviewComments(target);
      reviewsListed.catch(() => undefined);
    }
  };
  let gathered: Changes;
  try {
    gathered = await gatherChanges(event, event.base, git, api, {
      warn: (m) => out.warning(m),
      onLocal,
      policyPath: settings.policyPath,
    });
  } catch (error) {
    await labelsAsked;
    throw error;
  }
  const publisher = api ? answeredOnce(api, 'findComment', commentLookup) : null;

  let report: GateReport;
  try {
    report = await runGate(gathered.source, {
      base: gathered.base,
      head: gathered.head,
      changes: gathered.changes,
      policyPath: settings.policyPath,
      policyRef: gathered.policyRef,
      labels: labelsAsked,
      notices: gathered.notices,
    });
  } catch (error) {
    // A policy that cannot be read fails closed: the check fails and says where, and an earlier
    // comment does not go on saying the pull request passes.
    const message = `context-reach could not judge this change: ${error instanceof Error ? error.message : String(error)}`;
    const body = renderFailure(message);
    let commentUrl = '';
    if (settings.comment === 'update' && event.pullNumber !== null && publisher) {
      commentUrl = await publishComment(publisher, {
        owner: event.owner,
        repo: event.repo,
        issueNumber: event.pullNumber,
        marker: COMMENT_MARKER,
        body,
      }).then(
        (published) => published.comment.url,
        () => '',
      );
    }
    await out.summary(body);
    setOutputs(out, { verdict: 'block', blocking: 1, warnings: 0 }, '', commentUrl);
    out.fail(message);
    return;
  }

  // Review suggestions need the pull request's patches (30 pages of the file list at 3,000
  // files) and the head texts (one batched read: one pair of git processes, not one read per
  // file): asked for now, so they arrive while the reports are written and the comment published.
  let suggesting: {
    reviews: ReviewApi;
    target: ReviewTarget & { isFork: boolean };
    patchesAsked: Promise<Map<string, string>> | null;
    readHeads: (paths: string[]) => Promise<(Uint8Array | null | Error)[]>;
  } | null = null;
  const target = reviewTarget(gathered.head);
  if (reviews && target) {
    const needed = patchesNeeded(target, report);
    const patchesAsked = needed ? reviews.listPatches(target) : null;
    // Its failure is publishSuggestions' to report, when it awaits the answer.
    patchesAsked?.catch(() => undefined);
    const source = gathered.source;
    const readHeads = (paths: string[]) =>
      source.readMany
        ? source.readMany(paths.map((path) => ({ ref: gathered.head, path })))
        : Promise.all(
            paths.map((path) =>
              source.read(gathered.head, path).catch((error: unknown) => error as Error),
            ),
          );
    const early = needed ? suggestionPaths(report) : null;
    const headsAsked = early ? readHeads(early) : null;
    headsAsked?.catch(() => undefined);
    suggesting = {
      reviews: answeredOnce(reviews, 'listReviewComments', reviewsListed),
      target,
      patchesAsked,
      readHeads: (paths) =>
        headsAsked &&
        early &&
        paths.length === early.length &&
        paths.every((p, i) => p === early[i])
          ? headsAsked
          : readHeads(paths),
    };
  }

  const server = env.GITHUB_SERVER_URL ?? 'https://github.com';
  const blobUrl = `${server}/${event.owner}/${event.repo}/blob/${gathered.head}`;
  const { annotations, omitted } = planAnnotations(report);
  for (const annotation of annotations) out.annotate(annotation);

  await deps.writeFile(settings.reportJson, gateJsonParts(report));
  // Loaded only when asked for (34 KB of the bundle that most runs do not need).
  if (settings.sarif) {
    const { renderSarif } = await import('../core/render/sarif.js');
    await deps.writeFile(settings.sarif, renderSarif(report, VERSION));
  }
  if (settings.htmlReport) {
    const { renderHtmlReport } = await import('../core/render/html-report.js');
    await deps.writeFile(settings.htmlReport, renderHtmlReport(report));
  }
  // The page is uploaded by a later step, so its own URL is not known yet: the run's page lists it.
  const runPage =
    settings.htmlReport && env.GITHUB_RUN_ID
      ? `${server}/${event.owner}/${event.repo}/actions/runs/${env.GITHUB_RUN_ID}`
      : null;
  const html = {
    htmlReportUrl: settings.htmlReportUrl ?? runPage,
    htmlReportWhere: settings.htmlReportUrl
      ? null
      : runPage
        ? 'in the artifacts of this workflow run'
        : null,
  };

  // The comment and the job summary show the same files: one renderer renders each section once.
  const render = commentRenderer({ blobUrl, unannotated: omitted, ...html });
  let commentUrl = '';
  const runNotices: string[] = [];
  if (settings.comment === 'update' && event.pullNumber !== null && publisher) {
    const body = render(report);
    try {
      const published = await publishComment(publisher, {
        owner: event.owner,
        repo: event.repo,
        issueNumber: event.pullNumber,
        marker: COMMENT_MARKER,
        body,
      });
      commentUrl = published.comment.url;
      out.info(
        `${published.action === 'created' ? 'Created' : 'Updated'} the report comment: ${commentUrl}`,
      );
    } catch (error) {
      // The comment is a copy of the report: failing to write it loses nothing, so the verdict still decides.
      const notice = isPermissionError(error)
        ? FORK_NOTICE
        : `${COMMENT_FAILED_NOTICE} (${error instanceof Error ? error.message : String(error)})`;
      if (isPermissionError(error)) out.notice(notice);
      else out.warning(notice);
      runNotices.push(notice);
    }
  }
  if (suggesting) {
    const { reviews, target, patchesAsked, readHeads } = suggesting;
    await publishSuggestions(reviews, target, report, readHeads, patchesAsked).then(
      ({ outcome, notice }) => {
        if (notice) {
          out.notice(notice);
          runNotices.push(notice);
        }
        if (outcome)
          out.info(
            `Review suggestions: ${outcome.created} created, ${outcome.updated} updated, ${outcome.kept} kept, ${outcome.removed} removed.`,
          );
      },
      (error: unknown) =>
        out.warning(
          `Review suggestions could not be written (${error instanceof Error ? error.message : String(error)}); the fixes are in the report.`,
        ),
    );
  }
  for (const notice of gathered.notices) out.warning(notice);
  const summaryReport =
    runNotices.length > 0 ? { ...report, notices: [...report.notices, ...runNotices] } : report;
  await out.summary(fitSummary((limit) => render(summaryReport, limit)));
  setOutputs(out, report, settings.reportJson, commentUrl);
  out.info(
    `context-reach verdict: ${report.verdict} (${report.blocking} blocking, ${report.warnings} warnings)`,
  );
  if (failsCheck(report.verdict, settings.failOn)) {
    out.fail(
      `context-reach: ${report.verdict === 'block' ? `${report.blocking} blocking finding${report.blocking === 1 ? '' : 's'}` : `${report.warnings} warning${report.warnings === 1 ? '' : 's'}`} (fail-on: ${settings.failOn}). See the job summary.`,
    );
  }
}
