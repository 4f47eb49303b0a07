import { markdownTable } from 'markdown-table';
import { METRIC_PATHS, metricValue as metricOf } from '../metrics/metric-path.js';
import { PER_DEVICE_METRICS, type MetricPath } from '../metrics/types.js';
import type { LocationMap, ModelSpec } from '../model.js';
import { filePatches, type FilePatch } from '../remedy/file-patch.js';
import { needsText, remedyNeeds } from '../remedy/needs.js';
import type {
  FileDecision,
  GateReport,
  JudgedFinding,
  MetricDelta,
  Remedy,
} from '../report/types.js';
import { formatInteger, formatNumber } from '../format/units.js';
import {
  codeBlock,
  codeId,
  codeSpan,
  encodePath,
  escapeMarkdown,
  htmlCode,
  linkablePath,
  linkUrl,
} from './escape.js';
import { fitText, perDeviceText } from './device-text.js';
import {
  limitStateMark,
  limitStateWord,
  MEMORY_CAUTION,
  MEMORY_METRICS,
  SEVERITY_MARK,
  SEVERITY_WORD,
  VERDICT_MARK,
  VERDICT_WORD,
} from './marks.js';
import { memoryChart } from './memory-chart.js';
import { formatDeltaChange, formatMetric } from '../format/metric-format.js';
import { COMMENT_MARKER, ESTIMATE_NOTICE, baseUnreadableText } from './notice.js';
import { metricParts, PASSES_NOTE } from './remedy-text.js';

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

/** Compact tables: GitHub renders them the same without the padding, and the comment stays short. */
const TABLE = { padding: false, alignDelimiters: false } as const;

function where(
  file: FileDecision,
  finding: Pick<JudgedFinding, 'line' | 'key'>,
  ctx: MarkdownContext,
): string {
  const label = finding.line !== null ? `line ${finding.line}` : 'file';
  const key = finding.key ? ` ${codeSpan(finding.key)}` : '';
  // A path git would never list (a `..` segment in a tampered report) is named, never linked.
  if (!ctx.blobUrl || !linkablePath(file.path)) return `${label}${key}`;
  const anchor = finding.line !== null ? `#L${finding.line}` : '';
  return `[${label}](${linkUrl(ctx.blobUrl)}/${encodePath(file.path)}${anchor})${key}`;
}

function severityTag(finding: JudgedFinding): string {
  const parts = [`${SEVERITY_MARK[finding.severity]} ${SEVERITY_WORD[finding.severity]}`];
  if (finding.standing) parts.push('standing');
  if (finding.waived) parts.push('waived');
  return parts.join(' · ');
}

function limitText(delta: MetricDelta): string {
  const limit = delta.limit;
  if (!limit) return '';
  const parts: string[] = [];
  if (limit.min !== undefined) parts.push(`≥ ${formatMetric(delta.metric, limit.min)}`);
  if (limit.max !== undefined) parts.push(`≤ ${formatMetric(delta.metric, limit.max)}`);
  if (limit.maxIncreasePct !== undefined)
    parts.push(`≤ +${formatNumber(limit.maxIncreasePct, 3)} %`);
  return parts.join(', ');
}

/** The number format the file computes positions in: its number-format rows are the ones that matter. */
function usedFormat(file: FileDecision): string {
  return file.head?.spec.dtypes.positions ?? file.base?.spec.dtypes.positions ?? 'fp32';
}

/** Rows of the change table: number-format rows only for the format in use (or under a limit); the rest go to the details. */
function shownDeltas(file: FileDecision): MetricDelta[] {
  const format = usedFormat(file);
  const one = oneDevice(file);
  return file.deltas.filter(
    (d) =>
      d.limit !== null ||
      ((!d.metric.startsWith('precision.') || d.metric.startsWith(`precision.${format}.`)) &&
        !(one && PER_DEVICE.has(d.metric))),
  );
}

/** Fixes besides the first listed per file in the comment. */
const MAX_ALTERNATIVES = 2;

