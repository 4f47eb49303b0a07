import type { Severity } from '../model.js';
import { SEVERITY_ORDER } from '../severity.js';
import { showBidiControls } from './escape.js';
import type { GateReport } from '../report/types.js';

/** GitHub shows at most this many annotations of each level per step. */
export const ANNOTATIONS_PER_LEVEL = 10;

export type AnnotationLevel = 'error' | 'warning' | 'notice';

export interface Annotation {
  level: AnnotationLevel;
  title: string;
  message: string;
  file: string;
  line: number | null;
}

const LEVEL: Record<Severity, AnnotationLevel> = {
  block: 'error',
  warn: 'warning',
  info: 'notice',
};

/**
 * The annotations to write, most severe first and at most 10 per level (GitHub drops the rest),
 * and how many findings were left out. Annotations carry the severity the verdict counted, so a
 * waived or standing block does not show as an error.
 */
export function planAnnotations(report: GateReport): {
  annotations: Annotation[];
  omitted: number;
} {
  const all = report.files
    .flatMap((file) => file.findings.map((f) => ({ file, f })))
    .filter(({ f }) => f.counts !== null)
    .sort((a, b) => SEVERITY_ORDER[a.f.counts!] - SEVERITY_ORDER[b.f.counts!]);
  const used: Record<AnnotationLevel, number> = { error: 0, warning: 0, notice: 0 };
  const annotations: Annotation[] = [];
  let omitted = 0;
  for (const { file, f } of all) {
    const level = LEVEL[f.counts!];
    if (used[level] >= ANNOTATIONS_PER_LEVEL) {
      omitted += 1;
      continue;
    }
    used[level] += 1;
    const flags = [f.standing ? 'standing' : null, f.waived ? 'waived' : null]
      .filter(Boolean)
      .join(', ');
    annotations.push({
      level,
      title: `context-reach ${f.rule}${flags ? ` (${flags})` : ''}`,
      // The file stays the real path (GitHub places the annotation by it); what is read is shown as it is ordered.
      message: showBidiControls(f.message),
      file: file.path,
      line: f.line,
    });
  }
  return { annotations, omitted };
}
