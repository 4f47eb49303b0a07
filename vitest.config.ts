import { availableParallelism } from 'node:os';
import { defineConfig } from 'vitest/config';

/**
 * Two projects. `unit` (`npm test`): every test that needs only Node, git and the sources, cheap
 * enough for the edit-test loop (no build of dist/ needed). `full` (`npm run test:full`, run by
 * `.ci/run` after the build and after it installs Chromium and numpy): the tests that need more,
 * or take minutes, named by suffix so a file's name says where it runs. Together they hold every
 * test file once. Property runs and reference comparisons keep a sample in `unit` (a file of their
 * own, sharing the property with the full run's file).
 */
const FULL = [
  // The 10,000-case property runs (a sample of the same properties runs in `unit`).
  'test/**/*.property.test.ts',
  // The HTML report in Debian's Chromium, through playwright-core.
  'test/**/*.browser.test.ts',
  // Reference values computed by python3 with numpy.
  'test/**/*.numpy.test.ts',
  // `npm pack`, then an install of the tarball into an empty project.
  'test/**/*.pack.test.ts',
  // The bundles (dist/cli.js, dist/index.js) run as a user or the runner runs them: they need a
  // build of the current sources (test/support/fresh-bundle.ts), which CI makes before the tests.
  'test/**/*.bundle.test.ts',
  // Work-heavy by design: thousands of files in one pull request, inputs of megabytes, reference
  // loops over 2^24 positions.
  'test/**/*.slow.test.ts',
];

export default defineConfig({
  test: {
    testTimeout: 30_000,
    // vitest's default on a run is one worker fewer than the cores: one worker on a 2-core
    // machine, which leaves a core idle while a test waits on git. One worker per core: measured
    // on 2 cores (2026-12-02, 19:11-19:20 UTC, three pairs, fresh transform cache each run),
    // 2 workers took 57.9 s, 49.4 s and 48.7 s where 4 took 62.1 s, 49.9 s and 52.1 s (each
    // worker loads the sources, GitHub's REST description and its validators once), and 3 took
    // 62.6 s beside the first pair. The same commit's runs spread over 49-62 s as the host's
    // load changed: compare figures taken side by side.
    maxWorkers: availableParallelism(),
    // Transformed modules are kept under node_modules/.experimental-vitest-cache between runs (a
    // fresh `npm ci` starts without them): a second run transforms in 3.8 s instead of 17 s.
    experimental: { fsModuleCache: true },
    globalSetup: ['test/support/temp-root.ts'],
    coverage: {
      provider: 'v8',
      include: ['src/core/**/*.ts'],
      // The validators ajv generates from schema/*.schema.json and the kernel wabt assembles from
      // its .wat at build time: machine-written, and held to their sources by
      // test/policy/schema-options.test.ts and test/metrics/cosine-sum-kernel.test.ts.
      exclude: ['src/core/**/*.generated.ts'],
      reporter: ['text-summary', 'json-summary'],
      // The floor for `npm test -- --coverage` (what .ci/run runs), about a point under what the
      // unit project covered of src/core on 2026-12-02 (16:10 UTC): statements 93.49 %, branches
      // 86 %, functions 97.75 %, lines 95.75 % (of 6,933 statements). A change that leaves some 100
      // more statements, branches or lines, or 20 more functions, of the core untested fails;
      // raise the floor when coverage rises.
      thresholds: { statements: 92, branches: 84, functions: 96, lines: 94 },
    },
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['test/**/*.test.ts'],
          exclude: FULL,
          // A worker loads src/, the OpenAPI description and the test helpers once for all the
          // files it runs, not once per file: that loading was half the CPU time of the small
          // files. Test files share modules, so a file restores what it changes (environment
          // variables, PATH, spies) before it ends; no file here mocks modules.
          isolate: false,
        },
      },
      {
        extends: true,
        test: { name: 'full', include: FULL, testTimeout: 600_000 },
      },
    ],
  },
});
