/**
 * The standalone HTML report of the gate: one self-contained page (inline style sheet, no
 * script, nothing fetched: a Content-Security-Policy forbids it), readable in light and dark
 * colour schemes and printable. Per changed config: what changed at a glance, the position-code
 * spectrum, the similarity curve and memory against span for base and head, then the findings
 * with their proven remedies and the table of changed metrics. Every path, key, value and
 * message from the pull request is escaped (`html/markup.ts` escapes by default).
 */
import type { FileDecision, GateReport, MetricDelta, Verdict } from '../compare/decide.js';
import type { FileReport } from '../inspect.js';
import { computeMetrics } from '../metrics/compute.js';
import type { ModelSpec } from '../model.js';
import { applyChange, changeEntries } from '../remedy/apply-change.js';
import type { Change } from '../remedy/types.js';
import { VERSION } from '../version.js';
import { changeCards } from './html/change-cards.js';
import { findingsSection, fixSummary } from './html/findings-html.js';
import { fragment, h, trusted, type Markup } from './html/markup.js';
import { memorySpanChart, type MemoryVariant } from './html/memory-span-chart.js';
import { fitText, perDeviceText } from './device-text.js';
import { similarityChart, similarityOf } from './html/similarity-chart.js';
import { spectrumChart, spectrumOf } from './html/spectrum-chart.js';
import { REPORT_CSS } from './html/style.js';
import { formatChange, formatMetric } from './metric-format.js';
import { ESTIMATE_NOTICE } from './notice.js';
import { changeParts } from './remedy-text.js';
import { formatInteger, formatNumber } from '../units.js';

export interface HtmlReportOptions {
  /** Page title (default: `context-reach report`). */
  title?: string;
}

const VERDICT_WORD: Record<Verdict, string> = { block: 'Blocked', warn: 'Passes with warnings', ok: 'Passes' };

/** Nothing may load or run: styles inline, images only as data, no script, no frame, no form target. */
const CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'";

const MEMORY_KEYS = new Set(['serving.sequences', 'dtypes.cache', 'kvHeads', 'serving.tensorParallel', 'serving.pipelineParallel', 'dtypes.weights', 'quantization.groupSize']);

/** `factor 8, sequences 5`: a remedy short enough for a chart legend. */
function shortChange(change: Change, spec: ModelSpec): string {
  return changeParts(change, spec).map((p) => `${p.key.split('.').pop()} ${p.after}`).join(', ');
}

/** The head with the first remedy that changes the position code applied, for the spectrum and the similarity curve. */
function positionVariant(file: FileDecision): { report: FileReport; label: string } | null {
  const head = file.head;
  if (!head) return null;
  for (const finding of file.findings) {
    const change = finding.remedy?.change;
    if (!change || !changeEntries(change).every(([key]) => key.startsWith('position.'))) continue;
    const spec = applyChange(head.spec, change);
    return { report: { ...head, spec, metrics: computeMetrics(spec) }, label: `with the remedy (${shortChange(change, head.spec)})` };
  }
  return null;
}

/** The head with the first remedy that changes the memory applied, for the memory chart. */
function memoryVariant(file: FileDecision): MemoryVariant | null {
  const spec = file.head?.spec;
  if (!spec) return null;
  for (const finding of file.findings) {
    const change: Change | undefined = finding.remedy?.change;
    if (!change || !changeEntries(change).every(([key]) => MEMORY_KEYS.has(key))) continue;
    return { spec: applyChange(spec, change), label: `head with the remedy (${shortChange(change, spec)})` };
  }
  return null;
}

function limitText(delta: MetricDelta): string {
  const limit = delta.limit;
  if (!limit) return '';
  return [
    limit.min !== undefined ? `≥ ${formatMetric(delta.metric, limit.min)}` : '',
    limit.max !== undefined ? `≤ ${formatMetric(delta.metric, limit.max)}` : '',
    limit.maxIncreasePct !== undefined ? `≤ +${formatNumber(limit.maxIncreasePct, 3)} %` : '',
  ].filter(Boolean).join(', ');
}

function deltaTable(file: FileDecision): Markup | null {
  if (file.deltas.length === 0) return null;
  return h('table', { class: 'deltas' },
    h('thead', null, h('tr', null, ['metric', 'base', 'head', 'change', 'limit', 'state'].map((c) => h('th', null, c)))),
    h('tbody', null, file.deltas.map((d) => h('tr', { class: d.state === 'crossed' ? 'crossed' : null },
      h('td', null, h('code', null, d.metric)),
      h('td', null, formatMetric(d.metric, d.base)),
      h('td', null, formatMetric(d.metric, d.head)),
      h('td', null, formatChange(d.metric, d.change, d.changePct)),
      h('td', null, limitText(d)),
      h('td', null, d.state === 'crossed' ? `crossed (${d.limit?.severity ?? 'block'})` : d.state === 'ok' ? 'within' : '')))));
}

/** The memory fit in words: per device when a replica spans several, and what the reserve keeps. */
function fitParagraph(file: FileDecision): Markup | null {
  if (!file.head) return null;
  const parts = [perDeviceText(file.head.spec, file.head.metrics), fitText(file.head.spec, file.head.metrics)].filter((t): t is string => t !== null);
  return parts.length === 0 ? null : h('p', { class: 'muted' }, `Head: ${parts.join('; ')}.`);
}

