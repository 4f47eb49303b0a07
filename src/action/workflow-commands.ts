/**
 * The runner's side of the protocol, as GitHub documents it ("Workflow commands for GitHub
 * Actions", "Setting an output parameter", "Adding a job summary"): commands on standard output as
 * `::name key=value,key=value::message` (in the message `%`, CR and LF escaped as `%25`, `%0D`,
 * `%0A`; in property values also `:` and `,` as `%3A`, `%2C`); outputs appended to the file at
 * `GITHUB_OUTPUT` as `name<<delimiter` blocks; the job summary appended to the file at
 * `GITHUB_STEP_SUMMARY`; inputs in `INPUT_<NAME>` variables. The toolkit's @actions/core writes
 * the same lines, but loading it also loads an HTTP client (undici) that this action never uses
 * through it, a tenth of a second of start-up on every run; so the few lines are written here.
 */
import { randomUUID } from 'node:crypto';
import { accessSync, appendFileSync, constants, existsSync } from 'node:fs';
import { EOL } from 'node:os';

/** Properties of an annotation command; empty values are left out. */
export type CommandProperties = Record<string, string | number | undefined>;

function escapeMessage(text: string): string {
  return text.replace(/%/g, '%25').replace(/\r/g, '%0D').replace(/\n/g, '%0A');
}

function escapeProperty(text: string): string {
  return escapeMessage(text).replace(/:/g, '%3A').replace(/,/g, '%2C');
}

/** The line of one command, e.g. `::error file=a.json,line=3::message`. */
export function commandLine(name: string, properties: CommandProperties, message: string): string {
  const pairs = Object.entries(properties)
    .filter(([, value]) => value !== undefined && value !== '' && value !== 0)
    .map(([key, value]) => `${key}=${escapeProperty(String(value))}`);
  return `::${name}${pairs.length > 0 ? ` ${pairs.join(',')}` : ''}::${escapeMessage(message)}`;
}

/** Writes one line of the step's log. */
export function writeLine(text: string): void {
  process.stdout.write(`${text}${EOL}`);
}

/** Writes one command to standard output. */
export function issueCommand(name: string, properties: CommandProperties, message: string): void {
  writeLine(commandLine(name, properties, message));
}

/** The input `name` as the runner passes it (`INPUT_` and the name upper-cased, spaces as `_`), trimmed; empty when unset. */
export function readInput(env: Readonly<Record<string, string | undefined>>, name: string): string {
  return (env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] ?? '').trim();
}

/** The `name<<delimiter` block of one output; the delimiter is random so no value can end it early. */
export function outputBlock(
  name: string,
  value: string,
  delimiter = `ghadelimiter_${randomUUID()}`,
): string {
  if (name.includes(delimiter) || value.includes(delimiter)) {
    throw new Error(
      `The output ${JSON.stringify(name)} contains the delimiter ${JSON.stringify(delimiter)}; expected a name and value without it`,
    );
  }
  return `${name}<<${delimiter}${EOL}${value}${EOL}${delimiter}`;
}

/** Sets an output: appended to the `GITHUB_OUTPUT` file, or the old `set-output` command without one. */
export function setOutput(
  env: Readonly<Record<string, string | undefined>>,
  name: string,
  value: string,
): void {
  const file = env.GITHUB_OUTPUT ?? '';
  if (file === '') {
    process.stdout.write(EOL);
    issueCommand('set-output', { name }, value);
    return;
  }
  if (!existsSync(file))
    throw new Error(
      `The output file at GITHUB_OUTPUT (${JSON.stringify(file)}) is missing; expected the file the runner creates`,
    );
  appendFileSync(file, `${outputBlock(name, value)}${EOL}`, 'utf8');
}

/** Appends markdown (and a line end) to the job summary at `GITHUB_STEP_SUMMARY`. */
export function appendSummary(
  env: Readonly<Record<string, string | undefined>>,
  markdown: string,
): void {
  const file = env.GITHUB_STEP_SUMMARY ?? '';
  if (file === '')
    throw new Error(
      'GITHUB_STEP_SUMMARY is not set; expected the job summary file the runner names (this runner may not support job summaries)',
    );
  try {
    accessSync(file, constants.R_OK | constants.W_OK);
  } catch {
    throw new Error(
      `The job summary file ${JSON.stringify(file)} cannot be read and written; expected the file the runner creates`,
    );
  }
  appendFileSync(file, `${markdown}${EOL}`, 'utf8');
}
