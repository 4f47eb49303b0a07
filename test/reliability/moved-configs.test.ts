import { describe, expect, it } from 'vitest';
import { createGitReader } from '../../src/adapters/git.js';
import { runScenario, type ScenarioResult } from '../support/action-harness.js';
import { checkedFakes } from './checked-scenarios.js';
import { checkpointConfig, scenarioRepo } from '../support/scenario-repo.js';

// Round two (issue 13, point 8): a config moved to another folder and rewritten (minified) is not
// a rename to git, so it was judged as a new file alone and the check passed where the same edit
// in place blocks. Deleted and added model configs are paired by the model they describe.

const FROM = 'models/chat/config.json';
const TO = 'archive/2026/chat-long/config.json';
/** The same keys written on one line, in another order: git's similarity score does not pair them. */
const minified = (overrides: Record<string, unknown> = {}) =>
  JSON.stringify(
    Object.fromEntries(
      Object.entries(JSON.parse(checkpointConfig(overrides)) as Record<string, unknown>).reverse(),
    ),
  );

/** Every fake of a run, checked against GitHub's REST description and closed after each test. */
const { fakes } = checkedFakes();

async function run(
  head: Record<string, string>,
  noHistory = false,
): Promise<{
  result: ScenarioResult;
  report: {
    verdict: string;
    files: {
      path: string;
      status: string;
      previousPath: string | null;
      findings: { rule: string }[];
    }[];
    deleted: unknown[];
  };
}> {
  const result = await runScenario({ base: { [FROM]: checkpointConfig() }, head, noHistory });
  fakes.push(result.fake);
  expect(result.error).toBeNull();
  return { result, report: JSON.parse(Object.values(result.written)[0]!) };
}

describe('a model config moved and minified', () => {
  it('is not a rename to git (the premise)', async () => {
    const repo = scenarioRepo(
      { [FROM]: checkpointConfig() },
      { [TO]: minified({ max_position_embeddings: 16384 }) },
    );
    const changes = await createGitReader(repo.dir).changedFiles(repo.base, repo.head);
    repo.remove();
    expect(changes.map((c) => c.status).sort()).toEqual(['added', 'deleted']);
  });

  it.each([[false], [true]])(
    'with a quadrupled span blocks as the same edit in place does (no history: %s)',
    async (noHistory) => {
      const { report, result } = await run(
        { [TO]: minified({ max_position_embeddings: 16384 }) },
        noHistory,
      );
      expect(report.verdict).toBe('block');
      expect(report.files).toHaveLength(1);
      expect(report.files[0]).toMatchObject({ path: TO, status: 'renamed', previousPath: FROM });
      expect(report.files[0]!.findings.map((f) => f.rule)).toContain('span-grew-code-unchanged');
      expect(report.deleted).toEqual([]);
      expect(result.out.outputs.verdict).toBe('block');
    },
  );

  it('unchanged in content passes, judged as a move, nothing listed as deleted', async () => {
    const { report } = await run({ [TO]: minified() });
    expect(report.verdict).toBe('ok');
    expect(report.files[0]).toMatchObject({ status: 'renamed', previousPath: FROM });
    expect(report.deleted).toEqual([]);
  });

  it('a different model added while another is deleted is not paired', async () => {
    const { report } = await run({ [TO]: minified({ hidden_size: 4096, num_hidden_layers: 32 }) });
    expect(report.files[0]).toMatchObject({ status: 'added', previousPath: null });
    expect(report.deleted).toHaveLength(1);
  });
});
