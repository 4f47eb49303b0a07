import { describe, expect, test } from 'vitest';
import { PULL_REQUEST_FILE_CAP } from '../../src/adapters/github-rest.js';
import { addPull, client, fake, OWNER, REPO, useFakeGitHub } from './github-fixture.js';

// The REST adapter's file list at GitHub's 3,000-file cap (github.test.ts has the rest): thirty
// pages of a hundred files, each checked against GitHub's REST description, make these slow
// (`npm run test:full`).

useFakeGitHub();

describe('listPullRequestFiles(owner, repo, number) at the cap', () => {
  test('flags truncated when GitHub stops at its 3,000-file cap', async () => {
    addPull(
      9,
      Array.from({ length: 3500 }, (_, i) => ({
        filename: `f${i}.json`,
        status: 'added' as const,
      })),
    );
    const { files, truncated } = await client().listPullRequestFiles(OWNER, REPO, 9);
    expect(PULL_REQUEST_FILE_CAP).toBe(3000);
    expect(files).toHaveLength(3000);
    expect(truncated).toBe(true);
    expect(fake.calls('pulls/list-files')).toHaveLength(30);
  });

  test('is not truncated one file below the cap', async () => {
    addPull(
      10,
      Array.from({ length: 2999 }, (_, i) => ({
        filename: `f${i}.json`,
        status: 'added' as const,
      })),
    );
    const { files, truncated } = await client().listPullRequestFiles(OWNER, REPO, 10);
    expect(files).toHaveLength(2999);
    expect(truncated).toBe(false);
  });
});
