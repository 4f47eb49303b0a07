import type { ChangedFile } from '../changes.js';
import type { FileFailure, FileReport } from '../inspect.js';
import { sortFindings } from '../inspect.js';
import type { Finding, LocationMap, ModelSpec, Severity } from '../model.js';
import type { MetricPath } from '../metrics/types.js';
import { RULES, isRuleId } from '../rules/catalog.js';
import { uncomputedScanMetrics } from '../rules/metric-rules.js';
import { SEVERITY_ORDER } from '../severity.js';
import { formatInteger, formatNumber, percentChange } from '../format/units.js';
import { formatMetric } from '../format/metric-format.js';
import { rotaryHeadDim } from '../metrics/frequencies.js';
import type { Judging, Limit } from '../policy/judging.js';
import { METRIC_PATHS, METRIC_SOURCES, metricValue } from '../metrics/metric-path.js';
import type {
  FileDecision,
  GateReport,
  JudgedFinding,
  LimitState,
  MetricDelta,
  PolicyInfo,
  Verdict,
} from '../report/types.js';
import { inheritTrainedSpan } from './assumed.js';
import { shapeChangeFinding } from './shape-change.js';
import { type Assumption } from '../report/types.js';

/** One changed model config with both of its versions read (null where a side has none). */
export interface ChangedConfig {
  change: ChangedFile;
  base: FileReport | FileFailure | null;
  head: FileReport | FileFailure | null;
  judging: Judging;
}

export interface GateInput {
  configs: ChangedConfig[];
  /** Deleted configs: listed, not judged. */
  deleted: ChangedFile[];
  policy: PolicyInfo;
  /** The waiver label and whether the pull request carries it (default: none). */
  waiver: { label: string | null; applied: boolean };
  /** Notices for the report (not-judged files, truncated file lists, read-only tokens). */
  notices: string[];
  base: string;
  head: string;
}

function isReport(version: FileReport | FileFailure | null): version is FileReport {
  return version !== null && 'metrics' in version;
}

function isFailure(version: FileReport | FileFailure | null): version is FileFailure {
  return version !== null && !('metrics' in version);
}

function locate(
  locations: LocationMap,
  paths: string[] | undefined,
): { key: string | null; line: number | null } {
  for (const path of paths ?? []) {
    const found = locations[path];
    if (found) return { key: found.key, line: found.line };
  }
  return { key: null, line: null };
}

export function sameCode(a: ModelSpec, b: ModelSpec): boolean {
  return (
    JSON.stringify(a.position) === JSON.stringify(b.position) && a.trainedSpan === b.trainedSpan
  );
}

/** Frequencies before scaling: they follow from the code kind, the rotary base and width, or d_model. */
function frequencyKey(spec: ModelSpec): string {
  const code = spec.position;
  if (code.kind === 'rotary')
    return `rotary:${code.base}:${2 * Math.floor((rotaryHeadDim(spec) * code.fraction) / 2)}:${spec.localBase ?? ''}`;
  if (code.kind === 'sinusoidal') return `sinusoidal:${spec.hidden}`;
  return code.kind;
}

