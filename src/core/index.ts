/**
 * The public surface of the pure core: what the action and the CLI (and anyone embedding the
 * engine) use. A test pins this list; widen it on purpose, not by accident.
 */
export type { ChangedFile } from './changes.js';
export type {
  Dialect,
  Finding,
  FloatFormat,
  LocationMap,
  ModelSpec,
  ServingPatch,
  Severity,
  StorageDType,
} from './model.js';
export { FLOAT_FORMATS, STORAGE_DTYPES } from './model.js';
export type { Metrics, MetricPath, PrecisionMetrics } from './metrics/types.js';
export { computeMetrics } from './metrics/compute.js';
export { readModel } from './parse/read-model.js';
export { decodeText } from './parse/source.js';
export { NotAModelError, ReadError } from './parse/errors.js';
export {
  inspectModel,
  toFailure,
  type FileFailure,
  type FileReport,
  type InspectOptions,
} from './inspect.js';
export {
  DEFAULT_POLICY,
  DEFAULT_POLICY_PATH,
  PolicyError,
  parsePolicy,
  resolvePolicy,
  isModelConfig,
} from './policy/index.js';
export type { Policy, FilePolicy } from './policy/index.js';
export { runGate, type ContentSource, type GateRequest } from './gate.js';
export { decide } from './compare/decide.js';
export type {
  Change,
  CombinedRemedy,
  FileDecision,
  GateReport,
  JudgedFinding,
  Remedy,
  RemedyFields,
  Verdict,
} from './report/types.js';
export { METRIC_PATHS, metricValue } from './metrics/metric-path.js';
export { RULES, type RuleId } from './rules/catalog.js';
export { renderComment, COMMENT_LIMIT, type MarkdownContext } from './render/comment.js';
export { COMMENT_MARKER, ESTIMATE_NOTICE } from './render/notice.js';
export { renderDiffText } from './render/diff-text.js';
export { renderGateJson } from './render/gate-json.js';
export { renderInspectJson, REPORT_VERSION } from './render/inspect-json.js';
export { renderInspectText, PLAIN, type TextStyle } from './render/inspect-text.js';
export { renderSarif } from './render/sarif.js';
export { planAnnotations, ANNOTATIONS_PER_LEVEL, type Annotation } from './render/annotations.js';
export { escapeHtml, escapeMarkdown } from './render/escape.js';
export { renderHtmlReport, type HtmlReportOptions } from './render/html-report.js';
export { attachRemedies, remedyFileReport } from './remedy/attach.js';
export { VERSION } from './version.js';
