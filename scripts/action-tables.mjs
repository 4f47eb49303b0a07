// The README's inputs/outputs tables, generated from action.yml between marker comments.
import { parse } from 'yaml';
import { markdownTable } from 'markdown-table';

const cell = (text) =>
  String(text ?? '')
    .replace(/\|/g, '\\|')
    .replace(/\s*\n\s*/g, ' ')
    .trim();

export function renderActionTables(readme, actionYaml) {
  const action = parse(actionYaml);
  const inputs = markdownTable([
    ['input', 'description', 'default'],
    ...Object.entries(action.inputs ?? {}).map(([name, spec]) => [
      `\`${name}\``,
      cell(spec.description),
      spec.default === undefined || spec.default === '' ? '' : `\`${cell(spec.default)}\``,
    ]),
  ]);
  const outputs = markdownTable([
    ['output', 'description'],
    ...Object.entries(action.outputs ?? {}).map(([name, spec]) => [
      `\`${name}\``,
      cell(spec.description),
    ]),
  ]);
  return replaceBetween(replaceBetween(readme, 'inputs', inputs), 'outputs', outputs);
}

function replaceBetween(text, name, body) {
  const start = `<!-- action-${name}:start -->`;
  const end = `<!-- action-${name}:end -->`;
  const from = text.indexOf(start);
  const to = text.indexOf(end);
  if (from < 0 || to < from) return text;
  return `${text.slice(0, from + start.length)}\n${body}\n${text.slice(to)}`;
}
