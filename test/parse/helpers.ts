import { readFileSync } from 'node:fs';
import { ReadError } from '../../src/core/parse/errors.js';

/** A fixture's text from fixtures/checkpoints. */
export function fixture(name: string): string {
  return readFileSync(new URL(`../../fixtures/checkpoints/${name}`, import.meta.url), 'utf8');
}

/** 1-based line of the first line containing `needle`, found by scanning the text itself. */
export function lineOf(text: string, needle: string): number {
  const index = text.split('\n').findIndex((l) => l.includes(needle));
  if (index < 0) throw new Error(`test text lacks ${needle}`);
  return index + 1;
}

/** The ReadError `run` throws (any other outcome fails the test). */
export function readError(run: () => unknown): ReadError {
  try {
    run();
  } catch (error) {
    if (error instanceof ReadError) return error;
    throw error;
  }
  throw new Error('expected a ReadError');
}

/** A checkpoint config's JSON text from an object, one key per line as published configs are. */
export function configText(config: Record<string, unknown>): string {
  return `${JSON.stringify(config, null, 2)}\n`;
}
