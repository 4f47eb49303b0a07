import type { ChangedFile } from '../../src/core/changes.js';
import { BUILT_IN_JUDGING, type Judging } from '../../src/core/policy/judging.js';
import { inspectModel, type FileReport } from '../../src/core/inspect.js';
import { parsePolicy, resolvePolicy } from '../../src/core/policy/index.js';
import { proposeRemedy } from '../../src/core/remedy/propose.js';
import { remedyContext, type RemedyContext } from '../../src/core/remedy/prove.js';
import type { RemedyFields } from '../../src/core/report/types.js';
import { decideFile } from '../../src/core/compare/decide.js';

/** Fields of a context-reach model description, each overridable. */
export interface ModelText {
  layers?: number;
  hidden?: number;
  heads?: number;
  kvHeads?: number;
  headDim?: number;
  position?: string;
  declared?: number;
  trained?: number;
  dtypes?: string;
  serving?: string;
}

/** A small model in the context-reach format (YAML), rotary base 10000 without scaling unless told. */
export function modelText(m: ModelText = {}): string {
  return `format: context-reach-model/1
model:
  layers: ${m.layers ?? 16}
  hidden: ${m.hidden ?? 2048}
  heads: ${m.heads ?? 16}
  kv-heads: ${m.kvHeads ?? 4}
  head-dim: ${m.headDim ?? 128}
  feed-forward: { size: 5632, gated: true }
  vocab: 32000
  position:
${(m.position ?? 'code: rotary\nbase: 10000')
  .split('\n')
  .map((l) => `    ${l}`)
  .join('\n')}
  declared-span: ${m.declared ?? 4096}
${m.trained !== undefined ? `  trained-span: ${m.trained}\n` : ''}  dtypes: ${m.dtypes ?? '{ weights: bf16, cache: bf16, positions: fp32 }'}
${
  m.serving
    ? `serving:\n${m.serving
        .split('\n')
        .map((l) => `  ${l}`)
        .join('\n')}\n`
    : ''
}`;
}

const CHANGE: ChangedFile = {
  status: 'modified',
  path: 'models/m/model.reach.yaml',
  previousPath: null,
};

/** A head (and optional base) judged under a policy text, as the gate would: serving defaults and limits applied. */
export function contextOf(
  headText: string,
  options: { base?: string; policy?: string } = {},
): { ctx: RemedyContext; head: FileReport; judging: Judging } {
  let judging = BUILT_IN_JUDGING;
  let serving = {};
  if (options.policy) {
    const file = resolvePolicy(
      parsePolicy(options.policy, '.github/context-reach.yml'),
      CHANGE.path,
    );
    judging = { limits: file.limits, rules: file.rules, standing: file.standing };
    serving = file.serving;
  }
  const read = (text: string) => inspectModel(text, CHANGE.path, { defaults: serving });
  const head = read(headText);
  const base = options.base ? read(options.base) : null;
  return { ctx: remedyContext(head, base, judging, CHANGE), head, judging };
}

/** The remedy fields of the first blocking finding with `rule` (and `metric`, for limits). */
export function remedyFor(
  headText: string,
  rule: string,
  options: { base?: string; policy?: string; metric?: string } = {},
): RemedyFields & { finding: { rule: string; metric?: string } } {
  const { ctx } = contextOf(headText, options);
  const decision = decideFile(
    { change: ctx.change, base: ctx.base, head: ctx.head, judging: ctx.judging },
    false,
  );
  const finding = decision.findings.find(
    (f) =>
      f.rule === rule &&
      f.severity === 'block' &&
      (options.metric === undefined || f.metric === options.metric),
  );
  if (!finding)
    throw new Error(
      `no blocking ${rule}${options.metric ? ` on ${options.metric}` : ''} among ${decision.findings.map((f) => `${f.rule}/${f.severity}`).join(', ')}`,
    );
  return { ...proposeRemedy(ctx, finding), finding };
}
