import { markdownTable } from 'markdown-table';
import type { FileDecision, GateReport, JudgedFinding, MetricDelta, Verdict } from '../compare/decide.js';
import type { Severity } from '../model.js';
import { formatInteger, formatNumber } from '../units.js';
import { codeId, codeSpan, encodePath, escapeMarkdown, linkablePath } from './escape.js';
import { formatChange, formatMetric } from './metric-format.js';
import { memoryChart } from './memory-chart.js';
import { fitText, perDeviceText } from './device-text.js';
import { COMMENT_MARKER, ESTIMATE_NOTICE } from './notice.js';
import type { Remedy } from '../remedy/types.js';
import type { ModelSpec } from '../model.js';
import { changeParts, metricParts, REMEDY_NOTE } from './remedy-text.js';
import { METRIC_PATHS, metricValue as metricOf } from '../compare/metric-path.js';

export { COMMENT_MARKER };

/** GitHub refuses comment bodies over 65,536 characters; keep a margin for the trim notice. */
export const COMMENT_LIMIT = 65_536;

export interface MarkdownContext {
  /** Link prefix for file lines at the head commit, e.g. `https://github.com/o/r/blob/SHA` (default: no links). */
  blobUrl?: string | null;
  /** Where the standalone HTML report can be downloaded (default: not mentioned). */
  htmlReportUrl?: string | null;
  /** Where on that page the report is, e.g. `in the artifacts of this workflow run` (default: nothing said). */
  htmlReportWhere?: string | null;
  /** Findings GitHub could not show as annotations (default: none). */
  unannotated?: number;
  /** Character budget (default: the comment limit). */
  limit?: number;
}

const VERDICT_LINE: Record<Verdict, string> = {
  block: '🔴 **Blocked**',
  warn: '🟡 **Passes with warnings**',
  ok: '🟢 **Passes**',
};

const SEVERITY_ICON: Record<Severity, string> = { block: '🔴 block', warn: '🟡 warn', info: '🔵 info' };

function where(file: FileDecision, finding: JudgedFinding, ctx: MarkdownContext): string {
  const label = finding.line !== null ? `line ${finding.line}` : 'file';
  const key = finding.key ? ` ${codeSpan(finding.key)}` : '';
  // A path git would never list (a `..` segment in a tampered report) is named, never linked.
  if (!ctx.blobUrl || !linkablePath(file.path)) return `${label}${key}`;
  const anchor = finding.line !== null ? `#L${finding.line}` : '';
  return `[${label}](${ctx.blobUrl}/${encodePath(file.path)}${anchor})${key}`;
}

function state(finding: JudgedFinding): string {
  const parts = [SEVERITY_ICON[finding.severity]];
  if (finding.standing) parts.push('standing');
  else parts.push('new');
  if (finding.waived) parts.push('waived');
  return parts.join(' · ');
}

function deltaState(delta: MetricDelta): string {
  if (delta.state === 'crossed') return `❌ ${delta.limit?.severity ?? 'block'}`;
  if (delta.state === 'ok') return '✅ within';
  return '';
}

function limitText(delta: MetricDelta): string {
  const limit = delta.limit;
  if (!limit) return '';
  const parts: string[] = [];
  if (limit.min !== undefined) parts.push(`≥ ${formatMetric(delta.metric, limit.min)}`);
  if (limit.max !== undefined) parts.push(`≤ ${formatMetric(delta.metric, limit.max)}`);
  if (limit.maxIncreasePct !== undefined) parts.push(`≤ +${formatNumber(limit.maxIncreasePct, 3)} %`);
  return parts.join(', ');
}

/**
 * The two metric tables depend on the file alone, and `renderComment` builds every section again
 * for each trimming attempt (up to five, for the comment and again for the summary): each table is
 * built once per file. With 200 files that is most of the action's rendering time.
 */
const tableMemo = { delta: new WeakMap<FileDecision, string>(), full: new WeakMap<FileDecision, string>() };

function memo(cache: WeakMap<FileDecision, string>, file: FileDecision, build: (file: FileDecision) => string): string {
  let text = cache.get(file);
  if (text === undefined) {
    text = build(file);
    cache.set(file, text);
  }
  return text;
}

function deltaTable(file: FileDecision): string {
  return memo(tableMemo.delta, file, buildDeltaTable);
}

