import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { GateReport } from '../../src/core/report/types.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';
import { runScenario, type ScenarioResult } from '../support/action-harness.js';
import { checkpointConfig, type Tree } from '../support/scenario-repo.js';
import { markdownProblems, renderGfm } from './report-checks.js';

// The report as an attack surface: file names, keys, values, a waiver label and notices written
// to inject markup, through the whole action (real git, the loopback API) into the full comment
// and the job summary, rendered by a GFM renderer (marked). No injected element, mention,
// reference, link or comment survives, the hidden marker appears once, and tables keep their shape.
// A file name that spells workflow commands, through the bundled action, is in
// report-injection.bundle.test.ts (`npm run test:full`).

/** Folder names a pull request can choose (anything but "/" and NUL). */
const HOSTILE_NAMES = [
  'a|b|c',
  '`tick` ``two``',
  '<script>alert(1)',
  '<img src=x onerror=alert(1)>',
  '@someone and @org',
  '#123 and GH-7',
  '[click](https:evil.example) ![img](https:evil.example)',
  'https:⁄⁄evil.example www.evil.example',
  COMMENT_MARKER,
  '<!-- hidden',
  '**bold** _em_ ~~strike~~',
  '&lt;script&gt; &#35;1',
  // A ")" would end a link's destination early; what follows must not become a link or emphasis.
  'a)www.evil.example **b** ~~c~~',
];

const HOSTILE_VALUE =
  '<img src=x onerror=alert(1)> @someone #123 [x](https://evil.example) <!-- context-reach:pull-request-report -->';
const LABEL = '<script>@someone #9</script>';
const POLICY = `waiver-label: ${JSON.stringify(LABEL)}\nlimits:\n  cachePerTokenBytes: { max: 1000 }\n`;

function trees(): { base: Tree; head: Tree } {
  const base: Tree = { '.github/context-reach.yml': POLICY };
  const head: Tree = { '.github/context-reach.yml': POLICY };
  HOSTILE_NAMES.forEach((name, i) => {
    const path = `models/${name}/config.json`;
    base[path] = checkpointConfig({ hidden_size: 2048 + i * 0 });
    head[path] = checkpointConfig({
      max_position_embeddings: 8192,
      [`${name} key`]: HOSTILE_VALUE,
      ...(i % 2 === 0 ? { hidden_size: HOSTILE_VALUE } : {}),
    });
  });
  // A rename from a hostile name (same text but the span, so git pairs the two), a deletion of
  // one, an unknown hostile key in the own dialect, and a file the default globs pick that is not
  // a model (a notice quotes its path).
  const own = (span: number) =>
    `format: context-reach-model/1\nmodel:\n  name: renamed-model\n  layers: 24\n  hidden: 2048\n  heads: 16\n  kv-heads: 4\n  vocab: 32000\n  feed-forward: { size: 5632, gated: true }\n  position: { code: rotary, base: 10000 }\n  declared-span: ${span}\n  dtypes: { weights: bf16 }\n`;
  base[`models/old ${HOSTILE_NAMES[2]}/model.reach.yaml`] = own(2048);
  head[`models/new ${HOSTILE_NAMES[3]}/model.reach.yaml`] = own(4096);
  head[`models/keys ${HOSTILE_NAMES[5]}/model.reach.yaml`] =
    `format: context-reach-model/1\nmodel:\n  layers: 2\n  hidden: 256\n  heads: 4\n  vocab: 1000\n  declared-span: 4096\n  ${JSON.stringify(HOSTILE_VALUE)}: 1\n`;
  base[`models/gone ${HOSTILE_NAMES[8]}/config.json`] = checkpointConfig();
  head[`web/${HOSTILE_NAMES[4]}/config.json`] = '{"port": 8080}\n';
  return { base, head };
}

let result: ScenarioResult;
let report: GateReport;
const LINK = /^https:\/\/github\.example\/example-org\/model-zoo\/blob\/[0-9a-f]{40}\/models\//;

beforeAll(async () => {
  const { base, head } = trees();
  result = await runScenario({ base, head, labels: [LABEL] });
  report = JSON.parse(Object.values(result.written)[0]!) as GateReport;
}, 60_000);

afterAll(async () => {
  await result?.fake.close();
});

describe('renderComment(report) of a pull request written to inject markup, as the action posts it', () => {
  it('judged every hostile path (the names reached the report, as data)', () => {
    expect(result.error).toBeNull();
    for (const name of HOSTILE_NAMES)
      expect(report.files.map((f) => f.path)).toContain(`models/${name}/config.json`);
    expect(report.files.some((f) => f.previousPath?.includes(HOSTILE_NAMES[2]!))).toBe(true);
    expect(report.deleted.map((d) => d.path)).toContain(
      `models/gone ${HOSTILE_NAMES[8]}/config.json`,
    );
    expect(report.waiver.applied).toBe(true);
    expect(report.notices.some((n) => n.includes(HOSTILE_NAMES[4]!))).toBe(true);
    // Hostile values are quoted in the findings (so they are in the comment, escaped).
    expect(report.files.flatMap((f) => f.findings).some((f) => f.message.includes('onerror'))).toBe(
      true,
    );
  });

  it('posts one comment that starts with the marker and holds it nowhere else', () => {
    const ours = result.fake.state.comments.filter((c) => c.body.startsWith(COMMENT_MARKER));
    expect(ours).toHaveLength(1);
    expect(ours[0]!.body.split(COMMENT_MARKER)).toHaveLength(2);
  });

  it('renders through GFM with no injected element, attribute, link, comment, mention or reference, and tables intact', () => {
    const body = result.fake.state.comments[0]!.body;
    expect(markdownProblems(body, report, LINK)).toEqual([]);
    const html = renderGfm(body);
    expect(html).not.toMatch(/<(script|img|iframe|svg|style)\b/i);
    expect(html.match(/<table>/g)?.length ?? 0).toBeGreaterThan(HOSTILE_NAMES.length);
  });

  it('keeps the job summary just as clean', () => {
    expect(markdownProblems(result.out.summaries[0]!, report, LINK)).toEqual([]);
  });

  it('still shows each hostile name, readable, as text', () => {
    const text = renderGfm(result.fake.state.comments[0]!.body)
      .replace(/<[^>]+>/g, '')
      .replace(/\u200b/g, '')
      .replace(/&lt;/g, '<')
      .replace(/&gt;/g, '>')
      .replace(/&quot;/g, '"')
      .replace(/&#39;/g, "'")
      .replace(/&#124;/g, '|')
      .replace(/&#35;/g, '#')
      .replace(/&amp;/g, '&');
    for (const name of [
      'a|b|c',
      '<script>alert(1)',
      '<img src=x onerror=alert(1)>',
      '@someone and @org',
      '#123 and GH-7',
      COMMENT_MARKER,
    ]) {
      expect(text).toContain(name);
    }
  });
});