/** Findings that only make sense as a change between base and head. */
export function changeFindings(base: FileReport, head: FileReport): Finding[] {
  const findings: Finding[] = [];
  const b = base.metrics;
  const h = head.metrics;
  const at = (...paths: string[]) => locate(head.locations, paths);
  if (
    b.declaredSpan !== null &&
    h.declaredSpan !== null &&
    h.declaredSpan > b.declaredSpan &&
    sameCode(base.spec, head.spec)
  ) {
    findings.push({
      rule: 'span-grew-code-unchanged',
      severity: RULES['span-grew-code-unchanged'].severity,
      message: `The declared span grew from ${formatInteger(b.declaredSpan)} to ${formatInteger(h.declaredSpan)} tokens while the position code (${head.spec.position.kind}${head.spec.position.kind === 'rotary' ? `, base ${formatNumber(head.spec.position.base, 6)}, ${head.spec.position.scaling ? `${head.spec.position.scaling.kind} × ${head.spec.position.scaling.factor}` : 'no scaling'}` : ''}) stayed the same; add or raise context scaling so the code reaches ${formatInteger(h.declaredSpan)}, or state the trained span if the model was trained that long.`,
      ...at('declaredSpan'),
    });
  }
  const before = frequencyKey(base.spec);
  const after = frequencyKey(head.spec);
  if (before !== after) {
    const describe = (spec: ModelSpec) =>
      spec.position.kind === 'rotary'
        ? `rotary base ${formatNumber(spec.position.base, 6)}${spec.localBase ? ` (local layers ${formatNumber(spec.localBase, 6)})` : ''} over ${2 * Math.floor((rotaryHeadDim(spec) * spec.position.fraction) / 2)} channels`
        : spec.position.kind === 'sinusoidal'
          ? `sinusoidal over ${spec.hidden} channels`
          : `${spec.position.kind} code`;
    findings.push({
      rule: 'frequencies-changed',
      severity: RULES['frequencies-changed'].severity,
      message: `The position frequencies changed from ${describe(base.spec)} to ${describe(head.spec)}: the checkpoint was trained with the old ones, so this needs retraining or tuning at the new frequencies.`,
      ...at(
        'position.base',
        'localBase',
        'position.fraction',
        'headDim',
        'latent.ropeDim',
        'position',
      ),
    });
  }
  if (
    b.cachePerTokenBytes !== null &&
    h.cachePerTokenBytes !== null &&
    b.cachePerTokenBytes !== h.cachePerTokenBytes
  ) {
    const pct = percentChange(b.cachePerTokenBytes, h.cachePerTokenBytes);
    const cacheOf = (spec: ModelSpec) => spec.dtypes.cache ?? spec.dtypes.weights ?? 'bf16';
    const causes = [
      base.spec.kvHeads !== head.spec.kvHeads &&
        `key/value heads ${base.spec.kvHeads} → ${head.spec.kvHeads}`,
      base.spec.headDim !== head.spec.headDim &&
        `head size ${base.spec.headDim} → ${head.spec.headDim}`,
      cacheOf(base.spec) !== cacheOf(head.spec) &&
        `cache dtype ${cacheOf(base.spec)} → ${cacheOf(head.spec)}`,
      base.spec.layers !== head.spec.layers && `layers ${base.spec.layers} → ${head.spec.layers}`,
      JSON.stringify([
        base.spec.slidingWindow,
        base.spec.windowLayers,
        base.spec.layerTypes ?? null,
        base.spec.chunkSize ?? null,
      ]) !==
        JSON.stringify([
          head.spec.slidingWindow,
          head.spec.windowLayers,
          head.spec.layerTypes ?? null,
          head.spec.chunkSize ?? null,
        ]) && 'layer pattern',
      JSON.stringify(base.spec.latent ?? null) !== JSON.stringify(head.spec.latent ?? null) &&
        'latent attention',
      Boolean(base.spec.encoderOnly) !== Boolean(head.spec.encoderOnly) && 'encoder-only',
    ]
      .filter(Boolean)
      .join(', ');
    findings.push({
      rule: 'cache-per-token-changed',
      severity: RULES['cache-per-token-changed'].severity,
      message: `Key/value cache per token changed from ${formatInteger(b.cachePerTokenBytes)} to ${formatInteger(h.cachePerTokenBytes)} bytes (${pct === null ? 'n/a' : `${pct > 0 ? '+' : '−'}${formatNumber(Math.abs(pct), 3)} %`})${causes ? `: ${causes}` : ''}.`,
      ...at('kvHeads', 'latent.kvRank', 'dtypes.cache', 'headDim'),
    });
  }
  const shape = shapeChangeFinding(base, head);
  if (shape) findings.push(shape);
  return findings;
}

