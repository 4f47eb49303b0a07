/**
 * Global setup: the tests' temporary files go under one folder of their own, removed when the run
 * ends, so a run leaves nothing behind in the temporary folder even when a test stops half-way
 * (tests clean up after themselves as well). TMPDIR is what `os.tmpdir()` and `mktemp` read; the
 * test workers and the processes they start inherit it.
 *
 * The folder is in memory (/dev/shm) when TMPDIR is not set and /dev/shm has room for the largest
 * test file (100 MiB) many times over: the tests create thousands of small files and git
 * repositories, which a disk shared with other work makes slow. Otherwise it is in `os.tmpdir()`.
 */
import { accessSync, constants, mkdtempSync, rmSync, statfsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const MIN_FREE_BYTES = 2 * 1024 ** 3;

function base(): string {
  if (process.env.TMPDIR) return tmpdir();
  try {
    accessSync('/dev/shm', constants.W_OK);
    const fs = statfsSync('/dev/shm');
    if (fs.bavail * fs.bsize >= MIN_FREE_BYTES) return '/dev/shm';
  } catch {
    // No /dev/shm (macOS, Windows) or not writable: the usual temporary folder.
  }
  return tmpdir();
}

export default function setup(): () => void {
  // The root config and each project that extends it run global setup: one folder serves all.
  if (process.env.CONTEXT_REACH_TEST_TMP) return () => {};
  const previous = process.env.TMPDIR;
  const root = mkdtempSync(join(base(), 'context-reach-tests-'));
  process.env.TMPDIR = root;
  process.env.CONTEXT_REACH_TEST_TMP = root;
  return () => {
    delete process.env.CONTEXT_REACH_TEST_TMP;
    if (previous === undefined) delete process.env.TMPDIR;
    else process.env.TMPDIR = previous;
    rmSync(root, { recursive: true, force: true });
  };
}
