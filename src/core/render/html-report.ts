/**
 * The standalone HTML report of the gate: one self-contained page (inline style sheet, no
 * script, nothing fetched: a Content-Security-Policy forbids it), readable in light and dark
 * colour schemes and printable. Per changed config: what changed at a glance, the position-code
 * spectrum, the similarity curve and memory against span for base and head, then the findings
 * with their proven remedies and the table of changed metrics. Every path, key, value and
 * message from the pull request is escaped (`html/markup.ts` escapes by default).
 */
import { formatInteger, formatNumber } from '../format/units.js';
import type { FileReport } from '../inspect.js';
import { computeMetrics } from '../metrics/compute.js';
import type { LocationMap, ModelSpec } from '../model.js';
import { filePatches } from '../remedy/file-patch.js';
import { applyChange, changeEntries } from '../remedy/apply-change.js';
import type { Change, FileDecision, GateReport, MetricDelta } from '../report/types.js';
import { VERSION } from '../version.js';
import { changeCards } from './html/change-cards.js';
import { findingsSection, fixSummary } from './html/findings-html.js';
import { fragment, h, trusted, type Markup } from './html/markup.js';
import { memorySpanChart, type MemoryVariant } from './html/memory-span-chart.js';
import { fitText, perDeviceText } from './device-text.js';
import { similarityChart, similarityOf } from './html/similarity-chart.js';
import { spectrumChart, spectrumOf } from './html/spectrum-chart.js';
import { REPORT_CSS } from './html/style.js';
import { formatDeltaChange, formatMetric } from '../format/metric-format.js';
import { limitStateWord, MEMORY_CAUTION, MEMORY_METRICS, VERDICT_WORD } from './marks.js';
import { ESTIMATE_NOTICE } from './notice.js';
import { changeParts } from './remedy-text.js';

export interface HtmlReportOptions {
  /** Page title (default: `context-reach report`). */
  title?: string;
}

/** Nothing may load or run: styles inline, images only as data, no script, no frame, no form target. */
const CSP =
  "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'";

const MEMORY_KEYS = new Set([
  'serving.sequences',
  'dtypes.cache',
  'kvHeads',
  'serving.tensorParallel',
  'serving.pipelineParallel',
  'dtypes.weights',
  'quantization.groupSize',
]);

/** `factor 8, sequences 5`: a remedy short enough for a chart legend, in the file's own key names. */
function shortChange(change: Change, spec: ModelSpec, file?: FileDecision): string {
  if (file) {
    const locations = (file.head as { locations?: LocationMap } | null)?.locations ?? {};
    const edits = filePatches(
      change,
      file.dialect ?? 'checkpoint',
      spec,
      locations,
      file.path,
    ).flatMap((p) => p.edits);
    if (edits.length > 0)
      return edits.map((e) => `${e.key.split('.').pop()} ${e.value}`).join(', ');
  }
  return changeParts(change, spec)
    .map((p) => `${p.key.split('.').pop()} ${p.after}`)
    .join(', ');
}

/** The head with the first remedy that changes the position code applied, for the spectrum and the similarity curve. */
function positionVariant(file: FileDecision): { report: FileReport; label: string } | null {
  const head = file.head;
  if (!head) return null;
  for (const finding of file.findings) {
    const change = finding.remedy?.change;
    if (!change || !changeEntries(change).every(([key]) => key.startsWith('position.'))) continue;
    const spec = applyChange(head.spec, change);
    return {
      report: { ...head, spec, metrics: computeMetrics(spec) },
      label: `with the fix (${shortChange(change, head.spec, file)})`,
    };
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
    return {
      spec: applyChange(spec, change),
      label: `head with the fix (${shortChange(change, spec, file)})`,
    };
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
  ]
    .filter(Boolean)
    .join(', ');
}

/** Number-format rows for the format the file computes positions in (or under a limit); the others are noise here. */
function shownDeltas(file: FileDecision): MetricDelta[] {
  const format = file.head?.spec.dtypes.positions ?? 'fp32';
  return file.deltas.filter(
    (d) =>
      d.limit !== null ||
      !d.metric.startsWith('precision.') ||
      d.metric.startsWith(`precision.${format}.`),
  );
}