/** Which bounds of `limit` the head value (and its change over base) crosses, and whether any was judged. */
export function checkLimit(
  limit: Limit,
  base: number | null,
  head: number | null,
  metric: MetricPath | null = null,
): { crossed: string[]; judged: boolean } {
  const crossed: string[] = [];
  let judged = false;
  if (head !== null) {
    if (limit.max !== undefined) {
      judged = true;
      if (head > limit.max)
        crossed.push(
          `above the maximum ${metric ? formatMetric(metric, limit.max) : formatNumber(limit.max, 6)}`,
        );
    }
    if (limit.min !== undefined) {
      judged = true;
      if (head < limit.min)
        crossed.push(
          `below the minimum ${metric ? formatMetric(metric, limit.min) : formatNumber(limit.min, 6)}`,
        );
    }
  }
  if (limit.maxIncreasePct !== undefined && base !== null && head !== null) {
    const pct = percentChange(base, head);
    judged = true;
    if (pct === null ? head > base : pct > limit.maxIncreasePct) {
      crossed.push(
        `${pct === null ? 'up from 0' : `up ${formatNumber(pct, 3)} %`} over base, more than the ${formatNumber(limit.maxIncreasePct, 3)} % allowed`,
      );
    }
  }
  return { crossed, judged };
}

function deltasAndLimitFindings(
  base: FileReport | null,
  head: FileReport,
  judging: Judging,
): { deltas: MetricDelta[]; findings: (Finding & { metric?: MetricPath })[] } {
  const deltas: MetricDelta[] = [];
  const findings: (Finding & { metric?: MetricPath })[] = [];
  const uncomputed = new Set(uncomputedScanMetrics(head.metrics));
  for (const metric of METRIC_PATHS) {
    const b = base ? metricValue(base.metrics, metric) : null;
    const h = metricValue(head.metrics, metric);
    const limit = judging.limits[metric] ?? null;
    const change = b !== null && h !== null ? h - b : null;
    let state: LimitState = 'unjudged';
    let note: string | undefined;
    if (limit && h === null && uncomputed.has(metric)) {
      // Fail closed: the scan stopped at its bound, so nothing shows the limit holds.
      state = 'crossed';
      findings.push({
        rule: 'limit-crossed',
        severity: limit.severity,
        message: `${metric} is not computed (the positional scans stopped at their bound, see scan-incomplete), so its limit cannot be shown to hold.`,
        ...locate(head.locations, ['serving.span', 'declaredSpan']),
        metric,
      });
    } else if (limit && metric === 'discriminationSpan' && h === null) {
      // No negative sum within the span: the span itself is the least the metric can be.
      const T = head.metrics.evaluationSpan;
      const bound = limit.min ?? null;
      if (T !== null && head.metrics.fastestWavelength !== null && (bound === null || T >= bound))
        state = 'ok';
      else
        note =
          T !== null && bound !== null
            ? `not judged: the span ${formatInteger(T)} is shorter than the limit`
            : 'not judged: no value';
    } else if (limit) {
      const { crossed, judged } = checkLimit(limit, b, h, metric);
      state = crossed.length > 0 ? 'crossed' : judged ? 'ok' : 'unjudged';
      if (!judged) note = 'not judged: no value';
      if (crossed.length > 0) {
        findings.push({
          rule: 'limit-crossed',
          severity: limit.severity,
          message: `${metric} is ${formatMetric(metric, h)}${b !== null && b !== h ? ` (base ${formatMetric(metric, b)})` : ''}: ${crossed.join('; ')}.`,
          ...locate(
            head.locations,
            METRIC_SOURCES[metric.startsWith('precision.') ? 'collidingPositions' : metric] ?? [
              'serving.span',
              'declaredSpan',
            ],
          ),
          metric,
        });
      }
    }
    const changed = base !== null && b !== h;
    if (changed || limit) {
      deltas.push({
        metric,
        base: b,
        head: h,
        change,
        changePct: percentChange(b, h),
        limit,
        state,
        ...(note ? { note } : {}),
      });
    }
  }
  return { deltas, findings };
}

