/**
 * The parts of the Actions toolkit (`@actions/core`) the action uses, composed from the toolkit's
 * own modules for workflow commands, file commands and the job summary, as its entry composes
 * them. The entry also loads the toolkit's OIDC client (`@actions/http-client` with undici,
 * about 450 KB of code), which this action never uses; loading it cost every run about 70 ms of
 * CPU before anything else could start (issue 16). The package exports only its entry, so the
 * modules are imported by their path in the installed package.
 */
import { EOL } from 'node:os';
import { issueCommand } from '../../node_modules/@actions/core/lib/command.js';
import {
  issueFileCommand,
  prepareKeyValueMessage,
} from '../../node_modules/@actions/core/lib/file-command.js';
import { summary } from '../../node_modules/@actions/core/lib/summary.js';
import { toCommandProperties, toCommandValue } from '../../node_modules/@actions/core/lib/utils.js';
import type { AnnotationProperties } from '@actions/core';

export { summary };

export function getInput(name: string): string {
  return (process.env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] ?? '').trim();
}
export function setSecret(secret: string): void {
  issueCommand('add-mask', {}, secret);
}
export function setOutput(name: string, value: unknown): void {
  if (process.env.GITHUB_OUTPUT) {
    issueFileCommand('OUTPUT', prepareKeyValueMessage(name, value));
    return;
  }
  process.stdout.write(EOL);
  issueCommand('set-output', { name }, toCommandValue(value));
}
const annotate =
  (kind: 'error' | 'warning' | 'notice') =>
  (message: string | Error, properties: AnnotationProperties = {}): void =>
    issueCommand(
      kind,
      toCommandProperties(properties),
      message instanceof Error ? message.toString() : message,
    );
export const error = annotate('error');
export const warning = annotate('warning');
export const notice = annotate('notice');
export function info(message: string): void {
  process.stdout.write(message + EOL);
}
export function setFailed(message: string | Error): void {
  process.exitCode = 1;
  error(message);
}
