/**
 * The tests that run the bundles (dist/cli.js, dist/index.js) as a user or the runner does must
 * never run an old build. The build writes the fingerprint of its inputs (scripts/build-inputs.mjs:
 * src/, fixtures/demo/, the lockfile, the build script) to dist/build-info.json; before a bundle
 * runs, the fingerprint of the sources here is compared with it, and a difference fails the test
 * with the fix. Checking costs a few milliseconds; building here instead would cost about a minute
 * of CPU and rewrite committed files (dist/, schema/, the README's tables) in the middle of a test
 * run, so the tests leave building to `npm run build` (which `.ci/run` runs before them).
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
// @ts-expect-error: a plain ES module script without types
import { buildInputs } from '../../scripts/build-inputs.mjs';

const ROOT = resolve(import.meta.dirname, '../..');
const BUILD_INFO = resolve(ROOT, 'dist/build-info.json');

/** Why dist/ cannot be trusted (null: built from these sources), computed once per test file. */
let stale: string | null | undefined;

function staleness(): string | null {
  let built: string;
  try {
    built = (JSON.parse(readFileSync(BUILD_INFO, 'utf8')) as { inputs: string }).inputs;
  } catch (error) {
    return `dist/build-info.json cannot be read (${(error as Error).message}): run \`npm run build\` before the tests that run the bundles.`;
  }
  const sources = buildInputs(ROOT) as string;
  return built === sources
    ? null
    : `dist/ was built from other sources (dist/build-info.json: ${built}; src/, fixtures/demo/, package-lock.json and scripts/build.mjs here: ${sources}): run \`npm run build\` so this test does not run an old bundle.`;
}

/** `bundle` (a path under dist/), once dist/ is known to be built from the sources here; throws otherwise. */
export function freshBundle(bundle: string): string {
  stale ??= staleness();
  if (stale) throw new Error(stale);
  return bundle;
}
