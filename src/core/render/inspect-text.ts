import type { Finding, Severity } from '../model.js';
import { FLOAT_FORMATS } from '../model.js';
import type { FileFailure, FileReport } from '../inspect.js';
import type { Metrics } from '../metrics/types.js';
import { formatBytes, formatCount, formatInteger, formatNumber, formatTokens } from '../units.js';
import { ESTIMATE_NOTICE } from './notice.js';
import type { RemedyFields, CombinedRemedy } from '../remedy/types.js';
import { remedyLines, togetherText } from './remedy-text.js';

/** Terminal styling; the CLI passes ANSI codes on a terminal and `PLAIN` elsewhere. */
export interface TextStyle {
  bold(text: string): string;
  dim(text: string): string;
  severity(severity: Severity, text: string): string;
}

export const PLAIN: TextStyle = { bold: (t) => t, dim: (t) => t, severity: (_s, t) => t };


type Row = [label: string, value: string];

function section(style: TextStyle, title: string, rows: Row[]): string[] {
  const shown = rows.filter(([, value]) => value !== '—');
  if (shown.length === 0) return [];
  const width = Math.max(...shown.map(([label]) => label.length));
  return ['', `  ${style.bold(title)}`, ...shown.map(([label, value]) => `    ${label.padEnd(width)}  ${value}`)];
}

function positionLine(report: FileReport): string {
  const code = report.spec.position;
  if (code.kind !== 'rotary') return code.kind;
  const parts = [`rotary, base ${formatNumber(code.base, 6)}`];
  if (code.fraction !== 1) parts.push(`fraction ${code.fraction}`);
  if (code.scaling) parts.push(`${code.scaling.kind} scaling × ${code.scaling.factor}`);
  return parts.join(', ');
}

function rangeRows(m: Metrics): Row[] {
  return [
    ['declared span', formatTokens(m.declaredSpan)],
    ['trained span', formatTokens(m.trainedSpan)],
    ['served span', formatTokens(m.servedSpan)],
    ['reach', formatTokens(m.reach)],
    ['scaling cover', formatTokens(m.scalingCover)],
    ['headroom', formatInteger(m.headroom)],
    ['extension ratio', m.extensionRatio === null ? '—' : `${formatNumber(m.extensionRatio)}×`],
    ['attention scale', m.attentionScale === null || m.attentionScale === 1 ? '—' : formatNumber(m.attentionScale)],
    ['ALiBi slopes', m.alibiSlopes === null ? '—' : `${m.alibiSlopes.length} heads, ${formatNumber(m.alibiSlopes[0] ?? null)} … ${formatNumber(m.alibiSlopes[m.alibiSlopes.length - 1] ?? null)}`],
    ['ALiBi horizon', formatTokens(m.alibiHorizon)],
    ['receptive field', formatTokens(m.receptiveField)],
    ['position share', m.positionShare === null ? '—' : `${formatNumber(m.positionShare * 100, 3)} %`],
  ];
}

function spectrumRows(m: Metrics): Row[] {
  return [
    ['fastest wavelength', m.fastestWavelength === null ? '—' : `${formatNumber(m.fastestWavelength)} tokens`],
    ['slowest wavelength', m.slowestWavelength === null ? '—' : `${formatNumber(m.slowestWavelength)} tokens`],
    ['unturned pairs', formatInteger(m.unturnedPairs)],
    ['exposed pairs', formatInteger(m.exposedPairs)],
    ['separation floor', m.separationFloor === null ? '—' : `${formatNumber(m.separationFloor)} at offset ${formatInteger(m.separationFloorOffset)}`],
    ['discrimination span', m.discriminationSpan === null ? (m.fastestWavelength === null ? '—' : 'none within the span') : formatTokens(m.discriminationSpan)],
  ];
}

