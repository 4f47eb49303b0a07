import type { Finding, Severity } from '../model.js';
import { FLOAT_FORMATS } from '../model.js';
import type { FileFailure, FileReport } from '../inspect.js';
import type { Metrics } from '../metrics/types.js';
import {
  formatBytes,
  formatCount,
  formatInteger,
  formatNumber,
  formatTokens,
} from '../format/units.js';
import { ESTIMATE_NOTICE } from './notice.js';
import { reachAssumed } from '../metrics/reach.js';
import type { RemedyFields, CombinedRemedy } from '../report/types.js';
import { remedyLines, togetherText } from './remedy-text.js';
import { fitText, perDeviceText } from './device-text.js';

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
  return [
    '',
    `  ${style.bold(title)}`,
    ...shown.map(([label, value]) => `    ${label.padEnd(width)}  ${value}`),
  ];
}

function positionLine(report: FileReport): string {
  const code = report.spec.position;
  if (code.kind !== 'rotary') return code.kind;
  const parts = [`rotary, base ${formatNumber(code.base, 6)}`];
  if (code.fraction !== 1) parts.push(`fraction ${code.fraction}`);
  if (code.scaling) parts.push(`${code.scaling.kind} scaling × ${code.scaling.factor}`);
  return parts.join(', ');
}

/** Experts, latent attention, encoder-only: the shapes the budget follows from, or empty. */
function shapeLine(report: FileReport): string {
  const spec = report.spec;
  const parts: string[] = [];
  const x = spec.experts;
  if (x) {
    const shared = x.shared
      ? ` + ${x.shared} shared${x.sharedWidth ? ` × ${formatInteger(x.sharedWidth)}` : ''}${x.sharedGate ? ' (gated)' : ''}`
      : '';
    parts.push(
      `${x.active} of ${x.total} experts${x.width ? ` × ${formatInteger(x.width)}` : ''}${shared}${x.denseLayers ? `, ${x.denseLayers} dense layer${x.denseLayers === 1 ? '' : 's'}` : ''}`,
    );
  }
  if (spec.latent)
    parts.push(
      `latent attention, cache ${spec.latent.kvRank} + ${spec.latent.ropeDim} per token and layer`,
    );
  if (spec.encoderOnly) parts.push('encoder-only, no decoding cache');
  return parts.join(' · ');
}

