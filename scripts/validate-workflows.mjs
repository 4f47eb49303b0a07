// Checks every workflow file the project ships (.github/workflows/*.yml), the ones `init` writes
// (simple and --forks, from the built dist/cli.js in a scratch repository) and action.yml with a
// general-purpose validator of GitHub workflow and action files, @action-validator/core (its
// schemas compiled to WebAssembly). Exit 1 naming each file and error.
//
// One allowance, stated here and printed: that validator's action schema (0.6.0) predates the
// node24 runtime and lists node12/16/20 only, so for action.yml an error at /runs/using whose
// only complaint is that enum is accepted when the value is `node24`; any other error fails.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parse } from 'yaml';

const require = createRequire(import.meta.url);
const { validateAction, validateWorkflow } = require('@action-validator/core');
const root = new URL('..', import.meta.url).pathname;

/** True when `error` is the node24 enum complaint and nothing else. */
function onlyNode24Lag(error, action) {
  if (parse(action)?.runs?.using !== 'node24' || error.path !== '/runs' || error.code !== 'one_of')
    return false;
  return (error.states ?? []).some(
    (state) =>
      state.errors.length === 1 &&
      state.errors[0].code === 'enum' &&
      state.errors[0].path === '/runs/using',
  );
}

let failed = 0;
function report(name, errors) {
  if (errors.length === 0) {
    console.log(`ok      ${name}`);
    return;
  }
  failed += 1;
  console.log(`FAILED  ${name}\n${JSON.stringify(errors, null, 2)}`);
}

const action = readFileSync(join(root, 'action.yml'), 'utf8');
const actionErrors = validateAction(action).errors;
const lag = actionErrors.filter((error) => onlyNode24Lag(error, action));
report(
  'action.yml',
  actionErrors.filter((error) => !lag.includes(error)),
);
if (lag.length > 0)
  console.log(
    "        (runs.using: node24 accepted: the validator's schema lists node12/16/20 only)",
  );

const workflows = join(root, '.github', 'workflows');
for (const name of readdirSync(workflows)
  .filter((n) => /\.ya?ml$/.test(n))
  .sort()) {
  report(
    `.github/workflows/${name}`,
    validateWorkflow(readFileSync(join(workflows, name), 'utf8')).errors,
  );
}

for (const flags of [[], ['--forks']]) {
  const repo = mkdtempSync(join(tmpdir(), 'context-reach-validate-'));
  try {
    execFileSync('git', ['init', '-q'], { cwd: repo });
    mkdirSync(join(repo, 'models', 'm'), { recursive: true });
    writeFileSync(
      join(repo, 'models', 'm', 'config.json'),
      JSON.stringify({
        model_type: 'llama',
        hidden_size: 512,
        intermediate_size: 1024,
        num_hidden_layers: 2,
        num_attention_heads: 8,
        vocab_size: 1000,
        max_position_embeddings: 2048,
      }),
    );
    execFileSync(process.execPath, [join(root, 'dist', 'cli.js'), 'init', ...flags], {
      cwd: repo,
      stdio: 'ignore',
    });
    const written = join(repo, '.github', 'workflows');
    for (const name of readdirSync(written).sort()) {
      report(
        `init ${flags.join(' ')} → .github/workflows/${name}`.replace('init  ', 'init '),
        validateWorkflow(readFileSync(join(written, name), 'utf8')).errors,
      );
    }
  } finally {
    rmSync(repo, { recursive: true, force: true });
  }
}
if (failed > 0) {
  console.log(`${failed} file(s) failed validation`);
  process.exitCode = 1;
}
