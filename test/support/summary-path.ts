import * as core from '@actions/core';

/**
 * Makes `@actions/core` look up `GITHUB_STEP_SUMMARY` again. The toolkit's summary keeps the path
 * of the first summary file it finds (its private `_filePath`) for the life of the process: right
 * for one action run, but the test files of a worker share the module (`isolate: false`), so a
 * test that points the summary at a file of its own forgets the path before and after.
 */
export function forgetSummaryPath(): void {
  (core.summary as unknown as { _filePath?: string })._filePath = undefined;
}