/** One row per kind of decoder layer (docs/metrics.md, "Layers that differ"). */
function layerKindRows(m: Metrics): string[] {
  const kinds = m.layerKinds;
  if (!kinds || kinds.length === 0) return [];
  const header = [
    'layers',
    'attention',
    'sees',
    'code',
    'slowest λ',
    'exposed',
    'separation floor',
    'discrimination',
    'bf16 blurred',
  ];
  const rows = kinds.map((k) => [
    formatInteger(k.layers),
    k.attention,
    k.attention === 'cross' ? 'images' : k.window === null ? 'all' : formatTokens(k.visibleSpan),
    k.positionCode === 'rotary'
      ? `rotary ${formatNumber(k.rotaryBase)}${k.scaled ? ', scaled' : ''}`
      : k.positionCode,
    k.slowestWavelength === null ? '—' : formatNumber(k.slowestWavelength),
    formatInteger(k.exposedPairs),
    k.separationFloor === null ? '—' : formatNumber(k.separationFloor),
    k.discriminationSpan === null ? '—' : formatTokens(k.discriminationSpan),
    formatInteger(k.precision.bf16.blurredPairs),
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    `    ${cells.map((c, i) => (i === 1 || i === 3 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ')}`;
  return [line(header), ...rows.map(line)];
}

function rangeRows(m: Metrics, report: FileReport): Row[] {
  const assumed = reachAssumed(report.spec, m.trainedSpan, m.declaredSpan)
    ? ' (assumed: the declared span)'
    : '';
  return [
    ['declared span', formatTokens(m.declaredSpan)],
    ['trained span', formatTokens(m.trainedSpan)],
    ['served span', formatTokens(m.servedSpan)],
    [
      'reach',
      m.reach === null && m.bucketHorizon !== null
        ? 'no hard limit (relative buckets)'
        : `${formatTokens(m.reach)}${assumed}`,
    ],
    ...(m.tunedSpan !== null ? [['tuned span', formatTokens(m.tunedSpan)] as Row] : []),
    ...(m.bucketHorizon !== null ? [['bucket horizon', formatTokens(m.bucketHorizon)] as Row] : []),
    ['scaling cover', formatTokens(m.scalingCover)],
    ['headroom', formatInteger(m.headroom)],
    ['extension ratio', m.extensionRatio === null ? '—' : `${formatNumber(m.extensionRatio)}×`],
    [
      'attention scale',
      m.attentionScale === null || m.attentionScale === 1 ? '—' : formatNumber(m.attentionScale),
    ],
    [
      'ALiBi slopes',
      m.alibiSlopes === null
        ? '—'
        : `${m.alibiSlopes.length} heads, ${formatNumber(m.alibiSlopes[0] ?? null)} … ${formatNumber(m.alibiSlopes[m.alibiSlopes.length - 1] ?? null)}`,
    ],
    ['ALiBi horizon', formatTokens(m.alibiHorizon)],
    ['receptive field', formatTokens(m.receptiveField)],
    [
      'position share',
      m.positionShare === null ? '—' : `${formatNumber(m.positionShare * 100, 3)} %`,
    ],
  ];
}

function spectrumRows(m: Metrics): Row[] {
  return [
    [
      'fastest wavelength',
      m.fastestWavelength === null ? '—' : `${formatNumber(m.fastestWavelength)} tokens`,
    ],
    [
      'slowest wavelength',
      m.slowestWavelength === null ? '—' : `${formatNumber(m.slowestWavelength)} tokens`,
    ],
    ['unturned pairs', formatInteger(m.unturnedPairs)],
    ['exposed pairs', formatInteger(m.exposedPairs)],
    [
      'separation floor',
      m.separationFloor === null
        ? '—'
        : `${formatNumber(m.separationFloor)} at offset ${formatInteger(m.separationFloorOffset)}`,
    ],
    [
      'discrimination span',
      m.discriminationSpan === null
        ? m.fastestWavelength === null
          ? '—'
          : 'none within the span'
        : formatTokens(m.discriminationSpan),
    ],
  ];
}

function precisionRows(m: Metrics): string[] {
  const header = [
    'format',
    'exact to',
    'colliding',
    'blurred pairs',
    'angle error max',
    'overflow at',
  ];
  const rows = FLOAT_FORMATS.map((format) => {
    const p = m.precision[format];
    return [
      format,
      formatInteger(p.positionExactLimit),
      formatInteger(p.collidingPositions),
      formatInteger(p.blurredPairs),
      p.angleErrorMax === null ? '—' : `${formatNumber(p.angleErrorMax, 3)} rad`,
      formatInteger(p.overflowPosition),
    ];
  });
  if (rows.every((row) => row.slice(1).every((cell) => cell === '—'))) return [];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    `    ${cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ')}`;
  return [line(header), ...rows.map(line)];
}

function budgetRows(m: Metrics): Row[] {
  return [
    [
      'parameters',
      m.params === null ? '—' : `${formatCount(m.params)} (${formatInteger(m.params)})`,
    ],
    ['active parameters', m.activeParams === m.params ? '—' : formatCount(m.activeParams)],
    ['non-embedding parameters', formatCount(m.nonEmbeddingParams)],
    ...(m.visionParams !== null
      ? [
          [
            'vision tower (apart)',
            `${formatCount(m.visionParams)} (${formatInteger(m.visionParams)})`,
          ] as Row,
        ]
      : []),
    ['weights', formatBytes(m.weightBytes)],
    ['cache per token', formatBytes(m.cachePerTokenBytes)],
    ['cache at span', formatBytes(m.cacheBytesAtSpan)],
    ['memory', formatBytes(m.memoryBytes)],
    ['sequences that fit', formatInteger(m.fitSequences)],
    ['FLOP per token', formatCount(m.flopsPerToken)],
    ['token budget', formatTokens(m.tokenBudget)],
    ...deviceRows(m),
  ];
}

/** Per-device rows, shown when a replica spans more than one device. */
function deviceRows(m: Metrics): Row[] {
  if (m.devices === null || m.devices <= 1) return [];
  return [
    ['devices per replica', formatInteger(m.devices)],
    ['key/value heads per device', formatInteger(m.kvHeadsPerDevice)],
    ['weights per device', formatBytes(m.weightBytesPerDevice)],
    ['cache per token per device', formatBytes(m.cachePerTokenBytesPerDevice)],
    ['memory per device', formatBytes(m.memoryBytesPerDevice)],
  ];
}

function findingLines(
  style: TextStyle,
  report: FileReport & { remedyTogether?: CombinedRemedy | null },
): string[] {
  const { path, findings } = report as {
    path: string;
    findings: (Finding & Partial<RemedyFields>)[];
  };
  if (findings.length === 0) return ['', `  ${style.bold('Findings')}`, '    none'];
  const lines = [
    '',
    `  ${style.bold('Findings')}`,
    ...findings.map((f) => {
      const where = f.line !== null ? `${path}:${f.line}` : path;
      const key = f.key ? ` ${f.key}` : '';
      const remedies = remedyLines(f, report.spec, {
        dialect: report.dialect,
        locations: report.locations,
        path: report.path,
      })
        .map((r) => `\n          ${style.bold(`${r.label}:`)} ${r.text}`)
        .join('');
      return `    ${style.severity(f.severity, f.severity.padEnd(5))} ${f.rule}  ${style.dim(`${where}${key}`)}\n          ${f.message}${remedies}`;
    }),
  ];
  if (report.remedyTogether)
    lines.push(
      `    ${style.bold('together:')} ${togetherText(report.remedyTogether, report.spec, { dialect: report.dialect, locations: report.locations, path: report.path })}`,
    );
  return lines;
}

/** The readable report of `inspect` for one file. */
export function renderFileText(report: FileReport, style: TextStyle = PLAIN): string {
  const m = report.metrics;
  const title = report.spec.name ? `${report.path} (${report.spec.name})` : report.path;
  const lines = [
    style.bold(title),
    `  ${style.dim(`${report.dialect} format · ${positionLine(report)} · evaluated at ${formatTokens(m.evaluationSpan)} tokens`)}`,
    ...(shapeLine(report) ? [`  ${style.dim(shapeLine(report))}`] : []),
    ...section(style, 'Range', rangeRows(m, report)),
    ...section(style, 'Spectrum', spectrumRows(m)),
  ];
  const kinds = layerKindRows(m);
  if (kinds.length > 0) {
    const fullCoded = (m.layerKinds ?? []).some(
      (k) => k.attention === 'full' && k.positionCode !== 'none',
    );
    const note = fullCoded
      ? "top-level values are the full-attention layers'"
      : "top-level values are the model's own code over the whole span";
    lines.push('', `  ${style.bold('Layer kinds')} ${style.dim(`(${note})`)}`, ...kinds);
  }
  const precision = precisionRows(m);
  if (precision.length > 0) {
    const own = report.spec.dtypes.positions ?? 'fp32';
    lines.push(
      '',
      `  ${style.bold('Number formats')} ${style.dim(`(positions computed in ${own})`)}`,
      ...precision,
    );
  }
  lines.push(...section(style, 'Budget', budgetRows(m)));
  for (const text of [perDeviceText(report.spec, m), fitText(report.spec, m)]) {
    if (text !== null) lines.push(`    ${style.dim(text.charAt(0).toUpperCase() + text.slice(1))}`);
  }
  lines.push(...findingLines(style, report));
  return lines.join('\n');
}

/** The whole `inspect` text output: each file, each failure, and the estimate notice. */
export function renderInspectText(
  reports: FileReport[],
  failures: FileFailure[],
  style: TextStyle = PLAIN,
): string {
  const blocks = reports.map((r) => renderFileText(r, style));
  for (const failure of failures) {
    const where = failure.line !== null ? `${failure.path}:${failure.line}` : failure.path;
    blocks.push(
      `${style.bold(failure.path)}\n  ${style.severity('block', 'error')} ${where}: ${failure.message}`,
    );
  }
  blocks.push(style.dim(ESTIMATE_NOTICE));
  return `${blocks.join('\n\n')}\n`;
}
