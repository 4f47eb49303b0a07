/**
 * Checks every reliability test applies to a finished report: numbers that reach it are finite
 * or explained, every unreadable file is a finding naming it, and the markdown renders through a
 * GFM renderer with no injected element, link, mention, reference or comment, tables intact.
 */
import { marked } from 'marked';
import type { GateReport } from '../../src/core/report/types.js';
import { codeSpan, escapeMarkdown } from '../../src/core/render/escape.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';

/** Markdown to HTML as GFM (marked, from npm), standing in for GitHub's renderer. */
export function renderGfm(markdown: string): string {
  return marked.parse(markdown, { gfm: true, async: false });
}

/** Every non-finite number under `value`, with its path. */
export function nonFinite(value: unknown, path = ''): string[] {
  if (typeof value === 'number') return Number.isFinite(value) ? [] : [`${path} = ${value}`];
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([key, entry]) => nonFinite(entry, `${path}/${key}`));
}

/**
 * Problems with the numbers of a report: metrics and metric rows must be finite or null; a spec
 * value that is not a number (NaN from an unusable value) is allowed only beside a finding that
 * explains it.
 */
export function numberProblems(report: GateReport): string[] {
  const problems: string[] = [];
  for (const file of report.files) {
    problems.push(...nonFinite(file.deltas, `${file.path}/deltas`));
    for (const side of ['base', 'head'] as const) {
      const version = file[side];
      if (!version) continue;
      problems.push(...nonFinite(version.metrics, `${file.path}/${side}/metrics`));
      const odd = nonFinite(version.spec, `${file.path}/${side}/spec`);
      const explained = side === 'head' ? file.findings.length > 0 : version.findings.length > 0;
      if (odd.length > 0 && !explained)
        problems.push(`${odd.join(', ')} without a finding that explains it`);
    }
  }
  return problems;
}

/** Messages that say why a whole file has no line: it is empty, too long, or not a regular file. */
const WHOLE_FILE =
  /is empty|characters long|bytes; expected at most|not a regular file|not UTF-8|UTF-16/;

/** Problems with the findings: unreadable files must be findings naming the file, and the line where there is one. */
export function findingProblems(report: GateReport): string[] {
  const problems: string[] = [];
  for (const file of report.files) {
    for (const finding of file.findings) {
      if (finding.file !== file.path) problems.push(`${file.path}: finding names ${finding.file}`);
      if (finding.line !== null && !(Number.isSafeInteger(finding.line) && finding.line >= 1))
        problems.push(`${file.path}: line ${finding.line}`);
      if (finding.rule !== 'config-unreadable') continue;
      if (!finding.message.includes(file.path))
        problems.push(
          `${file.path}: unreadable-file finding does not name the file: ${finding.message}`,
        );
      if (finding.line === null && !WHOLE_FILE.test(finding.message))
        problems.push(`${file.path}: unreadable-file finding without a line: ${finding.message}`);
    }
  }
  return problems;
}

/** Texts from the pull request (or quoting it) that the report shows escaped. */
function quotedTexts(report: GateReport): string[] {
  const texts: string[] = [...report.notices];
  for (const file of report.files) {
    for (const finding of file.findings) {
      texts.push(finding.message);
      if (finding.key) texts.push(finding.key);
    }
    if (file.headError) texts.push(file.headError.message);
    if (file.baseError) texts.push(file.baseError.message);
  }
  return texts;
}

/** Words that mean a number or a value went wrong on its way to the page. */
const LEAKED = /\bNaN\b|Infinity|undefined|\[object /;

/**
 * Problems with the rendered markdown: the hidden marker only once and first, no comment or
 * element from the pull request, no link but ours (`allowedLink`), no mention or reference, every
 * table row as wide as its header, and no NaN/Infinity/undefined outside quoted texts.
 */
export function markdownProblems(
  markdown: string,
  report: GateReport,
  allowedLink: RegExp,
): string[] {
  const problems: string[] = [];
  if (!markdown.startsWith(`${COMMENT_MARKER}\n`))
    problems.push('the marker is not the first line');
  if (markdown.split('<!--').length !== 2)
    problems.push(`${markdown.split('<!--').length - 1} HTML comments; expected only the marker`);
  const html = renderGfm(markdown);
  for (const tag of html.match(/<[a-z][a-z0-9-]*\b[^>]*>/gi) ?? []) {
    const name = /^<([a-z0-9-]+)/i.exec(tag)![1]!.toLowerCase();
    const allowed = [
      'p',
      'h2',
      'h3',
      'table',
      'thead',
      'tbody',
      'tr',
      'th',
      'td',
      'code',
      'pre',
      'strong',
      'em',
      'ul',
      'ol',
      'li',
      'details',
      'summary',
      'sub',
      'blockquote',
      'br',
      'hr',
    ];
    if (name === 'a') {
      const href = /href="([^"]*)"/.exec(tag)?.[1] ?? '';
      if (!allowedLink.test(href)) problems.push(`a link the report did not make: ${tag}`);
    } else if (!allowed.includes(name)) {
      problems.push(`element <${name}> in the rendered report: ${tag}`);
    } else if (/\s(on\w+|style|src|href)=/i.test(tag)) {
      problems.push(`an attribute the report did not make: ${tag}`);
    }
  }
  // GitHub links @name and #123 in text; entities are decoded first, so decode them here too.
  const entities: Record<string, string> = {
    '#35': '#',
    '#64': '@',
    amp: '&',
    lt: '<',
    gt: '>',
    quot: '"',
    '#39': "'",
    '#124': '|',
  };
  const text = html
    .replace(/<[^>]+>/g, ' ')
    .replace(/&(#35|#64|amp|lt|gt|quot|#39|#124);/g, (_, name: string) => entities[name]!);
  for (const found of text.match(/(^|[^\w\u200b])[@#][\p{L}\p{N}_]/gu) ?? []) {
    problems.push(`a mention or reference survives: ${JSON.stringify(found)}`);
  }
  for (const table of html.match(/<table>[\s\S]*?<\/table>/g) ?? []) {
    const rows = table.match(/<tr>[\s\S]*?<\/tr>/g) ?? [];
    const width = (rows[0]?.match(/<th[ >]/g) ?? []).length;
    for (const row of rows.slice(1)) {
      const cells = (row.match(/<td[ >]/g) ?? []).length;
      if (cells !== width)
        problems.push(`a table row with ${cells} cells under a ${width}-column header`);
    }
  }
  let rest = markdown;
  // Longest first: a key is often part of a message that quotes it.
  for (const quoted of quotedTexts(report).sort((a, b) => b.length - a.length)) {
    rest = rest.split(escapeMarkdown(quoted)).join('').split(codeSpan(quoted)).join('');
  }
  const leaked = LEAKED.exec(rest);
  if (leaked)
    problems.push(
      `${JSON.stringify(leaked[0])} outside any quoted text: …${rest.slice(Math.max(0, leaked.index - 80), leaked.index + 40)}…`,
    );
  return problems;
}