function statusText(file: FileDecision): string {
  if (file.status === 'renamed' && file.previousPath) return `renamed from ${file.previousPath}`;
  if (file.status === 'added') return 'new file, judged on its own';
  return file.status;
}

function fileSection(file: FileDecision, index: number): Markup {
  const id = `file-${index + 1}`;
  const variant = positionVariant(file);
  const variantSpectrum = variant ? spectrumOf(variant.report) : null;
  const variantCurve = variant ? similarityOf(variant.report) : null;
  const headCurve = similarityOf(file.head);
  const charts = [
    spectrumChart(id, spectrumOf(file.base), spectrumOf(file.head), variant && variantSpectrum ? { spectrum: variantSpectrum, label: variant.label } : null),
    memorySpanChart(id, file.base, file.head, memoryVariant(file)),
    similarityChart(id, similarityOf(file.base), headCurve, variant && variantCurve ? { series: variantCurve, label: variant.label } : null),
  ].filter((c): c is Markup => c !== null);
  const span = file.head?.metrics.evaluationSpan ?? null;
  const skipped = headCurve === null && file.head?.metrics.fastestWavelength != null && span !== null
    ? h('p', { class: 'muted' }, `The similarity curve over ${formatInteger(span)} offsets is not drawn: visiting every offset would take too long for a report (discriminationSpan and separationFloor are in the table).`)
    : null;
  return h('section', { class: 'file', id, 'data-file': index + 1 },
    h('header', null,
      h('span', { class: `chip ${file.verdict}` }, VERDICT_WORD[file.verdict]),
      h('h2', null, file.path),
      h('span', { class: 'muted' }, statusText(file))),
    file.headError ? h('p', null, `Could not be read at head: ${file.headError.message}`) : null,
    file.baseError ? h('p', { class: 'muted' }, `The base version could not be read (${file.baseError.message}); the head is judged on its own.`) : null,
    fixSummary(file),
    changeCards(file),
    fitParagraph(file),
    charts.length > 0 ? h('div', { class: 'charts' }, charts) : null,
    skipped,
    findingsSection(file),
    file.deltas.length > 0 ? h('h3', null, 'Metrics that changed or are limited') : null,
    deltaTable(file));
}

function banner(report: GateReport): Markup {
  const remedies = report.files.flatMap((f) => f.findings).filter((f) => f.remedy).length;
  const blocking = report.files.flatMap((f) => f.findings).filter((f) => f.severity === 'block').length;
  return h('div', { class: `banner ${report.verdict}` },
    h('span', { class: `verdict ${report.verdict}` }, VERDICT_WORD[report.verdict]),
    h('span', null, `${formatInteger(report.blocking)} blocking · ${formatInteger(report.warnings)} warning${report.warnings === 1 ? '' : 's'} · ${report.files.length} changed model config${report.files.length === 1 ? '' : 's'}`),
    blocking > 0 ? h('span', null, `${remedies} of ${blocking} blocking finding${blocking === 1 ? '' : 's'} with a proven remedy`) : null);
}

function notes(report: GateReport): Markup | null {
  const items: string[] = [];
  if (report.policy.source === 'built-in') items.push(`No policy file at ${report.policy.path} on the base commit: built-in rules only, no numeric limits.`);
  if (report.policy.changedInHead) items.push(`This pull request changes the policy ${report.policy.path}; it was judged by the base commit's policy, and the change applies after merge.`);
  if (report.waiver.applied && report.waiver.label) items.push(`The waiver label ${report.waiver.label} is on this pull request: ${report.waiver.waivedBlocks} blocking finding${report.waiver.waivedBlocks === 1 ? '' : 's'} counted as warnings.`);
  items.push(...report.notices);
  if (report.deleted.length > 0) items.push(`Deleted, not judged: ${report.deleted.map((d) => d.path).join(', ')}.`);
  return items.length > 0 ? h('ul', { class: 'notes' }, items.map((t) => h('li', null, t))) : null;
}

function contents(report: GateReport): Markup | null {
  if (report.files.length < 2) return null;
  return h('nav', null, h('ul', { class: 'notes' }, report.files.map((f, i) =>
    h('li', null, h('span', { class: `chip ${f.verdict}` }, VERDICT_WORD[f.verdict]), ' ', h('a', { href: `#file-${i + 1}` }, f.path)))));
}

/** The whole page, as one string. */
export function renderHtmlReport(report: GateReport, options: HtmlReportOptions = {}): string {
  const title = options.title ?? 'context-reach report';
  const page = h('html', { lang: 'en' },
    h('head', null,
      h('meta', { charset: 'utf-8' }),
      h('meta', { name: 'viewport', content: 'width=device-width, initial-scale=1' }),
      h('meta', { 'http-equiv': 'Content-Security-Policy', content: CSP }),
      h('meta', { name: 'color-scheme', content: 'light dark' }),
      h('title', null, `${title} · ${VERDICT_WORD[report.verdict]}`),
      h('style', null, trusted(REPORT_CSS))),
    h('body', null, h('main', null,
      h('header', null,
        h('h1', null, title),
        h('div', { class: 'muted mono' }, `base ${report.base.slice(0, 12)} → head ${report.head.slice(0, 12)}`)),
      banner(report),
      notes(report),
      contents(report),
      report.files.length === 0 ? h('p', null, 'No changed model config to judge.') : fragment(report.files.map(fileSection)),
      h('footer', null, h('p', null, ESTIMATE_NOTICE), h('p', null, `context-reach ${VERSION}`)))));
  return `<!doctype html>\n${page.html}\n`;
}