/** Per-device metrics: on one device each equals its single-device figure, so they are not shown twice. */
const PER_DEVICE = new Set<string>(PER_DEVICE_METRICS);

/** Whether base and head each run on one device (a missing version counts as one). */
function oneDevice(file: FileDecision): boolean {
  return (file.base?.metrics.devices ?? 1) === 1 && (file.head?.metrics.devices ?? 1) === 1;
}

/** A value cell, with the assumption mark when the value rests on one and the memory mark beside memory figures. */
function valueCell(
  file: FileDecision,
  metric: MetricPath,
  value: number | null,
  side: 'base' | 'head',
): string {
  const text =
    metric === 'discriminationSpan' &&
    value === null &&
    (side === 'head' ? file.head : file.base)?.metrics.fastestWavelength != null
      ? `none within ${formatInteger((side === 'head' ? file.head : file.base)?.metrics.evaluationSpan ?? null)}`
      : formatMetric(metric, value);
  const assumed = side === 'head' && file.assumed?.metrics.includes(metric) ? ' *assumed*' : '';
  const memory = MEMORY_METRICS.has(metric) && value !== null ? ' †' : '';
  return `${text}${memory}${assumed}`;
}

/**
 * The two metric tables depend on the file alone, and `renderComment` builds every section again
 * for each trimming attempt: each table is built once per file.
 */
const tableMemo = {
  delta: new WeakMap<FileDecision, string>(),
  full: new WeakMap<FileDecision, string>(),
};

function memo(
  cache: WeakMap<FileDecision, string>,
  file: FileDecision,
  build: (file: FileDecision) => string,
): string {
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
  const rows = shownDeltas(file);
  if (rows.length === 0)
    return file.baseError && !file.base
      ? "_No change is measured: the base version did not read, so there is nothing to compare the head with; the head's values are below._"
      : '_No metric changed and none is limited by the policy._';
  return markdownTable(
    [
      ['metric', 'base', 'head', 'change', 'limit', 'state'],
      ...rows.map((d) => [
        codeId(d.metric),
        valueCell(file, d.metric, d.base, 'base'),
        valueCell(file, d.metric, d.head, 'head'),
        formatDeltaChange(d),
        limitText(d),
        `${limitStateMark(d)} ${escapeMarkdown(limitStateWord(d))}`.trim(),
      ]),
    ],
    { ...TABLE, align: ['l', 'r', 'r', 'r', 'l', 'l'] },
  );
}

function otherMetrics(file: FileDecision): string {
  return memo(tableMemo.full, file, buildOtherMetrics);
}

/** Every metric not in the change table, base and head side by side, collapsed. */
function buildOtherMetrics(file: FileDecision): string {
  const shown = new Set(shownDeltas(file).map((d) => d.metric));
  const one = oneDevice(file);
  const rows = METRIC_PATHS.filter(
    (metric) => !shown.has(metric) && !(one && PER_DEVICE.has(metric)),
  )
    .map((metric) => {
      const b = file.base ? metricOf(file.base.metrics, metric) : null;
      const h = file.head ? metricOf(file.head.metrics, metric) : null;
      return { metric, b, h };
    })
    .filter((r) => r.b !== null || r.h !== null)
    .map((r) => {
      const head = valueCell(file, r.metric, r.h, 'head');
      const base = file.base ? valueCell(file, r.metric, r.b, 'base') : '—';
      // An unchanged value is written once: `=` under head means "as base".
      return [codeId(r.metric), base, file.base && base === head ? '=' : head];
    });
  if (rows.length === 0) return '';
  return `<details><summary>Other metrics</summary>\n\n${markdownTable([['metric', 'base', 'head'], ...rows], { ...TABLE, align: ['l', 'r', 'r'] })}\n\n</details>`;
}

// ---- remedies in the file's own keys ----------------------------------------------------------

function lineWords(lines: number[]): string {
  return lines.length === 1 ? `line ${lines[0]}` : `lines ${lines.join(', ')}`;
}

