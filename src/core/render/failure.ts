import { escapeMarkdown } from './escape.js';
import { COMMENT_MARKER } from './notice.js';

/**
 * The comment and summary when the gate could not judge at all (a broken policy on the base
 * commit, files it could not list): it fails closed, and the comment of an earlier run must not
 * keep saying the pull request passes. The message quotes the pull request's text, so it is escaped.
 */
export function renderFailure(message: string): string {
  return `${COMMENT_MARKER}\n## context-reach · 🔴 **Could not judge this change**\n\n${escapeMarkdown(message)}\n\nThe check fails until this is fixed.\n`;
}
