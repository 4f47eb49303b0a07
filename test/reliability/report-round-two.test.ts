import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as core from '@actions/core';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { forgetSummaryPath } from '../support/summary-path.js';
import { createRunnerOutput, SUMMARY_LIMIT } from '../../src/action/runner-output.js';
import type { GateReport } from '../../src/core/report/types.js';
import { planAnnotations } from '../../src/core/render/annotations.js';
import { renderComment } from '../../src/core/render/comment.js';
import { readGateJson } from '../../src/core/report/read.js';
import { renderHtmlReport } from '../../src/core/render/html-report.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { renderSarif } from '../../src/core/render/sarif.js';
import { gateOver } from '../support/demo-gate.js';
import { OWNER, REPO, runScenario, type ScenarioResult } from '../support/action-harness.js';
import type { FakeGitHub } from '../support/fake-github.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import { addClosedPullOfSameHead, publishInProcess, tamperedReport } from './publish-recipe.js';
import { renderGfm } from './report-checks.js';

// Round two of the report as an attack surface (issue 13, points 1, 9 and 11): every field a
// publish run reads back is checked to its type and range, a closed pull request gets nothing,
// a forged `..` path is never linked, SARIF locations are URI references, bidirectional controls
// in a name are shown, and the job summary fits GitHub's limit in bytes, not characters (the
// summary of 3,000 configs is in report-round-two.slow.test.ts, `npm run test:full`).

const MODEL = 'models/a/config.json';
const BLOCKING = {
  base: { [MODEL]: checkpointConfig() },
  head: { [MODEL]: checkpointConfig({ max_position_embeddings: 16384 }) },
};

let first: ScenarioResult;
let fake: FakeGitHub;
let reportText: string;
let folder: string;

function workflowRun(pullNumbers: number[] = []) {
  return {
    action: 'completed',
    workflow_run: {
      id: 4343,
      name: 'context-reach',
      event: 'pull_request',
      status: 'completed',
      conclusion: 'failure',
      head_sha: first.head,
      head_branch: 'feature',
      head_repository: { full_name: `someone-else/${REPO}`, owner: { login: 'someone-else' } },
      pull_requests: pullNumbers.map((number) => ({ number })),
    },
    repository: { name: REPO, full_name: `${OWNER}/${REPO}`, owner: { login: OWNER } },
  };
}

const publish = (report: string, payload: unknown = workflowRun()) =>
  publishInProcess(fake, folder, report, payload);

const tampered = (change: Parameters<typeof tamperedReport>[1]) =>
  tamperedReport(reportText, change);

const ours = () => fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));

beforeAll(async () => {
  folder = mkdtempSync(join(tmpdir(), 'context-reach-round-two-'));
  first = await runScenario({
    ...BLOCKING,
    fork: true,
    readOnly: true,
    inputs: { comment: 'off' },
  });
  fake = first.fake;
  reportText = Object.values(first.written)[0]!;
  fake.state.readOnly = false;
  // The same head in a closed pull request: the payload may name it, GitHub says it is closed.
  fake.state.pulls.delete(7);
  addClosedPullOfSameHead(first);
}, 60_000);

afterAll(async () => {
  if (folder) rmSync(folder, { recursive: true, force: true });
  expect(fake.mismatches).toEqual([]);
  expect(fake.unhandled).toEqual([]);
  await fake?.close();
});

