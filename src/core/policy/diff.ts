/**
 * What a pull request's change to the policy file would change once merged: each limit bound,
 * serving default, rule level and setting, old → new, in the policy's own key spelling. The gate
 * judges by the base commit's policy; this says what the head's would do instead.
 */
import type { LimitSetting, LimitTable, Policy } from './types.js';

const BOUND_KEYS: [keyof LimitSetting, string][] = [
  ['min', 'min'],
  ['max', 'max'],
  ['maxIncreasePct', 'max-increase-pct'],
  ['severity', 'severity'],
];

function show(value: unknown): string {
  if (value === undefined || value === null) return 'none';
  if (typeof value === 'number')
    return Number.isInteger(value) && Math.abs(value) >= 10_000
      ? value.toLocaleString('en-US')
      : String(value);
  return typeof value === 'string' ? value : JSON.stringify(value);
}

function limitLines(prefix: string, before: LimitTable, after: LimitTable): string[] {
  const out: string[] = [];
  const names = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  for (const name of names) {
    const a = before[name] ?? null;
    const b = after[name] ?? null;
    if (a === null && b !== null) {
      out.push(
        `${prefix}limits.${name} added (${BOUND_KEYS.filter(
          ([k]) => b[k] !== undefined && b[k] !== null,
        )
          .map(([k, w]) => `${w} ${show(b[k])}`)
          .join(', ')})`,
      );
      continue;
    }
    if (a !== null && b === null) {
      out.push(`${prefix}limits.${name} removed`);
      continue;
    }
    for (const [k, w] of BOUND_KEYS) {
      const x = a?.[k] ?? null;
      const y = b?.[k] ?? null;
      if (x !== y) out.push(`${prefix}limits.${name}.${w} ${show(x)} → ${show(y)}`);
    }
  }
  return out;
}

function recordLines(
  prefix: string,
  before: Readonly<Record<string, unknown>>,
  after: Readonly<Record<string, unknown>>,
): string[] {
  const names = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  return names
    .filter((n) => JSON.stringify(before[n]) !== JSON.stringify(after[n]))
    .map((n) => `${prefix}${n} ${show(before[n])} → ${show(after[n])}`);
}

/** Every setting the head's policy changes, as `key old → new` lines; empty when they judge alike. */
export function policyChanges(base: Policy, head: Policy): string[] {
  const out = [
    ...limitLines('', base.limits, head.limits),
    ...recordLines(
      'serving.',
      base.serving as Record<string, unknown>,
      head.serving as Record<string, unknown>,
    ),
    ...recordLines('rules.', base.rules, head.rules),
  ];
  if (JSON.stringify(base.files) !== JSON.stringify(head.files))
    out.push(`files ${base.files.join(', ')} → ${head.files.join(', ')}`);
  if (JSON.stringify(base.exclude) !== JSON.stringify(head.exclude))
    out.push(`exclude ${base.exclude.join(', ') || 'none'} → ${head.exclude.join(', ') || 'none'}`);
  if (base.standing !== head.standing) out.push(`standing ${base.standing} → ${head.standing}`);
  if (base.waiverLabel !== head.waiverLabel)
    out.push(`waiver-label ${show(base.waiverLabel)} → ${show(head.waiverLabel)}`);
  const n = Math.max(base.overrides.length, head.overrides.length);
  for (let i = 0; i < n; i++) {
    const a = base.overrides[i];
    const b = head.overrides[i];
    const prefix = `overrides[${i}].`;
    if (!a || !b) {
      out.push(`${prefix.slice(0, -1)} ${a ? 'removed' : 'added'}`);
      continue;
    }
    if (JSON.stringify(a.files) !== JSON.stringify(b.files))
      out.push(`${prefix}files ${a.files.join(', ')} → ${b.files.join(', ')}`);
    out.push(
      ...limitLines(prefix, a.limits, b.limits),
      ...recordLines(
        `${prefix}serving.`,
        a.serving as Record<string, unknown>,
        b.serving as Record<string, unknown>,
      ),
      ...recordLines(`${prefix}rules.`, a.rules, b.rules),
    );
  }
  return out;
}
