/**
 * Typed reading of single keys for the dialect readers: each read records where the value came
 * from and turns an unusable value into a finding plus NaN (or no value), never an exception.
 * Ranges of sizes are left to the spec rules, so both dialects report them alike.
 */
import type { Finding, LocationMap } from '../model.js';
import { formatInteger } from '../format/units.js';
import { RULES } from '../rules/catalog.js';
import type { RuleId } from '../rules/catalog.js';
import { dottedKey, kindOf, quoteValue } from './quote.js';
import type { PathSegment } from './quote.js';
import type { SourceDocument, SourceMapping, SourceValue } from './source.js';

/** What the reader expects of a number besides being one. */
export interface NumberCheck {
  /** True when the value is acceptable. */
  test(n: number): boolean;
  /** Completes "expected …", e.g. "a rotary base above 1". */
  expected: string;
}

/**
 * Findings of one rule a file gets one by one; past that, one more finding counts the rest and
 * names the first of them. A config of tens of thousands of unknown or unread keys (a hostile or
 * generated file) would otherwise make a report of tens of thousands of lines and seconds of
 * work; no published config comes near it.
 */
export const MAX_FINDINGS_PER_RULE = 1000;

export class FieldReader {
  readonly findings: Finding[] = [];
  /** Findings made per rule, and the finding that counts those past `MAX_FINDINGS_PER_RULE`. */
  private readonly perRule = new Map<RuleId, number>();
  private readonly rest = new Map<RuleId, { finding: Finding; count: number; first: string }>();
  readonly locations: LocationMap = {};
  /**
   * Every path the reader looked up (present or not), so keys nobody consulted can be reported
   * (`unreadKeyFindings`): a new read counts without editing any list.
   */
  readonly consulted = new Set<string>();
  /** Top-level keys a family default stood in for, in the order first used. */
  readonly defaultsUsed: string[] = [];
  /** Values that stand in for absent top-level keys (a family's published defaults). */
  private defaults: Readonly<Record<string, SourceValue>> = {};

  /**
   * @param doc the parsed file
   * @param root the mapping the model is read from (the whole file, or the `--at` block)
   * @param prefix document path of `root`, so keys are reported as written in the file
   * @param nullIsAbsent checkpoint configs write `null` for "not set"; the own dialect refuses it
   */
  constructor(
    readonly doc: SourceDocument,
    readonly root: SourceMapping,
    readonly prefix: readonly PathSegment[],
    private readonly nullIsAbsent: boolean,
  ) {}

  /**
   * Lets `values` stand in for top-level keys the file leaves out entirely (a key written as
   * null stays "not set"); each one used is recorded in `defaultsUsed`.
   */
  useDefaults(values: Readonly<Record<string, SourceValue>>): void {
    this.defaults = values;
  }

  /** Path as a set member for `consulted`. */
  static pathId(path: readonly PathSegment[]): string {
    return JSON.stringify(path);
  }

  /** The value at `path` under the root; undefined when absent (or null, where null means absent). */
  get(path: readonly PathSegment[]): SourceValue | undefined {
    this.consulted.add(FieldReader.pathId(path));
    if (
      path.length === 1 &&
      typeof path[0] === 'string' &&
      !Object.prototype.hasOwnProperty.call(this.root, path[0]) &&
      Object.prototype.hasOwnProperty.call(this.defaults, path[0])
    ) {
      if (!this.defaultsUsed.includes(path[0])) this.defaultsUsed.push(path[0]);
      return this.defaults[path[0]];
    }
    let current: SourceValue | undefined = this.root;
    for (const segment of path) {
      if (Array.isArray(current) && typeof segment === 'number') current = current[segment];
      else if (
        current !== null &&
        typeof current === 'object' &&
        !Array.isArray(current) &&
        typeof segment === 'string'
      ) {
        current = Object.prototype.hasOwnProperty.call(current, segment)
          ? current[segment]
          : undefined;
      } else return undefined;
    }
    if (current === null && this.nullIsAbsent) return undefined;
    return current;
  }

  has(path: readonly PathSegment[]): boolean {
    return this.get(path) !== undefined;
  }

  /** The first of `candidates` that is present, or null. Every candidate counts as consulted (they are aliases). */
  first(candidates: readonly (readonly PathSegment[])[]): readonly PathSegment[] | null {
    const present = candidates.filter((p) => this.has(p));
    // A key the file states wins over an alias a family default stands in for.
    return present.find((p) => this.stated(p)) ?? present[0] ?? null;
  }

  /** Whether `path` is stated in the file itself (not stood in for by a default). */
  stated(path: readonly PathSegment[]): boolean {
    let current: SourceValue | undefined = this.root;
    for (const segment of path) {
      if (
        current === null ||
        typeof current !== 'object' ||
        Array.isArray(current) ||
        typeof segment !== 'string'
      )
        return false;
      if (!Object.prototype.hasOwnProperty.call(current, segment)) return false;
      current = current[segment];
    }
    return true;
  }

