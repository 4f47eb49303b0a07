import type {
  Dialect,
  Finding,
  LocationMap,
  ModelSpec,
  ServingPatch,
  SourceLocation,
} from './model.js';
import type { Metrics } from './metrics/types.js';
import { computeMetrics } from './metrics/compute.js';
import type { ScanMemo } from './metrics/scan-memo.js';
import { NotAModelError } from './parse/errors.js';
import { readModel } from './parse/read-model.js';
import { specFindings } from './rules/spec-rules.js';
import { metricFindings } from './rules/metric-rules.js';
import { applyServing } from './serving-patch.js';
import { SEVERITY_ORDER } from './severity.js';

/** One model config, read and measured. */
export interface FileReport {
  path: string;
  dialect: Dialect;
  spec: ModelSpec;
  locations: LocationMap;
  metrics: Metrics;
  findings: Finding[];
}

/** A file that could not be read or parsed: reported next to the readable ones, never a crash. */
export interface FileFailure {
  path: string;
  line: number | null;
  message: string;
  /** The text parsed but is not a model description at all (default: `false`). */
  notAModel?: boolean;
}

/** Turns anything thrown while reading a file into a failure that names the file and line. */
export function toFailure(path: string, error: unknown): FileFailure {
  const line = (error as { line?: unknown } | null)?.line;
  return {
    path,
    line: typeof line === 'number' ? line : null,
    message: error instanceof Error ? error.message : String(error),
    ...(error instanceof NotAModelError ? { notAModel: true } : {}),
  };
}

export interface InspectOptions {
  /** JSON pointer to the model block inside a larger document (default: the whole document). */
  at?: string;
  /** Serving defaults (a policy's `serving`): the file's own values win. */
  defaults?: ServingPatch;
  defaultsOrigin?: SourceLocation;
  /** Serving overrides (CLI flags): they replace the file's values. */
  overrides?: ServingPatch;
  overridesOrigin?: SourceLocation;
  /** The run's memory of positional computations (default: none, everything computed). */
  memo?: ScanMemo;
}

/** Read, measure and judge one model config. Throws `ReadError` when the text cannot be read. */
export function inspectModel(text: string, path: string, options: InspectOptions = {}): FileReport {
  const read = readModel(text, path, { at: options.at });
  let spec = read.spec;
  let locations = read.locations;
  if (options.defaults) {
    ({ spec, locations } = applyServing(
      spec,
      locations,
      options.defaults,
      'default',
      options.defaultsOrigin ?? { key: 'policy serving', line: null },
    ));
  }
  if (options.overrides) {
    ({ spec, locations } = applyServing(
      spec,
      locations,
      options.overrides,
      'override',
      options.overridesOrigin ?? { key: 'command line', line: null },
    ));
  }
  const metrics = computeMetrics(spec, options.memo);
  const findings = [
    ...read.findings,
    ...specFindings(spec, locations),
    ...metricFindings(spec, metrics, locations),
  ];
  return {
    path,
    dialect: read.dialect,
    spec,
    locations,
    metrics,
    findings: sortFindings(findings),
  };
}

/** Most severe first, then by line, so the first rows of any report are the ones that matter. */
export function sortFindings(findings: Finding[]): Finding[] {
  return [...findings].sort(
    (a, b) =>
      SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] ||
      (a.line ?? Infinity) - (b.line ?? Infinity),
  );
}
