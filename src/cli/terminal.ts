import type { TextStyle } from '../core/render/inspect-text.js';
import { PLAIN } from '../core/render/inspect-text.js';

const ANSI = {
  bold: [1, 22],
  dim: [2, 22],
  red: [31, 39],
  yellow: [33, 39],
  cyan: [36, 39],
} as const;

function wrap(code: keyof typeof ANSI, text: string): string {
  const [open, close] = ANSI[code];
  return `\u001b[${open}m${text}\u001b[${close}m`;
}

const COLOUR: TextStyle = {
  bold: (text) => wrap('bold', text),
  dim: (text) => wrap('dim', text),
  severity: (severity, text) =>
    wrap(severity === 'block' ? 'red' : severity === 'warn' ? 'yellow' : 'cyan', text),
};

/** Colour only on a terminal, and never when NO_COLOR is set (no-color.org convention). */
export function terminalStyle(
  stream: { isTTY?: boolean },
  env: Record<string, string | undefined>,
): TextStyle {
  if (!stream.isTTY || env.NO_COLOR !== undefined || env.TERM === 'dumb') return PLAIN;
  return COLOUR;
}
