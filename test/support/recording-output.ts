import type { RunnerOutput } from '../../src/action/runner-output.js';
import type { Annotation } from '../../src/core/render/annotations.js';

/** A RunnerOutput that keeps everything the action would show, for assertions. */
export interface RecordingOutput extends RunnerOutput {
  secrets: string[];
  outputs: Record<string, string>;
  summaries: string[];
  annotations: Annotation[];
  log: { level: 'info' | 'notice' | 'warning' | 'fail'; message: string }[];
  failed: string | null;
  /** Every text the action wrote anywhere, for leak checks. */
  everything(): string;
}

export function createRecordingOutput(): RecordingOutput {
  const out: RecordingOutput = {
    secrets: [],
    outputs: {},
    summaries: [],
    annotations: [],
    log: [],
    failed: null,
    secret(value) {
      out.secrets.push(value);
    },
    output(name, value) {
      out.outputs[name] = value;
    },
    async summary(markdown) {
      out.summaries.push(markdown);
    },
    annotate(annotation) {
      out.annotations.push(annotation);
    },
    info(message) {
      out.log.push({ level: 'info', message });
    },
    notice(message) {
      out.log.push({ level: 'notice', message });
    },
    warning(message) {
      out.log.push({ level: 'warning', message });
    },
    fail(message) {
      out.failed = message;
      out.log.push({ level: 'fail', message });
    },
    everything() {
      return [
        ...Object.values(out.outputs),
        ...out.summaries,
        ...out.annotations.map((a) => `${a.title} ${a.message} ${a.file}`),
        ...out.log.map((l) => l.message),
      ].join('\n');
    },
  };
  return out;
}