  /** The key as written: dotted, from the top of the file. */
  key(path: readonly PathSegment[]): string {
    return dottedKey([...this.prefix, ...path]);
  }

  /** Line of the key; for an absent key, the line of the nearest present parent. */
  line(path: readonly PathSegment[]): number | null {
    for (let n = path.length; n >= 0; n--) {
      const line = this.doc.lineOf([...this.prefix, ...path.slice(0, n)]);
      if (line !== null) return line;
    }
    return null;
  }

  /** The value quoted as written in the file. */
  quote(path: readonly PathSegment[]): string {
    return quoteValue(this.get(path) ?? null, this.doc.literalOf([...this.prefix, ...path]));
  }

  /** "is 12 (text)"-style description of the value at `path`, for "… ; expected …" messages. */
  is(path: readonly PathSegment[]): string {
    const v = this.get(path);
    return v === null || v === undefined ? 'is empty' : `is ${this.quote(path)} (${kindOf(v)})`;
  }

  /** Records that spec field `field` came from `path`. */
  locate(field: string, path: readonly PathSegment[]): void {
    this.locations[field] = { key: this.key(path), line: this.line(path) };
  }

  /**
   * Adds a finding about `path` (null: the whole file), unless one about the same key or a key
   * containing it was already made: one problem, one finding.
   */
  report(rule: RuleId, path: readonly PathSegment[] | null, message: string): void {
    const key = path === null ? null : this.key(path);
    if (key !== null && this.covered(key)) return;
    const made = this.perRule.get(rule) ?? 0;
    if (made >= MAX_FINDINGS_PER_RULE) {
      this.countPast(rule, key, path === null ? null : this.line(path));
      return;
    }
    this.perRule.set(rule, made + 1);
    this.findings.push({
      rule,
      severity: RULES[rule].severity,
      message,
      key,
      line: path === null ? null : this.line(path),
    });
  }

  /** Whether `rule` has had its `MAX_FINDINGS_PER_RULE` findings: a caller may skip the message. */
  full(rule: RuleId): boolean {
    return (this.perRule.get(rule) ?? 0) >= MAX_FINDINGS_PER_RULE;
  }

  /** Counts a finding past the limit in the one finding that stands for them all. */
  private countPast(rule: RuleId, key: string | null, line: number | null): void {
    if (key !== null) this.findingKeys.add(key);
    let rest = this.rest.get(rule);
    if (rest === undefined) {
      const finding: Finding = { rule, severity: RULES[rule].severity, message: '', key, line };
      rest = {
        finding,
        count: 0,
        first: `${key ?? 'the file'}${line === null ? '' : ` (line ${line})`}`,
      };
      this.rest.set(rule, rest);
      this.findings.push(finding);
    }
    rest.count += 1;
    rest.finding.message = `${formatInteger(rest.count)} more ${rule} finding${rest.count === 1 ? '' : 's'} in this file, past the ${formatInteger(MAX_FINDINGS_PER_RULE)} listed one by one, the first about ${rest.first}: one problem repeated this often is best fixed where the file is made`;
  }

  /** Whether a finding about `path` (or a key containing it) has been made. */
  reported(path: readonly PathSegment[]): boolean {
    return this.covered(this.key(path));
  }

  /** Keys of the findings made so far (`findings` up to `synced`), for `covered`. */
  private readonly findingKeys = new Set<string>();
  private synced = 0;

  /**
   * Whether a finding about `key`, or about a key whose dotted form followed by `.` starts
   * `key`, has been made: one set lookup per dot in `key`, not one comparison per finding
   * (44,000 unknown keys took 13 s of comparisons). Findings pushed directly count too.
   */
  private covered(key: string): boolean {
    for (; this.synced < this.findings.length; this.synced++) {
      const made = this.findings[this.synced]!.key;
      if (made !== null) this.findingKeys.add(made);
    }
    if (this.findingKeys.has(key)) return true;
    for (let dot = key.indexOf('.'); dot !== -1; dot = key.indexOf('.', dot + 1))
      if (this.findingKeys.has(key.slice(0, dot))) return true;
    return false;
  }

  /** Reports `path` as missing; `what` completes "expected …". Returns NaN for the spec. */
  missing(path: readonly PathSegment[], what: string): number {
    this.report('value-invalid', path, `${this.key(path)} is missing; expected ${what}`);
    return NaN;
  }

  /**
   * A size (whole number expected). Undefined when absent; NaN, reported, when not a usable
   * number; otherwise the number as written (zero, negative or fractional sizes go to the spec
   * rules).
   */
  count(field: string, path: readonly PathSegment[], what: string): number | undefined {
    return this.number(field, path, `a whole number (${what})`, true);
  }

