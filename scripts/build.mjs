// Builds the committed bundles (dist/cli.js, dist/index.js, and the chunks they load when needed) with @vercel/ncc and regenerates the
// README's action input/output tables from action.yml. CI rebuilds and fails when dist/ differs.
import { createRequire } from 'node:module';
import { existsSync } from 'node:fs';
import { cp, mkdir, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { renderActionTables } from './action-tables.mjs';
import { buildInputs } from './build-inputs.mjs';
import { writeKernel } from './generate-kernel.mjs';
import { writeValidators } from './generate-validators.mjs';

const require = createRequire(import.meta.url);
const ncc = require('@vercel/ncc');
const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const dist = join(root, 'dist');

const bundles = [
  { entry: 'src/cli/main.ts', out: 'cli.js' },
  { entry: 'src/action/main.ts', out: 'index.js' },
];

/**
 * ncc minifies the entry's code but not the chunks of dynamic imports. A chunk is an ES module
 * that imports nothing and exports `id`, `ids` and `modules`, so bundling it again on its own,
 * minified, gives the same module in fewer bytes (and start-up is compile time, see below).
 */
async function minifyChunk(name, source) {
  const header = source.slice(0, Math.max(0, source.indexOf('export const modules')));
  if (/^\s*import\s/m.test(header) || !header.includes('export const ids'))
    throw new Error(`chunk ${name} imports other modules; expected a self-contained webpack chunk`);
  const dir = await mkdtemp(join(tmpdir(), 'context-reach-chunk-'));
  try {
    const file = join(dir, name.replace(/\.js$/, '.mjs'));
    await writeFile(file, source);
    const { code } = await ncc(file, {
      minify: true,
      sourceMap: false,
      quiet: true,
      target: 'es2022',
      esm: true,
    });
    return code;
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

// The schema validators, compiled from schema/*.schema.json ahead of time, before the bundles take them in.
for (const out of writeValidators(root)) console.log(`wrote ${out}`);
// The WebAssembly cosine-sum kernel, assembled from its text the same way.
console.log(`wrote ${await writeKernel(root)}`);

await rm(dist, { recursive: true, force: true });
await mkdir(dist, { recursive: true });
for (const { entry, out } of bundles) {
  if (!existsSync(join(root, entry))) continue;
  // Minified: start-up is dominated by compiling the bundle, and half the text compiles in half the time.
  // `filename` names the chunks of dynamic imports `<id>.<out>`, so the two bundles' chunks never collide.
  const { code, assets } = await ncc(join(root, entry), {
    minify: true,
    sourceMap: false,
    quiet: true,
    target: 'es2022',
    filename: out,
  });
  await writeFile(join(dist, out), code);
  for (const [name, asset] of Object.entries(assets ?? {})) {
    if (name === 'package.json') continue;
    const target = join(dist, name);
    await mkdir(dirname(target), { recursive: true });
    await writeFile(
      target,
      name.endsWith(`.${out}`) ? await minifyChunk(name, String(asset.source)) : asset.source,
    );
  }
  const chunks = Object.keys(assets ?? {}).filter((name) => name !== 'package.json');
  console.log(
    `built dist/${out} (${Math.round(code.length / 1024)} KiB${chunks.length > 0 ? `; loaded when needed: ${chunks.sort().join(', ')}` : ''})`,
  );
}
await writeFile(join(dist, 'package.json'), `${JSON.stringify({ type: 'module' }, null, 2)}\n`);

// `demo` runs from an installed package too: its invented pull request ships inside dist/, where
// the CLI looks for `fixtures/demo` next to itself.
await cp(join(root, 'fixtures', 'demo'), join(dist, 'fixtures', 'demo'), { recursive: true });
// What dist/ was built from (scripts/build-inputs.mjs): the package test refuses an older dist/.
await writeFile(
  join(dist, 'build-info.json'),
  `${JSON.stringify({ inputs: buildInputs(root) }, null, 2)}\n`,
);
console.log('copied fixtures/demo to dist/fixtures/demo (the demo of an installed package)');

// schema/report.schema.json is written from the code's own schema of the report, so the two never drift.
{
  const dir = await mkdtemp(join(tmpdir(), 'context-reach-schema-'));
  try {
    const { code } = await ncc(join(root, 'src/core/report/schema.ts'), {
      minify: false,
      sourceMap: false,
      quiet: true,
      target: 'es2022',
    });
    const file = join(dir, 'report-schema.mjs');
    await writeFile(file, code);
    const { publishedReportSchema } = await import(pathToFileURL(file).href);
    await writeFile(
      join(root, 'schema', 'report.schema.json'),
      `${JSON.stringify(publishedReportSchema(), null, 2)}\n`,
    );
    console.log('wrote schema/report.schema.json');
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

if (existsSync(join(root, 'action.yml'))) {
  const readmePath = join(root, 'README.md');
  const readme = await readFile(readmePath, 'utf8');
  const next = renderActionTables(readme, await readFile(join(root, 'action.yml'), 'utf8'));
  if (next !== readme) {
    await writeFile(readmePath, next);
    console.log("updated the README's inputs and outputs tables from action.yml");
  }
}