/** Where a patch goes, in words: `Set on line 20 of the file:`, `Add to the policy's serving block for this file (…):`. */
function patchLead(patch: FilePatch, finding: JudgedFinding): string {
  if (patch.target === 'policy')
    return `In the serving block of ${codeSpan(patch.where)} that applies to this file:`;
  const existing = patch.edits.filter((e) => e.line !== null).map((e) => e.line as number);
  const added = patch.edits.some((e) => e.line === null);
  const parts: string[] = [];
  if (existing.length > 0) parts.push(`set on ${lineWords([...new Set(existing)])}`);
  if (added) parts.push(finding.line !== null ? `add after line ${finding.line}` : 'add');
  const text = parts.join(', ');
  return `${text.charAt(0).toUpperCase()}${text.slice(1)}:`;
}

function patchBlock(patch: FilePatch): string {
  return codeBlock(patch.snippet, patch.format);
}

function locationsOf(file: FileDecision): LocationMap {
  return (file.head as { locations?: LocationMap } | null)?.locations ?? {};
}

/** The patches of a remedy for this file (a report read back from JSON has no locations: default keys then). */
export function remedyPatches(file: FileDecision, remedy: Remedy): FilePatch[] {
  if (!file.head) return [];
  return filePatches(
    remedy.change,
    file.dialect ?? 'checkpoint',
    file.head.spec,
    locationsOf(file),
    file.path,
  );
}

function metricsShort(remedy: Remedy, max: number): string {
  return metricParts(remedy.metrics)
    .slice(0, max)
    .map((m) => `${escapeMarkdown(m.metric)} ${escapeMarkdown(m.value)}`)
    .join(', ');
}

/** The fix under a blocking finding: what it gives, what it still needs, and the change ready to paste. */
function fixLines(file: FileDecision, finding: JudgedFinding): string[] {
  if (finding.remedy === undefined) return [];
  if (finding.remedy === null)
    return [
      `⛔ No fix found that passes these rules: ${escapeMarkdown(finding.remedyWhyNot ?? 'none found')}`,
    ];
  const spec = file.head?.spec as ModelSpec;
  const remedy = finding.remedy;
  const cost = remedy.cost ? `; costs ${escapeMarkdown(remedy.cost)}` : '';
  const lines = [
    `✓ **Fix**, passes these rules (${metricsShort(remedy, 3)})${cost}; still needs ${escapeMarkdown(needsText(remedyNeeds(remedy.change, spec)))}.`,
  ];
  for (const patch of remedyPatches(file, remedy))
    lines.push(patchLead(patch, finding), patchBlock(patch));
  return lines;
}

/** One-line alternatives, in the file's own keys. */
function alternativeLine(file: FileDecision, remedy: Remedy): string {
  const spec = file.head?.spec as ModelSpec;
  const keys = remedyPatches(file, remedy)
    .map((patch) =>
      patch.edits
        .map((e) => {
          const at =
            patch.target === 'policy'
              ? ` (policy ${codeSpan(patch.where)} serving)`
              : e.line !== null
                ? ` (line ${e.line})`
                : '';
          return `${codeSpan(`${e.key.split('.').pop()}: ${typeof e.value === 'string' ? e.value : String(e.value)}`)}${at}`;
        })
        .join(', '),
    )
    .join(', ');
  const cost = remedy.cost ? `; costs ${escapeMarkdown(remedy.cost)}` : '';
  const needs = remedyNeeds(remedy.change, spec);
  // A serving setting needs nothing else: said once, under the first fix, not again for each alternative.
  return `${keys} ⇒ ${metricsShort(remedy, 3)}${cost}${needs.length > 0 ? `; still needs ${escapeMarkdown(needsText(needs))}` : ''}`;
}

// ---- sections -------------------------------------------------------------------------------

