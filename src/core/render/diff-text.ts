import { fitText, perDeviceText } from './device-text.js';
import { formatInteger } from '../format/units.js';
import { formatChange, formatMetric } from '../format/metric-format.js';
import { ESTIMATE_NOTICE, baseUnreadableText } from './notice.js';
import { PLAIN, type TextStyle } from './inspect-text.js';
import { remedyLines, togetherText, type RemedyNaming } from './remedy-text.js';
import type { GateReport, FileDecision } from '../report/types.js';
import type { LocationMap } from '../model.js';

/** The file's own key names for its fixes (a report read back from JSON has no locations: default keys then). */
function naming(file: FileDecision): RemedyNaming | null {
  if (!file.head) return null;
  return {
    dialect: file.dialect ?? 'checkpoint',
    locations: (file.head as { locations?: LocationMap }).locations ?? {},
    path: file.path,
  };
}

/** The gate's decision as terminal text, for `context-reach diff --format text`. */
export function renderDiffText(report: GateReport, style: TextStyle = PLAIN): string {
  const verdict =
    report.verdict === 'block'
      ? style.severity('block', 'BLOCK')
      : report.verdict === 'warn'
        ? style.severity('warn', 'WARN')
        : style.bold('OK');
  const lines = [
    `${style.bold('context-reach')} ${verdict}: ${formatInteger(report.blocking)} blocking, ${formatInteger(report.warnings)} warnings, ${report.files.length} model configs changed (${report.base.slice(0, 12)} → ${report.head.slice(0, 12)})`,
  ];
  if (report.policy.source === 'built-in')
    lines.push(
      style.dim(`no policy at ${report.policy.path} on the base commit: built-in rules only`),
    );
  if (report.policy.changedInHead)
    lines.push(
      style.dim(`the policy ${report.policy.path} changes in head; judged by the base version`),
    );
  if (report.waiver.applied)
    lines.push(
      style.dim(
        `waiver label ${report.waiver.label}: ${report.waiver.waivedBlocks} blocks counted as warnings`,
      ),
    );
  for (const notice of report.notices) lines.push(style.dim(notice));
  for (const file of report.files) {
    const renamed = file.previousPath
      ? ` (renamed from ${file.previousPath})`
      : file.status === 'added'
        ? ' (new)'
        : file.baseError && !file.base
          ? ' (base unreadable: head judged without it)'
          : '';
    lines.push('', `${style.bold(file.path)}${renamed}  ${file.verdict}`);
    if (file.headError)
      lines.push(`  ${style.severity('block', 'error')} ${file.headError.message}`);
    const baseNote = baseUnreadableText(file);
    if (baseNote !== null)
      lines.push(
        `  ${style.severity(file.verdict === 'ok' ? 'info' : file.verdict, 'base unreadable:')} ${baseNote}`,
      );
    const width = Math.max(0, ...file.deltas.map((d) => d.metric.length));
    for (const d of file.deltas) {
      const mark =
        d.state === 'crossed'
          ? style.severity(d.limit?.severity ?? 'block', ' ✗ limit')
          : d.state === 'ok'
            ? ' ✓'
            : '';
      lines.push(
        `  ${d.metric.padEnd(width)}  ${formatMetric(d.metric, d.base).padStart(18)} → ${formatMetric(d.metric, d.head).padEnd(18)} ${formatChange(d.metric, d.change, d.changePct)}${mark}`,
      );
    }
    if (file.head) {
      for (const text of [
        perDeviceText(file.head.spec, file.head.metrics),
        fitText(file.head.spec, file.head.metrics),
      ]) {
        if (text !== null) lines.push(style.dim(`  head: ${text}`));
      }
    }
    for (const f of file.findings) {
      const tags = [f.standing ? 'standing' : 'new', f.waived ? 'waived' : null]
        .filter(Boolean)
        .join(', ');
      const at = f.line !== null ? `${file.path}:${f.line}` : file.path;
      lines.push(
        `  ${style.severity(f.severity, f.severity.padEnd(5))} ${f.rule} (${tags})  ${style.dim(at)}`,
        `        ${f.message}`,
      );
      for (const r of remedyLines(f, file.head?.spec ?? null, naming(file)))
        lines.push(`        ${style.bold(`${r.label}:`)} ${r.text}`);
    }
    if (file.remedyTogether)
      lines.push(
        `  ${file.remedyTogether.passes ? style.bold('together:') : style.severity('warn', 'together:')} ${togetherText(file.remedyTogether, file.head?.spec ?? null, naming(file))}`,
      );
  }
  if (report.deleted.length > 0)
    lines.push('', `deleted, not judged: ${report.deleted.map((d) => d.path).join(', ')}`);
  lines.push('', style.dim(ESTIMATE_NOTICE));
  return `${lines.join('\n')}\n`;
}
