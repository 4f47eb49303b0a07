/**
 * Findings and their remedies as HTML: each finding with its severity, rule, message and place,
 * and under a blocking one the proven change (field, value before, value after) with the metric
 * values it would produce, the alternatives, or why there is none.
 */
import type { LocationMap, ModelSpec } from '../../model.js';
import type { CombinedRemedy, Remedy, FileDecision, JudgedFinding } from '../../report/types.js';
import { filePatches } from '../../remedy/file-patch.js';
import { needsText, remedyNeeds } from '../../remedy/needs.js';
import { SEVERITY_WORD } from '../marks.js';
import { changeParts, metricParts, PASSES_NOTE } from '../remedy-text.js';
import { h, type Markup } from './markup.js';

/** The file a remedy is shown for: its path, format and where its keys are (for the file's own keys). */
export interface RemedyFile {
  path: string;
  dialect: FileDecision['dialect'];
  spec: ModelSpec | null;
  locations: LocationMap | null;
}

/** The change in the file's own keys, ready to paste, with where it goes. */
function patchMarkup(remedy: Remedy, file: RemedyFile): Markup | null {
  if (!file.spec) return null;
  const patches = filePatches(
    remedy.change,
    file.dialect ?? 'checkpoint',
    file.spec,
    file.locations ?? {},
    file.path,
  );
  return h(
    'div',
    null,
    patches.map((patch) => {
      const lines = [
        ...new Set(patch.edits.filter((e) => e.line !== null).map((e) => e.line as number)),
      ];
      const where =
        patch.target === 'policy'
          ? `in the serving block of ${patch.where} that applies to this file`
          : lines.length > 0
            ? `in ${patch.where}, line${lines.length === 1 ? '' : 's'} ${lines.join(', ')}${patch.edits.some((e) => e.line === null) ? ', and new keys' : ''}`
            : `new keys in ${patch.where}`;
      return [
        h('div', { class: 'muted' }, `${patch.format.toUpperCase()}, ${where}:`),
        h('pre', null, h('code', null, patch.snippet)),
      ];
    }),
  );
}

/** What a remedy still needs past these rules, beside it. */
function needsMarkup(remedy: Remedy, spec: ModelSpec | null): Markup | null {
  if (!spec) return null;
  return h(
    'div',
    { class: 'caution' },
    h('b', null, 'Still needs: '),
    needsText(remedyNeeds(remedy.change, spec)),
    '.',
  );
}

/** `key before → after (line n)`, one per key, in the file's own keys (the policy's serving keys for serving values). */
export function changeMarkup(
  change: Remedy['change'],
  spec: ModelSpec | null,
  locations: LocationMap | null = null,
  file: Pick<RemedyFile, 'path' | 'dialect'> | null = null,
): Markup {
  const parts = changeParts(change, spec, locations);
  const patches =
    spec && file
      ? filePatches(change, file.dialect ?? 'checkpoint', spec, locations ?? {}, file.path)
      : [];
  const keyOf = (field: string): string => {
    for (const patch of patches) {
      const edit = patch.edits.find((e) => e.field === field);
      if (edit)
        return patch.target === 'policy'
          ? `${patch.where} serving.${edit.key.split('.').pop()}`
          : edit.key;
    }
    return field;
  };
  return h(
    'div',
    { class: 'change' },
    parts.map((p, i) => [
      i > 0 ? h('br', null) : '',
      h('code', null, keyOf(p.key)),
      ' ',
      p.before === null ? '' : [p.before, ' → '],
      h('span', { class: 'after' }, p.after),
      p.at ? h('span', { class: 'muted' }, ` (${p.at})`) : null,
    ]),
  );
}

function metricsMarkup(metrics: Remedy['metrics']): Markup {
  return h(
    'div',
    { class: 'metrics' },
    metricParts(metrics).map((m) => h('span', null, `${m.metric} `, h('b', null, m.value))),
  );
}

function remedyBox(remedy: Remedy, file: RemedyFile, title: string, alternative: boolean): Markup {
  return h(
    'div',
    { class: alternative ? 'remedy alt' : 'remedy' },
    h('div', { class: 'title' }, title),
    patchMarkup(remedy, file) ?? changeMarkup(remedy.change, file.spec, file.locations, file),
    metricsMarkup(remedy.metrics),
    needsMarkup(remedy, file.spec),
    remedy.raises.length > 0
      ? h('div', { class: 'metrics' }, `also raises: ${remedy.raises.join(', ')}`)
      : null,
    remedy.cost ? h('div', { class: 'metrics' }, `costs: ${remedy.cost}`) : null,
  );
}