function headline(report: GateReport): string {
  const counts = `${formatInteger(report.blocking)} blocking, ${formatInteger(report.warnings)} warning${report.warnings === 1 ? '' : 's'}`;
  return `## context-reach · ${VERDICT_MARK[report.verdict]} **${VERDICT_WORD[report.verdict]}** · ${counts}`;
}

/** Blocking findings listed at the top; the rest stay in their file sections (and the JSON report). */
export const BLOCKERS_LISTED = 20;

function blockers(report: GateReport, ctx: MarkdownContext): string[] {
  const all = report.files.flatMap((file) =>
    file.findings.filter((f) => f.counts === 'block').map((f) => ({ file, f })),
  );
  if (all.length === 0) return [];
  const rows = all.slice(0, BLOCKERS_LISTED);
  const more = all.length - rows.length;
  const out = ['### What blocks, and the fix', ''];
  for (const [i, { file, f }] of rows.entries()) {
    const metric = f.metric ? ` (${codeSpan(f.metric)})` : '';
    out.push(
      `**${i + 1}.** ${codeSpan(file.path)} ${where(file, f, ctx)} · ${codeId(f.rule)}${metric}  `,
      escapeMarkdown(f.message),
      '',
    );
    const fix = fixLines(file, f);
    if (fix.length > 0) out.push(...fix, '');
  }
  for (const file of report.files) {
    const together = file.remedyTogether;
    if (!together) continue;
    out.push(
      together.passes
        ? `All first fixes of ${codeSpan(file.path)} applied together pass these rules: nothing blocks.`
        : `All first fixes of ${codeSpan(file.path)} applied together still block on ${together.stillBlocking.map((b) => escapeMarkdown(b)).join(', ')}.`,
      '',
    );
  }
  if (more > 0)
    out.push(
      `… and ${more} more blocking finding${more === 1 ? '' : 's'}, listed under their files below.`,
      '',
    );
  if (rows.some(({ f }) => f.remedy)) out.push(`<sub>${escapeMarkdown(PASSES_NOTE)}</sub>`, '');
  return out;
}

function fileSummary(file: FileDecision): string {
  const count = (s: 'block' | 'warn' | 'info') =>
    file.findings.filter((f) => f.severity === s).length;
  const parts = [
    count('block') && `${count('block')} blocking`,
    count('warn') && `${count('warn')} warning${count('warn') === 1 ? '' : 's'}`,
    count('info') && `${count('info')} note${count('info') === 1 ? '' : 's'}`,
  ].filter(Boolean);
  // A <summary> line is an HTML block: no markdown escapes there, HTML entities only.
  const status =
    file.status === 'renamed' && file.previousPath
      ? `, renamed from ${htmlCode(file.previousPath)}`
      : file.status === 'added'
        ? ', new file, judged on its own'
        : file.baseError && !file.base
          ? ', base version unreadable, head judged without it'
          : '';
  return `${VERDICT_MARK[file.verdict]} ${htmlCode(file.path)}${status}: ${parts.length > 0 ? parts.join(', ') : 'no findings'}`;
}

export interface FileSectionParts {
  chart: boolean;
  details: boolean;
  maxFindings: number;
}

/** Whether a file has memory at issue: a memory finding, or a finding on a memory metric (its chart is then drawn). */
function memoryAtIssue(file: FileDecision): boolean {
  return file.findings.some(
    (f) =>
      f.rule === 'memory-over-budget' ||
      (f.metric !== undefined && f.metric !== null && MEMORY_METRICS.has(f.metric)),
  );
}

/**
 * The parts of a form that change this file's section: a chart only where one is drawn, details
 * only with a head version, a cap on findings only when the file has more than it. `fileSection`
 * gives the same text for a form and for its effective parts.
 */
export function effectiveParts(file: FileDecision, parts: FileSectionParts): FileSectionParts {
  const others = file.findings.filter((f) => f.counts !== 'block').length;
  return {
    chart: parts.chart && file.head !== null && file.head !== undefined && memoryAtIssue(file),
    details: parts.details && file.head !== null && file.head !== undefined,
    maxFindings: others <= parts.maxFindings ? Infinity : parts.maxFindings,
  };
}