function valueMarkup(file: FileDecision, d: MetricDelta, side: 'base' | 'head'): Markup | string {
  const report = side === 'head' ? file.head : file.base;
  const value = side === 'head' ? d.head : d.base;
  const text =
    d.metric === 'discriminationSpan' && value === null && report?.metrics.fastestWavelength != null
      ? `none within ${formatInteger(report.metrics.evaluationSpan)}`
      : formatMetric(d.metric, value);
  const memory = MEMORY_METRICS.has(d.metric) && value !== null ? ' †' : '';
  if (side === 'head' && file.assumed?.metrics.includes(d.metric))
    return h('span', { class: 'assumed' }, `${text}${memory}`);
  return `${text}${memory}`;
}

function deltaTable(file: FileDecision): Markup | null {
  const rows = shownDeltas(file);
  if (rows.length === 0) return null;
  const memory = rows.some((d) => MEMORY_METRICS.has(d.metric));
  return h(
    'div',
    null,
    h(
      'table',
      { class: 'deltas' },
      h(
        'thead',
        null,
        h(
          'tr',
          null,
          ['metric', 'base', 'head', 'change', 'limit'].map((c) => h('th', null, c)),
          h('th', { class: 'state' }, 'state'),
        ),
      ),
      h(
        'tbody',
        null,
        rows.map((d) =>
          h(
            'tr',
            { class: d.state === 'crossed' ? `crossed ${d.limit?.severity ?? 'block'}` : null },
            h('td', null, h('code', null, d.metric)),
            h('td', null, valueMarkup(file, d, 'base')),
            h('td', null, valueMarkup(file, d, 'head')),
            h('td', null, formatDeltaChange(d)),
            h('td', null, limitText(d)),
            h(
              'td',
              { class: 'state' },
              d.state === 'crossed'
                ? h('span', { class: `chip ${d.limit?.severity ?? 'block'}` }, limitStateWord(d))
                : d.state === 'ok'
                  ? h('span', { class: 'chip ok' }, 'within')
                  : limitStateWord(d),
            ),
          ),
        ),
      ),
    ),
    memory ? h('p', { class: 'caution' }, `† Memory figures: ${MEMORY_CAUTION}.`) : null,
  );
}

function assumedNote(file: FileDecision): Markup | null {
  if (!file.assumed) return null;
  return h(
    'p',
    { class: 'caution' },
    h('b', null, 'Assumed: '),
    file.assumed.reason,
    ' Values resting on it are marked (assumed).',
  );
}

/** The memory fit in words: per device when a replica spans several, and what the reserve keeps. */
function fitParagraph(file: FileDecision): Markup | null {
  if (!file.head) return null;
  const parts = [
    perDeviceText(file.head.spec, file.head.metrics),
    fitText(file.head.spec, file.head.metrics),
  ].filter((t): t is string => t !== null);
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
    spectrumChart(
      id,
      spectrumOf(file.base),
      spectrumOf(file.head),
      variant && variantSpectrum ? { spectrum: variantSpectrum, label: variant.label } : null,
    ),
    memorySpanChart(id, file.base, file.head, memoryVariant(file)),
    similarityChart(
      id,
      similarityOf(file.base),
      headCurve,
      variant && variantCurve ? { series: variantCurve, label: variant.label } : null,
    ),
  ].filter((c): c is Markup => c !== null);
  const span = file.head?.metrics.evaluationSpan ?? null;
  const skipped =
    headCurve === null && file.head?.metrics.fastestWavelength != null && span !== null
      ? h(
          'p',
          { class: 'muted' },
          `The similarity curve over ${formatInteger(span)} offsets is not drawn: visiting every offset would take too long for a report (discriminationSpan and separationFloor are in the table).`,
        )
      : null;
  return h(
    'section',
    { class: 'file', id, 'data-file': index + 1 },
    h(
      'header',
      null,
      h('span', { class: `chip ${file.verdict}` }, VERDICT_WORD[file.verdict]),
      h('h2', null, file.path),
      h('span', { class: 'muted' }, statusText(file)),
    ),
    file.headError ? h('p', null, `Could not be read at head: ${file.headError.message}`) : null,
    file.baseError
      ? h(
          'p',
          { class: 'muted' },
          `The base version could not be read (${file.baseError.message}); the head is judged on its own.`,
        )
      : null,
    fixSummary(file),
    assumedNote(file),
    changeCards(file),
    fitParagraph(file),
    charts.length > 0 ? h('div', { class: 'charts' }, charts) : null,
    skipped,
    findingsSection(file),
    file.deltas.length > 0 ? h('h3', null, 'Metrics that changed or are limited') : null,
    deltaTable(file),
  );
}