function remedies(finding: JudgedFinding, file: RemedyFile): Markup | null {
  if (finding.remedy === undefined) return null;
  if (finding.remedy === null) {
    return h(
      'div',
      { class: 'remedy none' },
      h('div', { class: 'title' }, 'No fix found that passes these rules'),
      h('div', null, finding.remedyWhyNot ?? ''),
    );
  }
  return h(
    'div',
    null,
    remedyBox(finding.remedy, file, 'Fix: passes these rules', false),
    (finding.remedyAlternatives ?? []).map((r) =>
      remedyBox(r, file, 'Or: also passes these rules', true),
    ),
  );
}

function remedyFile(file: FileDecision): RemedyFile {
  return {
    path: file.path,
    dialect: file.dialect,
    spec: file.head?.spec ?? null,
    locations: (file.head as { locations?: LocationMap } | null)?.locations ?? null,
  };
}

function findingItem(file: FileDecision, finding: JudgedFinding): Markup {
  const place = [
    finding.line !== null ? `line ${finding.line}` : 'file',
    finding.key ? ` · ${finding.key}` : '',
  ].join('');
  const tags = [finding.standing ? 'standing' : 'new', finding.waived ? 'waived' : null]
    .filter(Boolean)
    .join(', ');
  return h(
    'li',
    { class: `finding ${finding.severity}` },
    h(
      'div',
      { class: 'head' },
      h('span', { class: `chip ${finding.severity}` }, SEVERITY_WORD[finding.severity]),
      h('code', null, finding.rule),
      finding.metric ? h('code', null, finding.metric) : null,
      h('span', { class: 'where' }, `${place} · ${tags}`),
    ),
    h('p', null, finding.message),
    remedies(finding, remedyFile(file)),
  );
}

function together(
  combined: CombinedRemedy,
  spec: ModelSpec | null,
  locations: LocationMap | null,
  file: RemedyFile,
): Markup {
  return h(
    'div',
    { class: combined.passes ? 'remedy' : 'remedy none' },
    h(
      'div',
      { class: 'title' },
      combined.passes
        ? 'All first fixes together pass these rules: nothing blocks'
        : `All first fixes together still block on ${combined.stillBlocking.join(', ')}`,
    ),
    changeMarkup(combined.change, spec, locations, file),
    metricsMarkup(combined.metrics),
  );
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
    return h(
      'div',
      { class: 'fix' },
      h('span', { class: 'title' }, 'What passes these rules:'),
      changeMarkup(file.remedyTogether.change, spec, locations, remedyFile(file)),
      h('span', { class: 'muted' }, 'applied together; details under Findings.'),
    );
  }
  if (blocking.length === 1 && proven.length === 1) {
    return h(
      'div',
      { class: 'fix' },
      h('span', { class: 'title' }, 'What passes these rules:'),
      changeMarkup(proven[0]!.remedy!.change, spec, locations, remedyFile(file)),
      h('span', { class: 'muted' }, 'details under Findings.'),
    );
  }
  return h(
    'div',
    { class: 'fix partial' },
    h(
      'span',
      { class: 'title' },
      `${proven.length} of ${blocking.length} blocking findings have a fix that passes these rules${file.remedyTogether ? '; applied together they still block' : ''}.`,
    ),
    h('span', { class: 'muted' }, 'Details under Findings.'),
  );
}

/** The findings list of one file, remedies included; a line saying there are none otherwise. */
export function findingsSection(file: FileDecision): Markup {
  const spec = file.head?.spec ?? null;
  const anyRemedy = file.findings.some((f) => f.remedy !== undefined);
  return h(
    'div',
    { class: 'findings-block' },
    h('h3', null, 'Findings'),
    anyRemedy ? h('p', { class: 'muted' }, PASSES_NOTE) : null,
    file.findings.length === 0
      ? h('p', { class: 'muted' }, 'No findings.')
      : h(
          'ul',
          { class: 'findings' },
          file.findings.map((f) => findingItem(file, f)),
        ),
    file.remedyTogether
      ? together(file.remedyTogether, spec, remedyFile(file).locations, remedyFile(file))
      : null,
  );
}