export function fileSection(
  file: FileDecision,
  ctx: MarkdownContext,
  parts: FileSectionParts,
): string {
  const lines = [
    `<details${file.verdict === 'ok' ? '' : ''}><summary>${fileSummary(file)}</summary>`,
    '',
  ];
  if (file.headError)
    lines.push(`Could not be read at head: ${escapeMarkdown(file.headError.message)}`, '');
  const baseNote = baseUnreadableText(file);
  if (baseNote !== null) lines.push(`**${escapeMarkdown(baseNote)}**`, '');
  else if (file.baseError)
    lines.push(
      `_The base version could not be read (${escapeMarkdown(file.baseError.message)}); the head is judged on its own._`,
      '',
    );
  if (file.assumed)
    lines.push(
      `*Assumed:* ${escapeMarkdown(file.assumed.reason)} Values marked *assumed* rest on it.`,
      '',
    );
  if (file.head) {
    lines.push(deltaTable(file), '');
    // The reserve is said once, in the memory footnote (†) the fit points to.
    const fit = [
      perDeviceText(file.head.spec, file.head.metrics),
      fitText(file.head.spec, file.head.metrics, false),
    ].filter((t): t is string => t !== null);
    if (fit.length > 0) lines.push(`Head: ${fit.map((t) => escapeMarkdown(t)).join('; ')} †.`, '');
  }
  // Blocking findings are at the top with their fixes; the others are listed here once.
  const others = file.findings.filter((f) => f.counts !== 'block');
  const listed = others.slice(0, parts.maxFindings);
  for (const f of listed) {
    const metric = f.metric ? ` (${codeSpan(f.metric)})` : '';
    lines.push(
      `- ${severityTag(f)} ${codeId(f.rule)}${metric} ${where(file, f, ctx)}: ${escapeMarkdown(f.message)}`,
    );
  }
  if (listed.length < others.length)
    lines.push(
      `- … ${others.length - listed.length} more findings are in the job summary and the JSON report.`,
    );
  if (listed.length > 0) lines.push('');
  // One line per distinct change, naming every finding it fixes: the same fix is never listed twice.
  const alternatives = new Map<string, { rules: string[]; remedy: Remedy }>();
  for (const f of file.findings.filter((x) => x.counts === 'block')) {
    for (const remedy of f.remedyAlternatives ?? []) {
      const key = JSON.stringify(Object.entries(remedy.change).sort());
      const entry = alternatives.get(key) ?? { rules: [], remedy };
      entry.rules.push(codeId(f.rule));
      alternatives.set(key, entry);
    }
  }
  if (alternatives.size > 0) {
    lines.push('Other fixes that pass these rules:');
    // Two at most here: the HTML and JSON reports list every one.
    const listed = [...alternatives.values()];
    for (const { rules, remedy } of listed.slice(0, MAX_ALTERNATIVES))
      lines.push(`- for ${rules.join(', ')}: ${alternativeLine(file, remedy)}`);
    if (listed.length > MAX_ALTERNATIVES)
      lines.push(`- ${listed.length - MAX_ALTERNATIVES} more in the HTML and JSON reports.`);
    lines.push('');
  }
  // The chart where memory is at issue (a memory finding or a memory limit crossed); the HTML report draws every file's.
  if (parts.chart && file.head && memoryAtIssue(file)) {
    const chart = memoryChart(file);
    if (chart) lines.push(chart, '');
  }
  if (parts.details && file.head) {
    const other = otherMetrics(file);
    if (other) lines.push(other, '');
  }
  lines.push('</details>', '');
  return lines.join('\n');
}

/**
 * Last resort when even the shortest form is over the limit (thousands of files, or very long
 * paths): cut at a line, close what the cut left open, and say so.
 */
