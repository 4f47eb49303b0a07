/**
 * Findings and their remedies as HTML: each finding with its severity, rule, message and place,
 * and under a blocking one the proven change (field, value before, value after) with the metric
 * values it would produce, the alternatives, or why there is none.
 */
import type { FileDecision, JudgedFinding } from '../../compare/decide.js';
import type { LocationMap, ModelSpec } from '../../model.js';
import type { CombinedRemedy, Remedy } from '../../remedy/types.js';
import { changeParts, metricParts, REMEDY_NOTE } from '../remedy-text.js';
import { h, type Markup } from './markup.js';

/** `key before → after (line n)`, one per field. */
export function changeMarkup(change: Remedy['change'], spec: ModelSpec | null, locations: LocationMap | null = null): Markup {
  return h('div', { class: 'change' }, changeParts(change, spec, locations).map((p, i) => [
    i > 0 ? h('br', null) : '',
    h('code', null, p.key), ' ',
    p.before === null ? '' : [p.before, ' → '],
    h('span', { class: 'after' }, p.after),
    p.at ? h('span', { class: 'muted' }, ` (${p.at})`) : null,
  ]));
}

function metricsMarkup(metrics: Remedy['metrics']): Markup {
  return h('div', { class: 'metrics' }, metricParts(metrics).map((m) => h('span', null, `${m.metric} `, h('b', null, m.value))));
}

function remedyBox(remedy: Remedy, spec: ModelSpec | null, locations: LocationMap | null, title: string, alternative: boolean): Markup {
  return h('div', { class: alternative ? 'remedy alt' : 'remedy' },
    h('div', { class: 'title' }, title),
    changeMarkup(remedy.change, spec, locations),
    metricsMarkup(remedy.metrics),
    remedy.raises.length > 0 ? h('div', { class: 'metrics' }, `also raises: ${remedy.raises.join(', ')}`) : null,
    remedy.cost ? h('div', { class: 'metrics' }, `costs: ${remedy.cost}`) : null);
}

function remedies(finding: JudgedFinding, spec: ModelSpec | null, locations: LocationMap | null): Markup | null {
  if (finding.remedy === undefined) return null;
  if (finding.remedy === null) {
    return h('div', { class: 'remedy none' }, h('div', { class: 'title' }, 'No remedy found'), h('div', null, finding.remedyWhyNot ?? ''));
  }
  return h('div', null,
    remedyBox(finding.remedy, spec, locations, 'Proven remedy', false),
    (finding.remedyAlternatives ?? []).map((r) => remedyBox(r, spec, locations, 'Or, also proven', true)));
}

function findingItem(file: FileDecision, finding: JudgedFinding): Markup {
  const spec = file.head?.spec ?? null;
  const place = [finding.line !== null ? `line ${finding.line}` : 'file', finding.key ? ` · ${finding.key}` : ''].join('');
  const tags = [finding.standing ? 'standing' : 'new', finding.waived ? 'waived' : null].filter(Boolean).join(', ');
  return h('li', { class: `finding ${finding.severity}` },
    h('div', { class: 'head' },
      h('span', { class: `chip ${finding.severity}` }, finding.severity),
      h('code', null, finding.rule),
      finding.metric ? h('code', null, finding.metric) : null,
      h('span', { class: 'where' }, `${place} · ${tags}`)),
    h('p', null, finding.message),
    remedies(finding, spec, file.head?.locations ?? null));
}

function together(combined: CombinedRemedy, spec: ModelSpec | null, locations: LocationMap | null): Markup {
  return h('div', { class: combined.passes ? 'remedy' : 'remedy none' },
    h('div', { class: 'title' }, combined.passes ? 'All first remedies together pass: nothing blocks' : `All first remedies together still block on ${combined.stillBlocking.join(', ')}`),
    changeMarkup(combined.change, spec, locations),
    metricsMarkup(combined.metrics));
}

/**
 * The one box at the top of a file that says what would pass: every first remedy applied at once
 * when that was proven, the single remedy when there is one, or how many blocking findings have none.
 */
export function fixSummary(file: FileDecision): Markup | null {
  const blocking = file.findings.filter((f) => f.severity === 'block');
  if (blocking.length === 0 || !file.head) return null;
  const spec = file.head.spec;
  const locations = file.head.locations;
  const proven = blocking.filter((f) => f.remedy);
  if (file.remedyTogether?.passes) {
    return h('div', { class: 'fix' }, h('span', { class: 'title' }, 'What would pass (proven):'),
      changeMarkup(file.remedyTogether.change, spec, locations), h('span', { class: 'muted' }, 'applied together; details under Findings.'));
  }
  if (blocking.length === 1 && proven.length === 1) {
    return h('div', { class: 'fix' }, h('span', { class: 'title' }, 'What would pass (proven):'),
      changeMarkup(proven[0]!.remedy!.change, spec, locations), h('span', { class: 'muted' }, 'details under Findings.'));
  }
  return h('div', { class: 'fix partial' }, h('span', { class: 'title' },
    `${proven.length} of ${blocking.length} blocking findings have a proven remedy${file.remedyTogether ? '; applied together they still block' : ''}.`),
  h('span', { class: 'muted' }, 'Details under Findings.'));
}

/** The findings list of one file, remedies included; a line saying there are none otherwise. */
export function findingsSection(file: FileDecision): Markup {
  const spec = file.head?.spec ?? null;
  const anyRemedy = file.findings.some((f) => f.remedy !== undefined);
  return h('div', { class: 'findings-block' },
    h('h3', null, 'Findings'),
    anyRemedy ? h('p', { class: 'muted' }, REMEDY_NOTE) : null,
    file.findings.length === 0
      ? h('p', { class: 'muted' }, 'No findings.')
      : h('ul', { class: 'findings' }, file.findings.map((f) => findingItem(file, f))),
    file.remedyTogether ? together(file.remedyTogether, spec, file.head?.locations ?? null) : null);
}