describe('publish mode reads back every field to its type and range (point 1)', () => {
  it.each([
    [
      'a rule id with a backtick and markup',
      (r: { files: { findings: { rule: string }[] }[] }) => {
        r.files[0]!.findings[0]!.rule = 'x` ![t](https://evil.example/p.png) <b>@someone</b> `y';
      },
      /\/files\/0\/findings\/0\/rule is "x` !\[t\].*; expected one of "config-unreadable"/,
    ],
    [
      'a rule id not in the catalogue',
      (r: { files: { findings: { rule: string }[] }[] }) => {
        r.files[0]!.findings[0]!.rule = 'made-up-rule';
      },
      /\/files\/0\/findings\/0\/rule is "made-up-rule"/,
    ],
    [
      'a base that is not a commit id',
      (r: Record<string, unknown>) => {
        r.base = '` ## Passes `';
      },
      /\/base is "` ## Passes `"; expected must match pattern/,
    ],
    [
      'a head that is not a commit id',
      (r: Record<string, unknown>) => {
        r.head = `${first.head}\` @x`;
      },
      /\/head is .*; expected must match pattern/,
    ],
    [
      'a remedy raising text that is no rule',
      (r: { files: { findings: { remedy?: { raises: string[] } | null }[] }[] }) => {
        r.files[0]!.findings.find((f) => f.remedy)!.remedy!.raises = ['`<img src=x>`'];
      },
      /\/remedy\/raises\/0 is "`<img src=x>`"; expected must match pattern/,
    ],
    [
      'a path with a `..` segment',
      (r: { files: { path: string }[] }) => {
        r.files[0]!.path = 'models/../../../settings/config.json';
      },
      /\/files\/0\/path is "models\/\.\.\/\.\.\/\.\.\/settings\/config\.json"; expected must match pattern/,
    ],
  ])('refuses %s, naming the field, and touches no comment', (_, change, expected) => {
    const error = (() => {
      try {
        readGateJson(tampered(change as never), 'report.json');
        return null;
      } catch (e) {
        return e as Error;
      }
    })();
    expect(error?.message).toMatch(expected);
  });

  it('the action refuses such a report: no comment, no summary', async () => {
    const { error, out } = await publish(
      tampered((r) => {
        (r.files[0]!.findings as { rule: string }[])[0]!.rule =
          'x` ![t](https://evil.example/p.png) `y';
      }),
      workflowRun([7]),
    );
    expect((error as Error).message).toMatch(
      /^Refusing to publish: .*\/files\/0\/findings\/0\/rule is /,
    );
    expect(fake.state.comments).toHaveLength(0);
    expect(out.summaries).toEqual([]);
  });

  it('the untampered report still reads back and renders its rule ids as code', () => {
    const report = readGateJson(reportText, 'report.json');
    const html = renderGfm(renderComment(report));
    expect(html).toContain('<code>span-grew-code-unchanged</code>');
    expect(html).not.toMatch(/<img|<a /);
  });
});

describe('publish mode and closed pull requests (point 11)', () => {
  it("posts nothing to a closed pull request that has the run's head, even when the payload names it", async () => {
    const { error, out } = await publish(reportText, workflowRun([9]));
    expect(error).toBeNull();
    expect(fake.state.comments.filter((c) => c.issueNumber === 9)).toHaveLength(0);
    expect(ours()).toHaveLength(0);
    expect(
      out.log.some((l) => l.level === 'notice' && /No open pull request has head/.test(l.message)),
    ).toBe(true);
  });
});

