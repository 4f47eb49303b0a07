import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { run } from '../../src/cli/run.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { runScenario, type ScenarioResult } from '../support/action-harness.js';
import { demoTrees } from '../support/demo-gate.js';
import { scenarioRepo } from '../support/scenario-repo.js';

// The two places the HTML report is written: `context-reach diff --html FILE` and the action's
// `html-report` input (linked from the comment).

describe('context-reach diff --html FILE', () => {
  it('writes the standalone page next to the usual output and keeps the exit status', async () => {
    const { base, head } = demoTrees();
    const repo = scenarioRepo(base, head);
    const out: string[] = [];
    const dir = mkdtempSync(join(tmpdir(), 'context-reach-html-'));
    const file = join(dir, 'nested', 'report.html');
    try {
      const status = await run(['diff', '--base', repo.base, '--head', repo.head, '--html', file], {
        files: { read: async () => new Uint8Array() },
        io: {
          out: (t) => out.push(t),
          error: (t) => out.push(t),
          stdout: {},
          env: { NO_COLOR: '1' },
          cwd: repo.dir,
        },
      });
      expect(status).toBe(1);
      const html = readFileSync(file, 'utf8');
      expect(html.startsWith('<!doctype html>')).toBe(true);
      expect(html.match(/<section class="file"/g)).toHaveLength(2);
      expect(out.join('')).toContain('fix: model.position.scaling.factor 4 → 8');
    } finally {
      repo.remove();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe("the action's html-report input", () => {
  let result: ScenarioResult | null = null;
  afterEach(async () => {
    await result?.fake.close();
    result = null;
  });

  it('writes the page through the adapter and links it from the comment and the summary', async () => {
    const { base, head } = demoTrees();
    result = await runScenario({
      base,
      head,
      inputs: {
        'html-report': '/runner/out/context-reach.html',
        'html-report-url': 'https://reports.example/pr-7.html',
      },
    });
    expect(result.error).toBeNull();
    const html = result.written['/runner/out/context-reach.html'];
    expect(html?.startsWith('<!doctype html>')).toBe(true);
    const comment = result.fake.state.comments.find((c) => c.body.startsWith(COMMENT_MARKER))!.body;
    expect(comment).toContain(
      'Charts, findings and fixes: [the HTML report](https://reports.example/pr-7.html).',
    );
    expect(result.out.summaries[0]).toContain('(https://reports.example/pr-7.html)');
  });

  it('writes no page and no link without the input', async () => {
    const { base, head } = demoTrees();
    result = await runScenario({ base, head });
    expect(Object.keys(result.written).some((p) => p.endsWith('.html'))).toBe(false);
    expect(result.out.summaries[0]).not.toContain('the HTML report');
  });
});