function buildDeltaTable(file: FileDecision): string {
  if (file.deltas.length === 0) return '_No metric changed and none is limited by the policy._';
  return markdownTable([
    ['metric', 'base', 'head', 'change', 'limit', 'state'],
    ...file.deltas.map((d) => [
      codeId(d.metric), formatMetric(d.metric, d.base), formatMetric(d.metric, d.head),
      formatChange(d.metric, d.change, d.changePct), limitText(d), deltaState(d),
    ]),
  ], { align: ['l', 'r', 'r', 'r', 'l', 'l'] });
}

function findingsTable(file: FileDecision, ctx: MarkdownContext): string {
  if (file.findings.length === 0) return '_No findings._';
  return markdownTable([
    ['', 'rule', 'finding', 'where'],
    ...file.findings.map((f) => [state(f), codeId(f.rule), escapeMarkdown(f.message), where(file, f, ctx)]),
  ]);
}

function fullMetrics(file: FileDecision): string {
  return memo(tableMemo.full, file, buildFullMetrics);
}

function buildFullMetrics(file: FileDecision): string {
  const rows = METRIC_PATHS.map((metric) => {
    const b = file.base ? formatMetric(metric, metricOf(file.base.metrics, metric)) : '—';
    const h = file.head ? formatMetric(metric, metricOf(file.head.metrics, metric)) : '—';
    return [codeId(metric), b, h];
  }).filter(([, b, h]) => b !== '—' || h !== '—');
  return `<details><summary>All metrics</summary>\n\n${markdownTable([['metric', 'base', 'head'], ...rows], { align: ['l', 'r', 'r'] })}\n\n</details>`;
}


function title(file: FileDecision): string {
  const status = file.status === 'renamed' && file.previousPath
    ? ` (renamed from ${codeSpan(file.previousPath)})`
    : file.status === 'added' ? ' (new file, judged on its own)' : '';
  return `### ${VERDICT_LINE[file.verdict].split(' ')[0]} ${codeSpan(file.path)}${status}`;
}

export interface FileSectionParts {
  chart: boolean;
  details: boolean;
  maxFindings: number;
}

function fileSection(file: FileDecision, ctx: MarkdownContext, parts: FileSectionParts): string {
  const lines = [title(file), ''];
  if (file.headError) {
    lines.push(`Could not be read at head: ${escapeMarkdown(file.headError.message)}`, '');
  }
  if (file.baseError) {
    lines.push(`_The base version could not be read (${escapeMarkdown(file.baseError.message)}); the head is judged on its own._`, '');
  }
  if (file.head) {
    lines.push(deltaTable(file), '');
    const fit = [perDeviceText(file.head.spec, file.head.metrics), fitText(file.head.spec, file.head.metrics)].filter((t): t is string => t !== null);
    if (fit.length > 0) lines.push(`Head: ${fit.map((t) => escapeMarkdown(t)).join('; ')}.`, '');
  }
  const findings = file.findings.slice(0, parts.maxFindings);
  lines.push(findingsTable({ ...file, findings }, ctx), '');
  if (findings.length < file.findings.length) {
    lines.push(`_${file.findings.length - findings.length} more findings are in the job summary and the JSON report._`, '');
  }
  lines.push(...remedySection(file));
  if (parts.chart && file.head) {
    const chart = memoryChart(file);
    if (chart) lines.push(chart, '');
  }
  if (parts.details && file.head) lines.push(fullMetrics(file), '');
  return lines.join('\n');
}

/** `` `key` before → **after**, … ⇒ metric value, … `` with every part escaped. */
function changeMarkdown(change: Remedy['change'], spec: ModelSpec | null): string {
  return changeParts(change, spec)
    .map((p) => `${codeSpan(p.key)} ${p.before === null ? '' : `${escapeMarkdown(p.before)} → `}**${escapeMarkdown(p.after)}**`).join(', ');
}

function metricsMarkdown(metrics: Remedy['metrics'], max = Infinity): string {
  return metricParts(metrics).slice(0, max).map((m) => `${escapeMarkdown(m.metric)} ${escapeMarkdown(m.value)}`).join(', ');
}

function remedyMarkdown(remedy: Remedy, spec: ModelSpec | null, maxMetrics = Infinity): string {
  const raises = remedy.raises.length > 0 ? ` _(also raises ${remedy.raises.map((r) => escapeMarkdown(r)).join(', ')})_` : '';
  const cost = remedy.cost ? `; costs ${escapeMarkdown(remedy.cost)}` : '';
  return `${changeMarkdown(remedy.change, spec)} ⇒ ${metricsMarkdown(remedy.metrics, maxMetrics)}${raises}${cost}`;
}

