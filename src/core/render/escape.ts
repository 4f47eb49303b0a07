/**
 * Everything that reaches markdown or HTML from a pull request (paths, keys, values, messages
 * quoting them) goes through one of these two functions. GitHub renders comments as GFM with
 * inline HTML, links bare URLs and turns `@name` and `#123` into mentions and references, so
 * plain markdown escaping is not enough.
 */

const ZERO_WIDTH_SPACE = '\u200b';

const HTML_ENTITIES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/**
 * Unicode's bidirectional formatting characters (Unicode Standard Annex #9: the embeddings,
 * overrides and isolates U+202A–U+202E, U+2066–U+2069, the marks U+200E, U+200F, U+061C). In a
 * file name they reorder what a reader sees, so `abc\u202Egpj.json` shows as `abcnosj.jpg`; they
 * are replaced with a visible `<U+202E>` everywhere a name is shown.
 */
const BIDI_CONTROLS = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;

/** `text` with every bidirectional control shown as `<U+XXXX>`, so the order a reader sees is the order of the characters. */
export function showBidiControls(text: string): string {
  return text.replace(
    BIDI_CONTROLS,
    (c) => `<U+${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}>`,
  );
}

/** Text for HTML element content or a quoted attribute value. */
export function escapeHtml(text: string): string {
  return showBidiControls(text).replace(/[&<>"']/g, (c) => HTML_ENTITIES[c]!);
}

/**
 * Text for a markdown paragraph or a table cell: no element, link, emphasis, mention, reference
 * or comment survives, and a table keeps its shape (`|` and line breaks cannot split a cell).
 * One pass over the characters, so no entity is escaped twice.
 */
export function escapeMarkdown(text: string): string {
  return (
    showBidiControls(text)
      .replace(/\r\n|[\r\n\u2028\u2029]|[\u0000-\u0008\u000b-\u001f\u007f]/g, ' ')
      .replace(/[&<>"|#\\`*_{}[\]()!~+=-]/g, (c) => MARKDOWN_ESCAPES[c] ?? `\\${c}`)
      // Mentions, team mentions and issue references are linked from text nodes, after entities
      // are decoded; a zero-width space after the sign stops the link and reads the same. An
      // underscore is escaped above, and `\_` renders as `_`: a sign before it is broken too.
      .replace(/(@|&#35;)(?=[\p{L}\p{N}_]|\\_)/gu, `$1${ZERO_WIDTH_SPACE}`)
      // Bare URLs and www. hosts are autolinked; break the scheme separator and the www. prefix.
      .replace(/:\/\//g, `:${ZERO_WIDTH_SPACE}//`)
      .replace(/\b(www)\./gi, `$1${ZERO_WIDTH_SPACE}.`)
      .replace(/ {2,}/g, ' ')
  );
}

/**
 * Entities for characters that would open an element, split a table cell or start a heading or
 * reference; other GFM punctuation is backslash-escaped so it prints as itself.
 */
const MARKDOWN_ESCAPES: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  '|': '&#124;',
  '#': '&#35;',
};

/** Untrusted text shown as code: `<code>` with escaped content (backticks cannot be nested safely). */
export function codeSpan(text: string): string {
  return `<code>${escapeMarkdown(text)}</code>`;
}

/**
 * An identifier the report itself defines (a rule id, a metric name, a commit id) as inline code:
 * backticks when it is plain `[A-Za-z0-9._:-]` text, else the escaped `<code>` of `codeSpan`, so a
 * tampered report's "rule" cannot open markdown with a backtick.
 */
export function codeId(text: string): string {
  return /^[A-Za-z0-9._:-]{1,200}$/.test(text) ? `\`${text}\`` : codeSpan(text);
}

/**
 * Whether a repository path can be linked: git never lists a path with an empty, `.` or `..`
 * segment or a leading `/`, and a link made of one could reach another page of the same host
 * (browsers resolve `..`, also written `%2e%2e`, before requesting).
 */
export function linkablePath(path: string): boolean {
  return (
    path !== '' &&
    !path.startsWith('/') &&
    !path.split('/').some((segment) => segment === '' || segment === '.' || segment === '..')
  );
}

/**
 * A path for a link target, each segment percent-encoded so a crafted path cannot leave the URL:
 * past what encodeURIComponent encodes, `(` `)` too (a `)` would end a markdown link's target and
 * let the rest be read as markdown, e.g. an autolinked `www.` host) and `!` `'` `*` `~`.
 */
export function encodePath(path: string): string {
  return path
    .split('/')
    .map((segment) =>
      encodeURIComponent(segment).replace(
        /[!'()*~]/g,
        (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
      ),
    )
    .join('/');
}

/**
 * A URL as a markdown link target: characters a URL may not hold percent-encoded (`encodeURI`),
 * and `(` `)` too, which would end the target and let the rest be read as markdown.
 */
export function linkUrl(url: string): string {
  return encodeURI(url).replace(/[()]/g, (c) => (c === '(' ? '%28' : '%29'));
}

/**
 * Untrusted text shown verbatim in a fenced code block (`lang` is ours: `json`, `yaml`,
 * `suggestion`): the fence is one backtick longer than the longest run inside, so no line of the
 * text can close it, and everything inside is literal (no element, link or mention).
 */
export function codeBlock(text: string, lang: string): string {
  const longest = Math.max(2, ...(text.match(/`+/g) ?? []).map((run) => run.length));
  const fence = '`'.repeat(longest + 1);
  return `${fence}${lang}\n${text.replace(/\r\n?/g, '\n')}\n${fence}`;
}

/**
 * Untrusted text as code inside an HTML block of a comment (a `<summary>` line), where markdown
 * backslash escapes are not read: HTML entities only, with mentions, references and URLs broken
 * as `escapeMarkdown` breaks them.
 */
export function htmlCode(text: string): string {
  const escaped = escapeHtml(text.replace(/[\u0000-\u001f\u007f\u2028\u2029]/g, ' '))
    .replace(/([@#])(?=[\p{L}\p{N}_])/gu, `$1${ZERO_WIDTH_SPACE}`)
    .replace(/:\/\//g, `:${ZERO_WIDTH_SPACE}//`)
    .replace(/\b(www)\./gi, `$1${ZERO_WIDTH_SPACE}.`);
  return `<code>${escaped}</code>`;
}