function cutToLimit(body: string, limit: number): string {
  if (body.length <= limit) return body;
  const note =
    "\n\n_Cut at GitHub's comment limit; the job summary and the JSON report have everything._\n";
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
  lines.push(
    `Judged ${judged} changed model config${judged === 1 ? '' : 's'} between ${codeId(report.base.slice(0, 12))} (base) and ${codeId(report.head.slice(0, 12))} (head).`,
    '',
  );
  if (report.policy.source === 'built-in') {
    lines.push(
      `> [!NOTE]\n> No policy file at ${codeSpan(report.policy.path)} on the base commit: built-in rules only, no numeric limits.`,
      '',
    );
  }
  if (report.waiver.applied && report.waiver.label) {
    lines.push(
      `> [!WARNING]\n> The waiver label ${codeSpan(report.waiver.label)} is on this pull request: ${report.waiver.waivedBlocks} blocking finding${report.waiver.waivedBlocks === 1 ? '' : 's'} counted as warnings.`,
      '',
    );
  }
  if (ctx.unannotated && ctx.unannotated > 0) {
    lines.push(
      `_${ctx.unannotated} findings were not shown as line annotations (GitHub shows at most 10 errors and 10 warnings per step); all are listed below._`,
      '',
    );
  }
  return lines;
}

/** Notes that come after the first screen: the policy change (old → new) and the run's notices. */
function notes(report: GateReport): string[] {
  const lines: string[] = [];
  if (report.policy.changedInHead) {
    const changes = report.policy.limitChanges ?? [];
    const what =
      changes.length > 0
        ? ` After merge: ${changes.map((c) => codeSpan(c)).join(', ')}.`
        : ' It judges alike after merge.';
    lines.push(
      `> [!NOTE]\n> This pull request changes the policy ${codeSpan(report.policy.path)}; this run judged by the base commit's policy.${what}`,
      '',
    );
  }
  for (const notice of report.notices) lines.push(`> [!NOTE]\n> ${escapeMarkdown(notice)}`, '');
  return lines;
}

function footer(report: GateReport, ctx: MarkdownContext): string[] {
  const lines: string[] = [];
  if (report.deleted.length > 0) {
    lines.push(
      `Deleted, not judged: ${report.deleted.map((d) => codeSpan(d.path)).join(', ')}.`,
      '',
    );
  }
  if (ctx.htmlReportUrl) {
    const at = ctx.htmlReportWhere ? ` ${escapeMarkdown(ctx.htmlReportWhere)}` : '';
    lines.push(
      `Charts, findings and fixes: [the HTML report](${linkUrl(ctx.htmlReportUrl)})${at}.`,
      '',
    );
  }
  const memory = report.files.some(
    (f) => f.head && (f.head.metrics.memoryBytes !== null || f.head.metrics.fitSequences !== null),
  );
  lines.push(
    `<sub>${memory ? `† Memory: ${escapeMarkdown(MEMORY_CAUTION)}. ` : ''}${escapeMarkdown(ESTIMATE_NOTICE)}</sub>`,
  );
  return lines;
}

/**
 * The pull-request comment (and job summary). The first screen holds the verdict, what blocks and
 * the fix for each, in the file's own keys; everything else (notes, each file's metrics, other
 * findings and fixes, charts) follows in collapsed sections, each said once. When the whole
 * report is over the limit, the least important parts go first: other metrics, then charts,
 * then findings beyond the first few, then whole file sections; the comment says what was left out.
 */
export function renderComment(report: GateReport, ctx: MarkdownContext = {}): string {
  return renderWith(report, ctx, new WeakMap());
}

/**
 * `renderComment` for several reports or limits in one context (`ctx` without `limit`): each
 * file section is rendered once for all the calls, as one call renders it once for all its
 * forms. The action renders its comment and then its job summary of the same files; the texts
 * are those of `renderComment(report, { ...ctx, limit })`.
 */