/** The first line under a blocking finding: its remedy, or why there is none. */
function firstRemedyLine(finding: JudgedFinding, spec: ModelSpec | null): string | null {
  if (finding.remedy === undefined) return null;
  if (finding.remedy === null) return `⛔ no remedy: ${escapeMarkdown(finding.remedyWhyNot ?? 'none found')}`;
  return `✅ **remedy**: ${remedyMarkdown(finding.remedy, spec, 3)}`;
}

/** The remedies of a file's blocking findings: the proven change, its alternatives, or why there is none. */
function remedySection(file: FileDecision): string[] {
  const blocking = file.findings.filter((f) => f.severity === 'block' && f.remedy !== undefined);
  if (blocking.length === 0) return [];
  const spec = file.head?.spec ?? null;
  const lines = [`**Remedies** <sub>${escapeMarkdown(REMEDY_NOTE)}</sub>`, ''];
  for (const finding of blocking) {
    lines.push(`- ${codeId(finding.rule)}${finding.metric ? ` (${codeSpan(finding.metric)})` : ''}`);
    if (!finding.remedy) {
      lines.push(`  - ⛔ no remedy: ${escapeMarkdown(finding.remedyWhyNot ?? 'none found')}`);
      continue;
    }
    lines.push(`  - ✅ **remedy**: ${remedyMarkdown(finding.remedy, spec)}`);
    for (const alternative of finding.remedyAlternatives ?? []) lines.push(`  - or: ${remedyMarkdown(alternative, spec)}`);
  }
  const together = file.remedyTogether;
  if (together) {
    const verdict = together.passes ? 'pass: nothing blocks' : `still block on ${together.stillBlocking.map((b) => escapeMarkdown(b)).join(', ')}`;
    lines.push(`- ${together.passes ? '✅' : '⚠️'} All first remedies together (${changeMarkdown(together.change, spec)}) ${verdict}.`);
  }
  lines.push('');
  return lines;
}

function headline(report: GateReport): string {
  const counts = `${formatInteger(report.blocking)} blocking, ${formatInteger(report.warnings)} warning${report.warnings === 1 ? '' : 's'}`;
  return `## context-reach · ${VERDICT_LINE[report.verdict]} · ${counts}`;
}

/** Blocking findings listed at the top; the rest stay in their file sections (and the JSON report). */
export const BLOCKERS_LISTED = 20;

function blockers(report: GateReport, ctx: MarkdownContext): string[] {
  const all = report.files.flatMap((file) => file.findings.filter((f) => f.counts === 'block').map((f) => ({ file, f })));
  if (all.length === 0) return [];
  const rows = all.slice(0, BLOCKERS_LISTED);
  const more = all.length - rows.length;
  return ['**What blocks:**', '', ...rows.flatMap(({ file, f }) => {
    const first = firstRemedyLine(f, file.head?.spec ?? null);
    return [
      `- ${codeSpan(file.path)} ${where(file, f, ctx)}: ${codeId(f.rule)} ${escapeMarkdown(f.message)}`,
      ...(first ? [`  - ${first}`] : []),
    ];
  }), ...(more > 0 ? [`- … and ${more} more blocking finding${more === 1 ? '' : 's'}, listed under their files below.`] : []), ''];
}

/**
 * Last resort when even the shortest form is over the limit (thousands of files, or very long
 * paths): cut at a line, close what the cut left open, and say so.
 */
