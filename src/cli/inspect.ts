import { parseArgs } from 'node:util';
import { inspectModel, toFailure, type FileFailure, type FileReport } from '../core/inspect.js';
import { remedyFileReport } from '../core/remedy/attach.js';
import { createScanMemo } from '../core/metrics/scan-memo.js';
import { decodeText } from '../core/parse/source.js';
import { renderInspectJson } from '../core/render/inspect-json.js';
import { renderInspectText } from '../core/render/inspect-text.js';
import type { FileSource } from '../adapters/file-source.js';
import { optionLines, SERVING_FLAGS, SERVING_HELP, servingPatch } from './options.js';
import { terminalStyle } from './terminal.js';
import type { Console } from './console.js';

export const INSPECT_USAGE = `usage: context-reach inspect FILE... [--json] [--at POINTER]
       [--served-span N] [--trained-span N] [--sequences N] [--device-gib G]
       [--weight-dtype D] [--weight-group-size N] [--cache-dtype D] [--position-dtype D]
       [--tensor-parallel N] [--pipeline-parallel N] [--activation-reserve-gib G]
${optionLines([
  [
    'FILE...',
    'model configs: checkpoint config.json files or context-reach model files (YAML or JSON)',
  ],
  ['--json', 'print the JSON report instead of text (default: text)'],
  [
    '--at POINTER',
    'JSON pointer to the model block inside a larger document, e.g. /text_config (default: the whole document)',
  ],
  ...SERVING_HELP,
])}`;

/** Files read ahead of the one being measured (default: `8`). */
const READ_AHEAD = 8;

/** `inspect`: measure each file; exit status 2 when any file could not be read. */
export async function runInspect(args: string[], files: FileSource, io: Console): Promise<number> {
  const { values, positionals } = parseArgs({
    args,
    allowPositionals: true,
    strict: true,
    options: { json: { type: 'boolean' }, at: { type: 'string' }, ...SERVING_FLAGS },
  });
  if (positionals.length === 0) {
    io.error(`inspect needs at least one FILE\n${INSPECT_USAGE}`);
    return 2;
  }
  const overrides = servingPatch(values);
  const memo = createScanMemo();
  const reports: FileReport[] = [];
  const failures: FileFailure[] = [];
  // Reading runs ahead of measuring by a few files, so the disk waits overlap the computing.
  const pending: (Promise<Uint8Array> | undefined)[] = [];
  let started = 0;
  for (const [i, path] of positionals.entries()) {
    for (; started < Math.min(i + READ_AHEAD, positionals.length); started++) {
      pending[started] = files.read(positionals[started]!);
      pending[started]!.catch(() => {}); // handled when its turn comes
    }
    const reading = pending[i]!;
    pending[i] = undefined; // the bytes are released once measured
    try {
      const text = decodeText(await reading, path);
      // Blocking findings get their remedies, judged with the built-in rules; one memo for the
      // run, so a scan the file and its proofs (or several files) share is done once.
      reports.push(
        remedyFileReport(inspectModel(text, path, { at: values.at, overrides, memo }), memo),
      );
    } catch (error) {
      failures.push(toFailure(path, error));
    }
  }
  if (values.json) io.out(renderInspectJson(reports, failures));
  else io.out(renderInspectText(reports, failures, terminalStyle(io.stdout, io.env)));
  for (const failure of failures) if (values.json) io.error(`${failure.path}: ${failure.message}`);
  return failures.length > 0 ? 2 : 0;
}