function banner(report: GateReport): Markup {
  const remedies = report.files.flatMap((f) => f.findings).filter((f) => f.remedy).length;
  const blocking = report.files
    .flatMap((f) => f.findings)
    .filter((f) => f.severity === 'block').length;
  return h(
    'div',
    { class: `banner ${report.verdict}` },
    h('span', { class: `verdict ${report.verdict}` }, VERDICT_WORD[report.verdict]),
    h(
      'span',
      null,
      `${formatInteger(report.blocking)} blocking · ${formatInteger(report.warnings)} warning${report.warnings === 1 ? '' : 's'} · ${report.files.length} changed model config${report.files.length === 1 ? '' : 's'}`,
    ),
    blocking > 0
      ? h(
          'span',
          null,
          `${remedies} of ${blocking} blocking finding${blocking === 1 ? '' : 's'} with a fix that passes these rules`,
        )
      : null,
  );
}

function notes(report: GateReport): Markup | null {
  const items: string[] = [];
  if (report.policy.source === 'built-in')
    items.push(
      `No policy file at ${report.policy.path} on the base commit: built-in rules only, no numeric limits.`,
    );
  if (report.policy.changedInHead) {
    const changes = report.policy.limitChanges ?? [];
    items.push(
      `This pull request changes the policy ${report.policy.path}; it was judged by the base commit's policy. After merge: ${changes.length > 0 ? changes.join('; ') : 'it judges alike'}.`,
    );
  }
  if (report.waiver.applied && report.waiver.label)
    items.push(
      `The waiver label ${report.waiver.label} is on this pull request: ${report.waiver.waivedBlocks} blocking finding${report.waiver.waivedBlocks === 1 ? '' : 's'} counted as warnings.`,
    );
  items.push(...report.notices);
  if (report.deleted.length > 0)
    items.push(`Deleted, not judged: ${report.deleted.map((d) => d.path).join(', ')}.`);
  return items.length > 0
    ? h(
        'ul',
        { class: 'notes' },
        items.map((t) => h('li', null, t)),
      )
    : null;
}

function contents(report: GateReport): Markup | null {
  if (report.files.length < 2) return null;
  return h(
    'nav',
    null,
    h(
      'ul',
      { class: 'notes' },
      report.files.map((f, i) =>
        h(
          'li',
          null,
          h('span', { class: `chip ${f.verdict}` }, VERDICT_WORD[f.verdict]),
          ' ',
          h('a', { href: `#file-${i + 1}` }, f.path),
        ),
      ),
    ),
  );
}

/** The whole page, as one string. */
export function renderHtmlReport(report: GateReport, options: HtmlReportOptions = {}): string {
  const title = options.title ?? 'context-reach report';
  const page = h(
    'html',
    { lang: 'en' },
    h(
      'head',
      null,
      h('meta', { charset: 'utf-8' }),
      h('meta', { name: 'viewport', content: 'width=device-width, initial-scale=1' }),
      h('meta', { 'http-equiv': 'Content-Security-Policy', content: CSP }),
      h('meta', { name: 'color-scheme', content: 'light dark' }),
      h('title', null, `${title} · ${VERDICT_WORD[report.verdict]}`),
      h('style', null, trusted(REPORT_CSS)),
    ),
    h(
      'body',
      null,
      h(
        'main',
        null,
        h(
          'header',
          null,
          h('h1', null, title),
          h(
            'div',
            { class: 'muted mono' },
            `base ${report.base.slice(0, 12)} → head ${report.head.slice(0, 12)}`,
          ),
        ),
        banner(report),
        notes(report),
        contents(report),
        report.files.length === 0
          ? h('p', null, 'No changed model config to judge.')
          : fragment(report.files.map(fileSection)),
        h('footer', null, h('p', null, ESTIMATE_NOTICE), h('p', null, `context-reach ${VERSION}`)),
      ),
    ),
  );
  return `<!doctype html>\n${page.html}\n`;
}