function precisionRows(m: Metrics): string[] {
  const header = ['format', 'exact to', 'colliding', 'blurred pairs', 'angle error max', 'overflow at'];
  const rows = FLOAT_FORMATS.map((format) => {
    const p = m.precision[format];
    return [format, formatInteger(p.positionExactLimit), formatInteger(p.collidingPositions),
      formatInteger(p.blurredPairs), p.angleErrorMax === null ? '—' : `${formatNumber(p.angleErrorMax, 3)} rad`,
      formatInteger(p.overflowPosition)];
  });
  if (rows.every((row) => row.slice(1).every((cell) => cell === '—'))) return [];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => `    ${cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ')}`;
  return [line(header), ...rows.map(line)];
}

function budgetRows(m: Metrics): Row[] {
  return [
    ['parameters', m.params === null ? '—' : `${formatCount(m.params)} (${formatInteger(m.params)})`],
    ['active parameters', m.activeParams === m.params ? '—' : formatCount(m.activeParams)],
    ['non-embedding parameters', formatCount(m.nonEmbeddingParams)],
    ['weights', formatBytes(m.weightBytes)],
    ['cache per token', formatBytes(m.cachePerTokenBytes)],
    ['cache at span', formatBytes(m.cacheBytesAtSpan)],
    ['memory', formatBytes(m.memoryBytes)],
    ['sequences that fit', formatInteger(m.fitSequences)],
    ['FLOP per token', formatCount(m.flopsPerToken)],
    ['token budget', formatTokens(m.tokenBudget)],
  ];
}

function findingLines(style: TextStyle, report: FileReport & { remedyTogether?: CombinedRemedy | null }): string[] {
  const { path, findings } = report as { path: string; findings: (Finding & Partial<RemedyFields>)[] };
  if (findings.length === 0) return ['', `  ${style.bold('Findings')}`, '    none'];
  const lines = ['', `  ${style.bold('Findings')}`, ...findings.map((f) => {
    const where = f.line !== null ? `${path}:${f.line}` : path;
    const key = f.key ? ` ${f.key}` : '';
    const remedies = remedyLines(f, report.spec, { dialect: report.dialect, locations: report.locations, path: report.path }).map((r) => `\n          ${style.bold(`${r.label}:`)} ${r.text}`).join('');
    return `    ${style.severity(f.severity, f.severity.padEnd(5))} ${f.rule}  ${style.dim(`${where}${key}`)}\n          ${f.message}${remedies}`;
  })];
  if (report.remedyTogether) lines.push(`    ${style.bold('together:')} ${togetherText(report.remedyTogether, report.spec, { dialect: report.dialect, locations: report.locations, path: report.path })}`);
  return lines;
}

/** The readable report of `inspect` for one file. */
export function renderFileText(report: FileReport, style: TextStyle = PLAIN): string {
  const m = report.metrics;
  const title = report.spec.name ? `${report.path} (${report.spec.name})` : report.path;
  const lines = [
    style.bold(title),
    `  ${style.dim(`${report.dialect} format · ${positionLine(report)} · evaluated at ${formatTokens(m.evaluationSpan)} tokens`)}`,
    ...section(style, 'Range', rangeRows(m)),
    ...section(style, 'Spectrum', spectrumRows(m)),
  ];
  const precision = precisionRows(m);
  if (precision.length > 0) {
    const own = report.spec.dtypes.positions ?? 'fp32';
    lines.push('', `  ${style.bold('Number formats')} ${style.dim(`(positions computed in ${own})`)}`, ...precision);
  }
  lines.push(...section(style, 'Budget', budgetRows(m)));
  lines.push(...findingLines(style, report));
  return lines.join('\n');
}

/** The whole `inspect` text output: each file, each failure, and the estimate notice. */
export function renderInspectText(reports: FileReport[], failures: FileFailure[], style: TextStyle = PLAIN): string {
  const blocks = reports.map((r) => renderFileText(r, style));
  for (const failure of failures) {
    const where = failure.line !== null ? `${failure.path}:${failure.line}` : failure.path;
    blocks.push(`${style.bold(failure.path)}\n  ${style.severity('block', 'error')} ${where}: ${failure.message}`);
  }
  blocks.push(style.dim(ESTIMATE_NOTICE));
  return `${blocks.join('\n\n')}\n`;
}