  /** A real number; `check` adds a range. Undefined when absent; NaN, reported, when unusable. */
  real(
    field: string,
    path: readonly PathSegment[],
    what: string,
    check?: NumberCheck,
  ): number | undefined {
    const n = this.number(field, path, check ? check.expected : `a number (${what})`, false);
    if (n === undefined || Number.isNaN(n) || !check || check.test(n)) return n;
    this.report(
      'value-invalid',
      path,
      `${this.key(path)} is ${this.quote(path)}; expected ${check.expected}`,
    );
    return NaN;
  }

  /** true or false. Undefined when absent or unusable (reported). */
  flag(field: string | null, path: readonly PathSegment[]): boolean | undefined {
    const v = this.get(path);
    if (v === undefined) return undefined;
    if (field !== null) this.locate(field, path);
    if (typeof v === 'boolean') return v;
    this.report(
      'value-invalid',
      path,
      `${this.key(path)} ${this.is(path)}; expected true or false`,
    );
    return undefined;
  }

  /** Text. Undefined when absent or unusable (reported). */
  text(field: string | null, path: readonly PathSegment[], what: string): string | undefined {
    const v = this.get(path);
    if (v === undefined) return undefined;
    if (field !== null) this.locate(field, path);
    if (typeof v === 'string') return v;
    this.report(
      'value-invalid',
      path,
      `${this.key(path)} ${this.is(path)}; expected text (${what})`,
    );
    return undefined;
  }

  /**
   * One of the names in `choices` (compared exactly), mapped to its spec value. Undefined when
   * absent; null, reported, when not one of them.
   */
  choice<T>(
    field: string,
    path: readonly PathSegment[],
    choices: Readonly<Record<string, T>>,
    what: string,
  ): T | null | undefined {
    const v = this.text(field, path, what);
    if (v === undefined) return this.has(path) ? null : undefined;
    if (Object.prototype.hasOwnProperty.call(choices, v)) return choices[v];
    this.report(
      'value-invalid',
      path,
      `${this.key(path)} is ${this.quote(path)}; expected one of ${Object.keys(choices).join(', ')} (${what})`,
    );
    return null;
  }

  private number(
    field: string,
    path: readonly PathSegment[],
    expected: string,
    whole: boolean,
  ): number | undefined {
    const v = this.get(path);
    if (v === undefined) return undefined;
    this.locate(field, path);
    const key = this.key(path);
    if (typeof v !== 'number') {
      this.report('value-invalid', path, `${key} ${this.is(path)}; expected ${expected}`);
      return NaN;
    }
    if (Number.isNaN(v)) {
      this.report(
        'value-invalid',
        path,
        `${key} is ${this.quote(path)}, which is not a number; expected ${expected}`,
      );
      return NaN;
    }
    if (!Number.isFinite(v)) {
      const written = this.quote(path);
      const overflow = /inf/i.test(written)
        ? ', which is not finite'
        : `, which overflows to ${v > 0 ? '' : '-'}Infinity in a double`;
      this.report('value-invalid', path, `${key} is ${written}${overflow}; expected ${expected}`);
      return NaN;
    }
    if (whole && Number.isInteger(v) && !Number.isSafeInteger(v)) {
      this.report(
        'value-invalid',
        path,
        `${key} is ${this.quote(path)}, beyond 2^53 − 1 = 9007199254740991, so it is not held exactly (neighbouring whole numbers share one double); expected ${expected}`,
      );
      return NaN;
    }
    return v;
  }
}

/**
 * Ramp ends must be ordered (defaults standing in for an unstated end), or the ramp divides by
 * zero or runs backwards. Shared by both dialects' scaling readers. `stepAllowed`: equal ends are
 * a step with no ramp between (banded scaling: wavelengths past the one boundary are scaled, the
 * others kept), as Llama 4's published configs have them (`low_freq_factor` and
 * `high_freq_factor` both 1).
 */
export function orderedRamp(
  r: FieldReader,
  at: PathSegment[],
  lowKey: string,
  low: number | undefined,
  lowDefault: number,
  highKey: string,
  high: number | undefined,
  highDefault: number,
  stepAllowed = false,
): void {
  if (low === undefined && high === undefined) return;
  low ??= lowDefault;
  high ??= highDefault;
  if (Number.isNaN(low) || Number.isNaN(high) || high > low || (stepAllowed && high === low))
    return;
  const path = r.has([...at, highKey]) ? [...at, highKey] : [...at, lowKey];
  r.report(
    'value-invalid',
    path,
    stepAllowed
      ? `${r.key([...at, highKey])} (${high}) must not be below ${r.key([...at, lowKey])} (${low}): the ramp between them would run backwards; raise ${highKey} or lower ${lowKey}`
      : `${r.key([...at, highKey])} (${high}) must be above ${r.key([...at, lowKey])} (${low}): the ramp between them would divide by zero or run backwards; raise ${highKey} or lower ${lowKey}`,
  );
}