describe('names from a pull request in links, SARIF and text (point 11)', () => {
  let report: GateReport;
  beforeAll(async () => {
    report = (await gateOver(BLOCKING.base, BLOCKING.head)).report;
  }, 30_000);

  const withPath = (path: string): GateReport => ({
    ...report,
    files: report.files.map((f) => ({
      ...f,
      path,
      findings: f.findings.map((x) => ({ ...x, file: path })),
    })),
  });

  it('never links a forged path with `..` segments (the link would reach another page of the host)', () => {
    const body = renderComment(withPath('models/../../../../settings/tokens'), {
      blobUrl: 'https://github.example/o/r/blob/0123456789012345678901234567890123456789',
    });
    const html = renderGfm(body);
    const hrefs = [...html.matchAll(/href="([^"]*)"/g)].map((m) => m[1]!);
    expect(hrefs.filter((h) => h.includes('..') || h.includes('%2e') || h.includes('%2E'))).toEqual(
      [],
    );
    expect(body).toContain('line ');
    // A real path is still linked.
    expect(
      renderGfm(
        renderComment(report, {
          blobUrl: 'https://github.example/o/r/blob/0123456789012345678901234567890123456789',
        }),
      ),
    ).toMatch(
      /href="https:\/\/github\.example\/o\/r\/blob\/0{0}0123456789012345678901234567890123456789\/models\/a\/config\.json#L\d+"/,
    );
  });

  it.each([
    ['a#frag/config.json', 'a%23frag/config.json'],
    ['q?x=1/config.json', 'q%3Fx%3D1/config.json'],
    ['m/%2f..%2fsecret/config.json', 'm/%252f..%252fsecret/config.json'],
    ['sp ace/config.json', 'sp%20ace/config.json'],
  ])(
    'writes the SARIF location of %s as a URI reference (RFC 3986) that resolves to the same name',
    (path, uri) => {
      const sarif = JSON.parse(renderSarif(withPath(path), '0.0.0'));
      const locations = sarif.runs[0].results.map(
        (r: { locations: { physicalLocation: { artifactLocation: { uri: string } } }[] }) =>
          r.locations[0]!.physicalLocation.artifactLocation.uri,
      );
      expect(locations.length).toBeGreaterThan(0);
      for (const location of locations) {
        expect(location).toBe(uri);
        // Resolved against a base URI, as a SARIF viewer does: the path comes back whole, no fragment, no query.
        const resolved = new URL(location, 'file:///src/');
        expect(resolved.hash).toBe('');
        expect(resolved.search).toBe('');
        expect(decodeURIComponent(resolved.pathname.slice('/src/'.length))).toBe(path);
      }
    },
  );

  it('shows bidirectional controls in a name as <U+XXXX> in the comment, HTML report, SARIF, annotations and log', () => {
    // "abc‮nosj.gifnoc" would read as "abccong.json" with the override obeyed.
    const path = 'models/abc\u202enosj.gifnoc/config.json';
    const hostile = withPath(path);
    hostile.files[0]!.findings[0]!.message = `${path} \u2066hidden\u2069 and \u200f`;
    const comment = renderComment(hostile, {
      blobUrl: 'https://github.example/o/r/blob/0123456789012345678901234567890123456789',
    });
    const html = renderHtmlReport(hostile);
    const sarif = renderSarif(hostile, '0.0.0');
    const annotations = planAnnotations(hostile).annotations;
    const BIDI = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/;
    // In a link target the name is percent-encoded; in every text it is shown.
    expect(comment.replace(/\]\([^)]*\)/g, '')).not.toMatch(BIDI);
    expect(renderGfm(comment).replace(/href="[^"]*"/g, '')).not.toMatch(BIDI);
    expect(renderGfm(comment)).toContain('&lt;U+202E&gt;nosj');
    expect(html).not.toMatch(BIDI);
    expect(html).toContain('&lt;U+202E&gt;');
    expect(JSON.parse(sarif).runs[0].results[0].message.text).toContain('<U+2066>hidden<U+2069>');
    expect(annotations[0]!.message).not.toMatch(BIDI);
    expect(annotations[0]!.file).toBe(path);
  });

  it('shows them in the log and workflow commands the runner prints', () => {
    const lines: string[] = [];
    const write = process.stdout.write.bind(process.stdout);
    (process.stdout as { write: unknown }).write = (chunk: string) => {
      lines.push(String(chunk));
      return true;
    };
    try {
      const out = createRunnerOutput(core);
      out.warning('models/abc\u202enosj.gifnoc/config.json is not a model');
      out.info('read \u2067x\u2069');
    } finally {
      (process.stdout as { write: unknown }).write = write;
    }
    expect(lines.join('')).toContain('abc<U+202E>nosj');
    expect(lines.join('')).toContain('<U+2067>x<U+2069>');
  });
});

describe("the job summary fits GitHub's 1 MiB in bytes (point 9)", () => {
  it('the summary writer cuts any longer text by bytes, at a character boundary', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'context-reach-summary-'));
    const path = join(dir, 'summary.md');
    writeFileSync(path, '');
    vi.stubEnv('GITHUB_STEP_SUMMARY', path);
    forgetSummaryPath();
    try {
      await createRunnerOutput(core).summary('é模'.repeat(400_000));
    } finally {
      vi.unstubAllEnvs();
      forgetSummaryPath();
    }
    const written = readFileSync(path);
    const size = statSync(path).size;
    rmSync(dir, { recursive: true, force: true });
    expect(size).toBeLessThanOrEqual(SUMMARY_LIMIT);
    expect(new TextDecoder('utf-8', { fatal: true }).decode(written)).toContain('cut at GitHub');
  });
});
