import { cp, mkdtemp, readdir, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { createGitReader, gitContentSource } from '../adapters/git.js';
import { runGate } from '../core/gate.js';
import type { Console } from './console.js';
import { renderReport, writeHtmlReport } from './diff.js';
import { createScratchRepository } from './scratch-repository.js';

/** The bundled demo: `fixtures/demo` above this file, found from the source tree or from `dist/`. */
async function findDemo(): Promise<string> {
  let folder = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 6; i += 1) {
    const candidate = join(folder, 'fixtures', 'demo');
    if (
      await stat(join(candidate, 'base')).then(
        () => true,
        () => false,
      )
    )
      return candidate;
    folder = resolve(folder, '..');
  }
  throw new Error('the bundled demo (fixtures/demo) was not found next to this program');
}

async function replaceTree(repo: string, from: string): Promise<void> {
  for (const entry of await readdir(repo))
    if (entry !== '.git') await rm(join(repo, entry), { recursive: true, force: true });
  await cp(from, repo, { recursive: true });
}

/**
 * `demo`: builds a scratch git repository from the demo's base and head trees (an invented pull
 * request), runs the gate on it and prints the comment as it would appear. Always exits 0: a showcase.
 */
export async function runDemo(args: string[], io: Console): Promise<number> {
  const { values } = parseArgs({
    args,
    strict: true,
    options: { format: { type: 'string' }, keep: { type: 'boolean' }, html: { type: 'string' } },
  });
  const format = (values.format ?? 'markdown') as 'markdown' | 'text' | 'json';
  const demo = await findDemo();
  const repo = await mkdtemp(join(tmpdir(), 'context-reach-demo-'));
  try {
    const scratch = createScratchRepository(repo);
    await scratch.init();
    await replaceTree(repo, join(demo, 'base'));
    const base = await scratch.commitAll('Quillmoor main before the pull request');
    await replaceTree(repo, join(demo, 'head'));
    const head = await scratch.commitAll(
      'Serve Quill Mini at 256k and give Quill 8B a longer context',
    );
    const git = createGitReader(repo);
    const report = await runGate(gitContentSource(git), {
      base,
      head,
      changes: await git.changedFiles(base, head),
      policyPath: '.github/context-reach.yml',
    });
    io.out(
      renderReport(report, ['markdown', 'text', 'json'].includes(format) ? format : 'markdown', io),
    );
    if (values.html !== undefined) {
      await writeHtmlReport(values.html, report);
      if (format !== 'json')
        io.out(
          `\nThe HTML report (charts, findings, fixes that pass these rules) is at ${values.html}; open it in a browser.\n`,
        );
    }
    if (format !== 'json') {
      io.out(
        `\nverdict: ${report.verdict} (${report.blocking} blocking, ${report.warnings} warnings). In a workflow the check would ${report.verdict === 'block' ? 'fail' : 'pass'}; the demo exits 0.\n`,
      );
      if (values.keep) io.out(`scratch repository kept at ${repo}\n`);
    }
    return 0;
  } finally {
    if (!values.keep) await rm(repo, { recursive: true, force: true });
  }
}
