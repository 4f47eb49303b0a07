// The fingerprint of what dist/ is built from: SHA-256 over the paths and bytes of src/,
// fixtures/demo/, schema/policy.schema.json, package-lock.json and the build script. The build
// writes it to dist/build-info.json; the package test compares, so it never packs an old dist/.
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';

const INPUTS = [
  'src',
  'fixtures/demo',
  'schema/policy.schema.json',
  'package-lock.json',
  'scripts/build.mjs',
];

function files(root, path) {
  const full = join(root, path);
  if (!statSync(full).isDirectory()) return [path];
  return readdirSync(full)
    .sort()
    .flatMap((name) => files(root, join(path, name)));
}

/** `sha256:<hex>` of the build's inputs under `root`. */
export function buildInputs(root) {
  const hash = createHash('sha256');
  for (const path of INPUTS.flatMap((input) => files(root, input))) {
    hash
      .update(relative(root, join(root, path)).split('\\').join('/'))
      .update('\0')
      .update(readFileSync(join(root, path)))
      .update('\0');
  }
  return `sha256:${hash.digest('hex')}`;
}