function cutToLimit(body: string, limit: number): string {
  if (body.length <= limit) return body;
  const note = '\n\n_Cut at GitHub\'s comment limit; the job summary and the JSON report have everything._\n';
  let kept = body.slice(0, Math.max(0, limit - note.length - 200));
  kept = kept.slice(0, kept.lastIndexOf('\n') + 1);
  const fences = (kept.match(/^```/gm) ?? []).length;
  const open = (kept.match(/<details/g) ?? []).length - (kept.match(/<\/details>/g) ?? []).length;
  const closing = `${fences % 2 === 1 ? '```\n' : ''}${'</details>\n'.repeat(Math.max(0, open))}`;
  return `${kept}${closing}${note}`;
}

function preamble(report: GateReport, ctx: MarkdownContext): string[] {
  const lines: string[] = [];
  const judged = report.files.length;
  lines.push(`Judged ${judged} changed model config${judged === 1 ? '' : 's'} between ${codeId(report.base.slice(0, 12))} (base) and ${codeId(report.head.slice(0, 12))} (head).`, '');
  if (report.policy.source === 'built-in') {
    lines.push(`> [!NOTE]\n> No policy file at ${codeSpan(report.policy.path)} on the base commit: built-in rules only, no numeric limits.`, '');
  }
  if (report.policy.changedInHead) {
    lines.push(`> [!NOTE]\n> This pull request changes the policy ${codeSpan(report.policy.path)}. It was judged by the base commit's policy; the change applies after merge.`, '');
  }
  if (report.waiver.applied && report.waiver.label) {
    lines.push(`> [!WARNING]\n> The waiver label ${codeSpan(report.waiver.label)} is on this pull request: ${report.waiver.waivedBlocks} blocking finding${report.waiver.waivedBlocks === 1 ? '' : 's'} counted as warnings.`, '');
  }
  for (const notice of report.notices) lines.push(`> [!NOTE]\n> ${escapeMarkdown(notice)}`, '');
  if (ctx.unannotated && ctx.unannotated > 0) {
    lines.push(`_${ctx.unannotated} findings were not shown as line annotations (GitHub shows at most 10 errors and 10 warnings per step); all are listed below._`, '');
  }
  return lines;
}

function footer(report: GateReport, ctx: MarkdownContext): string[] {
  const lines: string[] = [];
  if (report.deleted.length > 0) {
    lines.push(`Deleted, not judged: ${report.deleted.map((d) => codeSpan(d.path)).join(', ')}.`, '');
  }
  if (ctx.htmlReportUrl) {
    const where = ctx.htmlReportWhere ? ` ${escapeMarkdown(ctx.htmlReportWhere)}` : '';
    lines.push(`📊 Charts, findings and proven remedies: [the HTML report](${encodeURI(ctx.htmlReportUrl).replace(/[()]/g, (c) => (c === '(' ? '%28' : '%29'))})${where}.`, '');
  }
  lines.push(`<sub>${escapeMarkdown(ESTIMATE_NOTICE)}</sub>`);
  return lines;
}

/**
 * The pull-request comment (and job summary): verdict and blockers first, then a section per
 * file. When the whole report is over the limit, the least important parts go first: full
 * metric tables, then charts, then findings beyond the first few, then whole file sections;
 * the comment says what was left out.
 */
export function renderComment(report: GateReport, ctx: MarkdownContext = {}): string {
  const limit = ctx.limit ?? COMMENT_LIMIT;
  const attempts: FileSectionParts[] = [
    { chart: true, details: true, maxFindings: Infinity },
    { chart: true, details: false, maxFindings: Infinity },
    { chart: false, details: false, maxFindings: Infinity },
    { chart: false, details: false, maxFindings: 5 },
  ];
  const head = [COMMENT_MARKER, headline(report), '', ...preamble(report, ctx), ...blockers(report, ctx)].join('\n');
  const tail = footer(report, ctx).join('\n');
  for (const [index, parts] of attempts.entries()) {
    const trimNote = index === 0 ? '' : `\n_Trimmed to fit GitHub's comment limit: ${[
      !parts.details && 'full metric tables', !parts.chart && 'charts', parts.maxFindings !== Infinity && `findings past the first ${parts.maxFindings} per file`,
    ].filter(Boolean).join(', ')} are left out here; the job summary and the JSON report have everything._\n`;
    const body = `${head}\n${trimNote}\n${report.files.map((f) => fileSection(f, ctx, parts)).join('\n')}\n${tail}\n`;
    if (body.length <= limit) return body;
  }
  // Still too long: as many whole file sections as fit, the rest named in one line each.
  const minimal = attempts[attempts.length - 1]!;
  const sections: string[] = [];
  let used = head.length + tail.length + 400;
  let shown = 0;
  for (const file of report.files) {
    const section = fileSection(file, ctx, minimal);
    if (used + section.length > limit) break;
    sections.push(section);
    used += section.length;
    shown += 1;
  }
  const rest = report.files.slice(shown);
  const restLines: string[] = [];
  for (const f of rest) {
    const line = `- ${VERDICT_LINE[f.verdict].split(' ')[0]} ${codeSpan(f.path)}: ${f.findings.length} findings`;
    if (used + line.length + 200 > limit) {
      restLines.push(`- … and ${rest.length - restLines.length} more files`);
      break;
    }
    restLines.push(line);
    used += line.length + 1;
  }
  const note = `\n_Trimmed to fit GitHub's comment limit: ${rest.length} of ${report.files.length} files are listed by name only; the job summary and the JSON report have everything._\n`;
  return cutToLimit(`${head}\n${note}\n${sections.join('\n')}\n${restLines.join('\n')}\n\n${tail}\n`, limit);
}