const findingKey = (f: Finding) => `${f.rule}\u0000${f.key ?? ''}`;

/** Judge one changed config: its findings with policy, standing and waiver applied, and its deltas. */
export function decideFile(config: ChangedConfig, waiverApplied: boolean): FileDecision {
  const { change, judging } = config;
  const base = isReport(config.base) ? config.base : null;
  const readHead = isReport(config.head) ? config.head : null;
  // A head that keeps the base's code and states no trained span inherits the base's (assumed).
  const inherited = base && readHead ? inheritTrainedSpan(base, readHead) : null;
  const head = inherited?.head ?? readHead;
  const headError = isFailure(config.head) ? config.head : null;
  let raw: (Finding & { metric?: MetricPath })[] = [];
  let deltas: MetricDelta[] = [];
  if (head) {
    const limits = deltasAndLimitFindings(base, head, judging);
    deltas = limits.deltas;
    raw = [...head.findings, ...(base ? changeFindings(base, head) : []), ...limits.findings];
  } else if (headError) {
    raw = [
      {
        rule: 'config-unreadable',
        severity: 'block',
        message: headError.message,
        key: null,
        line: headError.line,
      },
    ];
  }
  const baseKeys = new Set((base?.findings ?? []).map(findingKey));
  const findings: JudgedFinding[] = [];
  for (const finding of raw) {
    const configured =
      isRuleId(finding.rule) && RULES[finding.rule].scope !== 'limit'
        ? judging.rules[finding.rule]
        : undefined;
    if (configured === 'off') continue;
    const severity: Severity = configured ?? finding.severity;
    const standing =
      baseKeys.has(findingKey(finding)) &&
      RULES[finding.rule as keyof typeof RULES]?.scope === 'file';
    let counts: Severity | null = severity;
    if (standing && severity === 'block' && judging.standing === 'report') counts = 'info';
    let waived = false;
    if (counts === 'block' && waiverApplied) {
      counts = 'warn';
      waived = true;
    }
    findings.push({ ...finding, severity, standing, counts, waived, file: change.path });
  }
  const sorted = sortFindings(findings) as JudgedFinding[];
  return {
    path: change.path,
    previousPath: change.previousPath,
    status: change.status,
    dialect: head?.dialect ?? null,
    verdict: verdictOf(sorted),
    deltas,
    findings: sorted,
    base,
    head,
    baseError: isFailure(config.base) ? config.base : null,
    headError,
    assumed: inherited?.assumption ?? null,
  };
}

function verdictOf(findings: JudgedFinding[]): Verdict {
  if (findings.some((f) => f.counts === 'block')) return 'block';
  if (findings.some((f) => f.counts === 'warn')) return 'warn';
  return 'ok';
}

/** The gate's one decision for a pull request. */
export function decide(input: GateInput): GateReport {
  const files = input.configs.map((config) => decideFile(config, input.waiver.applied));
  const all = files.flatMap((f) => f.findings);
  const verdict: Verdict = files.some((f) => f.verdict === 'block')
    ? 'block'
    : files.some((f) => f.verdict === 'warn')
      ? 'warn'
      : 'ok';
  return {
    version: 1,
    verdict,
    blocking: all.filter((f) => f.counts === 'block').length,
    warnings: all.filter((f) => f.counts === 'warn').length,
    files: [...files].sort(
      (a, b) =>
        SEVERITY_ORDER[a.verdict === 'ok' ? 'info' : a.verdict] -
          SEVERITY_ORDER[b.verdict === 'ok' ? 'info' : b.verdict] || a.path.localeCompare(b.path),
    ),
    deleted: input.deleted,
    policy: input.policy,
    waiver: { ...input.waiver, waivedBlocks: all.filter((f) => f.waived).length },
    notices: input.notices,
    base: input.base,
    head: input.head,
  };
}