export function commentRenderer(
  ctx: Omit<MarkdownContext, 'limit'> = {},
): (report: GateReport, limit?: number) => string {
  const sections: SectionCache = new WeakMap();
  return (report, limit) =>
    renderWith(report, limit === undefined ? { ...ctx } : { ...ctx, limit }, sections);
}

/** Each file's rendered sections, by the form that decides them (`effectiveParts`). */
type SectionCache = WeakMap<FileDecision, Map<string, string>>;

function renderWith(report: GateReport, ctx: MarkdownContext, rendered: SectionCache): string {
  const limit = ctx.limit ?? COMMENT_LIMIT;
  const attempts: FileSectionParts[] = [
    { chart: true, details: true, maxFindings: Infinity },
    { chart: true, details: false, maxFindings: Infinity },
    { chart: false, details: false, maxFindings: Infinity },
    { chart: false, details: false, maxFindings: 5 },
  ];
  const head = [
    COMMENT_MARKER,
    headline(report),
    '',
    ...preamble(report, ctx),
    ...blockers(report, ctx),
    ...notes(report),
  ].join('\n');
  const tail = footer(report, ctx).join('\n');
  // A file's section depends on the form only through `effectiveParts`: most sections are the
  // same in several forms, and each distinct one is rendered once per call, or per renderer
  // (a 3,000-file summary rendered about five megabytes of sections for one megabyte kept).
  const sectionOf = (file: FileDecision, parts: FileSectionParts): string => {
    const effective = effectiveParts(file, parts);
    const key = `${effective.chart}|${effective.details}|${effective.maxFindings}`;
    let forms = rendered.get(file);
    if (forms === undefined) rendered.set(file, (forms = new Map<string, string>()));
    let section = forms.get(key);
    if (section === undefined) forms.set(key, (section = fileSection(file, ctx, effective)));
    return section;
  };
  for (const [index, parts] of attempts.entries()) {
    const trimNote =
      index === 0
        ? ''
        : `\n_Trimmed to fit GitHub's comment limit: ${[
            !parts.details && 'other metrics',
            !parts.chart && 'charts',
            parts.maxFindings !== Infinity &&
              `findings past the first ${parts.maxFindings} per file`,
          ]
            .filter(Boolean)
            .join(
              ', ',
            )} are left out here; the job summary and the JSON report have everything._\n`;
    // Sections are rendered only while the body can still fit (`length` never exceeds the
    // body's): a form over the limit is dropped as soon as it is (3,000 files were rendered in
    // full for every form).
    const sections: string[] = [];
    let length = head.length + trimNote.length + tail.length + 3;
    for (const file of report.files) {
      if (length > limit) break;
      const section = sectionOf(file, parts);
      sections.push(section);
      length += section.length + 1;
    }
    if (length > limit) continue;
    const body = `${head}\n${trimNote}\n${sections.join('\n')}\n${tail}\n`;
    if (body.length <= limit) return body;
  }
  // Still too long: as many whole file sections as fit, the rest named in one line each.
  const minimal = attempts[attempts.length - 1]!;
  const sections: string[] = [];
  let used = head.length + tail.length + 400;
  let shown = 0;
  for (const file of report.files) {
    const section = sectionOf(file, minimal);
    if (used + section.length > limit) break;
    sections.push(section);
    used += section.length;
    shown += 1;
  }
  const rest = report.files.slice(shown);
  const restLines: string[] = [];
  for (const f of rest) {
    const line = `- ${fileSummary(f)}`;
    if (used + line.length + 200 > limit) {
      restLines.push(`- … and ${rest.length - restLines.length} more files`);
      break;
    }
    restLines.push(line);
    used += line.length + 1;
  }
  const note = `\n_Trimmed to fit GitHub's comment limit: ${rest.length} of ${report.files.length} files are listed by name only; the job summary and the JSON report have everything._\n`;
  return cutToLimit(
    `${head}\n${note}\n${sections.join('\n')}\n${restLines.join('\n')}\n\n${tail}\n`,
    limit,
  );
}
