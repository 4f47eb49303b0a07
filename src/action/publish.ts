/**
 * Publish mode, the second workflow of the fork-safe recipe (README, "Pull requests from forks").
 * A first workflow on `pull_request` runs the gate with a read-only token and uploads its JSON
 * report; this one runs on `workflow_run` in the base repository with a token that may comment,
 * checks out nothing and runs nothing from the pull request. The report is untrusted (a fork's
 * workflow wrote it), so it is read back strictly and every text is escaped again; the pull
 * request comes from GitHub, never from the report: the one open pull request whose head is the
 * triggering run's head commit, confirmed through the API.
 */
import type { GateReport } from '../core/report/types.js';
import { renderComment } from '../core/render/comment.js';
import { readGateJson } from '../core/report/read.js';
import { COMMENT_MARKER } from '../core/render/notice.js';
import { decodeUtf8 } from '../core/parse/utf8.js';
import { parseWorkflowRun, type WorkflowRunInfo } from './event.js';
import type { GitHubClient } from '../adapters/github-rest.js';
import { publishComment } from './report-comment.js';
import type { Settings } from './inputs.js';
import { fitSummary, type RunnerOutput } from './runner-output.js';

/** Largest report file read, in bytes (default: `64 MiB`); a report that large is thousands of files. */
export const MAX_REPORT_BYTES = 64 * 1024 * 1024;

/** Events of a first workflow whose reports are published. */
const PUBLISHED_EVENTS = ['pull_request', 'pull_request_target'];

export interface PublishDeps {
  env: Readonly<Record<string, string | undefined>>;
  out: RunnerOutput;
  readJson(path: string): Promise<unknown>;
  /** Bytes of a local file, refused past `maxBytes` without reading it whole. */
  readFile(path: string, maxBytes: number): Promise<Uint8Array>;
  api: GitHubClient | null;
}

/** Publish mode could not run: the message says what is missing or wrong and where. */
export class PublishError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PublishError';
  }
}

/** The open pull requests whose head is the run's head commit right now, as GitHub answers. */
async function pullRequestsOfHead(api: GitHubClient, run: WorkflowRunInfo): Promise<number[]> {
  const candidates = new Set(run.pullNumbers);
  if (run.headLabel !== null) {
    for (const pull of await api.listOpenPullRequests(run.owner, run.repo, run.headLabel)) {
      if (pull.headSha === run.headSha) candidates.add(pull.number);
    }
  }
  const confirmed: number[] = [];
  for (const number of [...candidates].sort((a, b) => a - b)) {
    const pull = await api.getPullRequest(run.owner, run.repo, number).catch(() => null);
    // A closed (or merged) pull request gets no new comment, whatever number the payload names.
    if (pull !== null && pull.headSha === run.headSha && pull.state === 'open')
      confirmed.push(number);
  }
  return confirmed;
}

async function readReport(deps: PublishDeps, path: string): Promise<GateReport> {
  let bytes: Uint8Array;
  try {
    bytes = await deps.readFile(path, MAX_REPORT_BYTES);
  } catch (error) {
    throw new PublishError(
      `The report to publish could not be read: ${error instanceof Error ? error.message : String(error)}; expected the JSON report the first workflow uploaded (input publish-report).`,
    );
  }
  const decoded = decodeUtf8(bytes);
  if (!decoded.ok) {
    throw new PublishError(
      `${path} is not UTF-8 text; expected the JSON report the first workflow uploaded (input publish-report).`,
    );
  }
  try {
    return readGateJson(decoded.text, path);
  } catch (error) {
    throw new PublishError(
      `Refusing to publish: ${error instanceof Error ? error.message : String(error)}.`,
    );
  }
}

/** Publish mode: check the report, find its pull request through the API, keep the one comment. */
export async function runPublish(
  deps: PublishDeps,
  settings: Settings & { publishReport: string },
): Promise<void> {
  const { env, out, api } = deps;
  const eventName = env.GITHUB_EVENT_NAME ?? '';
  if (eventName !== 'workflow_run') {
    throw new PublishError(
      `Input publish-report runs on a workflow_run event (the second workflow of the fork-safe recipe); this run is ${JSON.stringify(eventName)}.`,
    );
  }
  const run = parseWorkflowRun(
    env.GITHUB_EVENT_PATH ? await deps.readJson(env.GITHUB_EVENT_PATH) : {},
  );
  if (!PUBLISHED_EVENTS.includes(run.event)) {
    out.notice(
      `The workflow run ${run.runId} ran on ${JSON.stringify(run.event)}, not on a pull request: nothing to publish.`,
    );
    return;
  }
  if (api === null)
    throw new PublishError(
      'Publish mode needs a token that may comment (input github-token, with pull-requests: write).',
    );

  const report = await readReport(deps, settings.publishReport);
  if (report.head !== run.headSha) {
    throw new PublishError(
      `Refusing to publish: the report judges head ${JSON.stringify(report.head.slice(0, 40))}, but workflow run ${run.runId} ran on ${run.headSha}; a report is published only for the commit its run checked.`,
    );
  }

  const server = env.GITHUB_SERVER_URL ?? 'https://github.com';
  const blobUrl = `${server}/${run.owner}/${run.repo}/blob/${run.headSha}`;
  const pulls = await pullRequestsOfHead(api, run);
  let commentUrl = '';
  if (pulls.length === 1) {
    const body = renderComment(report, { blobUrl });
    const published = await publishComment(api, {
      owner: run.owner,
      repo: run.repo,
      issueNumber: pulls[0]!,
      marker: COMMENT_MARKER,
      body,
    });
    commentUrl = published.comment.url;
    out.info(
      `${published.action === 'created' ? 'Created' : 'Updated'} the report comment on #${pulls[0]}: ${commentUrl}`,
    );
  } else if (pulls.length === 0) {
    out.notice(
      `No open pull request has head ${run.headSha} now (it may have been pushed again or closed): the report of workflow run ${run.runId} was not published.`,
    );
  } else {
    out.warning(
      `Pull requests ${pulls.map((n) => `#${n}`).join(', ')} all have head ${run.headSha}: the report was not published, as it cannot say which one it judged.`,
    );
  }
  await out.summary(fitSummary((limit) => renderComment(report, { blobUrl, limit })));
  out.output('verdict', report.verdict);
  out.output('blocking', String(report.blocking));
  out.output('warnings', String(report.warnings));
  out.output('report-json', settings.publishReport);
  out.output('comment-url', commentUrl);
  out.info(
    `context-reach published verdict: ${report.verdict} (${report.blocking} blocking, ${report.warnings} warnings); the first workflow's check carries the decision.`,
  );
}
