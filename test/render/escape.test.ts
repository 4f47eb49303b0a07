import { marked } from 'marked';
import { describe, expect, it } from 'vitest';
import { markdownTable } from 'markdown-table';
import {
  codeId,
  codeSpan,
  encodePath,
  escapeHtml,
  escapeMarkdown,
  linkUrl,
} from '../../src/core/render/escape.js';
import { COMMENT_MARKER } from '../../src/core/render/notice.js';

// Rendered with `marked` in GFM mode, a general-purpose GFM renderer from npm, standing in for
// GitHub's renderer. Mentions and references are GitHub features marked does not have, so those
// are checked on the text: no `@` or `#` directly followed by a word character may remain.
const render = (md: string) => marked.parse(md, { gfm: true, async: false });

const HOSTILE = [
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '[click](https://evil.example/steal)',
  'https://evil.example/x and www.evil.example',
  '@someone and @org/team',
  'fixes #123 and GH-1',
  '`code` and ``two``',
  '**bold** _em_ ~~strike~~',
  '<!-- hidden --> and ' + COMMENT_MARKER,
  'a | b | c',
  'line\nbreak\r\nand\u2028more',
  '![image](https://evil.example/i.png)',
  '<details open><summary>x</summary>',
  '&lt;script&gt; already escaped',
  '\\| escaped pipe',
];

describe('escapeMarkdown(text)', () => {
  it.each(HOSTILE)('renders %j as text with no element, link or comment', (input) => {
    const html = render(`before ${escapeMarkdown(input)} after`);
    expect(html).not.toMatch(/<(script|img|a|details|summary|strong|em|del|code)\b/i);
    expect(html).not.toContain('<!--');
    expect(html.trim().startsWith('<p>')).toBe(true);
    expect(html.match(/<p>/g)).toHaveLength(1);
  });

  it('leaves no mention, team mention or issue reference', () => {
    // Entities are decoded before GitHub looks for references, so decode them here too.
    const text = escapeMarkdown('@someone @org/team #123 user@example.com').replace(/&#35;/g, '#');
    expect(text).not.toMatch(/@\w/);
    expect(text).not.toMatch(/#\d/);
  });

  it('breaks a sign before an underscore it escaped too (`\\_` renders as `_`)', () => {
    // Found by the whole-path property (seed -1887469727): the key `num_key&#_value_heads`
    // rendered `&#_` with the sign straight before a word character.
    for (const input of ['num_key&#_value_heads', 'a @_b', '#_1']) {
      const text = render(escapeMarkdown(input))
        .replace(/<[^>]+>/g, '')
        .replace(/&#35;/g, '#');
      expect(text, input).not.toMatch(/(^|[^\w\u200b])[@#][\p{L}\p{N}_]/u);
      expect(text.replace(/\u200b/g, '').trim(), input).toBe(input.replace(/&/g, '&amp;'));
    }
  });

  it('keeps a table at three columns whatever the cells hold', () => {
    const table = markdownTable([
      ['a', 'b', 'c'],
      ...HOSTILE.map((h) => [escapeMarkdown(h), escapeMarkdown(h), 'x']),
    ]);
    const html = render(table);
    const rows = html.match(/<tr>[\s\S]*?<\/tr>/g) ?? [];
    expect(rows).toHaveLength(HOSTILE.length + 1);
    for (const row of rows) expect(row.match(/<t[dh][ >]/g)).toHaveLength(3);
  });

  it('prints the same visible text (zero-width spaces aside) for plain punctuation', () => {
    const input = 'rope_scaling.factor = 4 (was 2) [ok] *x* -1 + 2 ! ~';
    const html = render(escapeMarkdown(input));
    const text = html
      .replace(/<\/?p>/g, '')
      .replace(/\u200b/g, '')
      .trim();
    expect(text).toBe(input);
  });
});

describe('escapeHtml(text)', () => {
  it('escapes the five HTML-significant characters', () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe(
      '&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;',
    );
  });
});

describe('codeSpan(text)', () => {
  it('shows a key containing backticks as code without breaking out', () => {
    const html = render(`key ${codeSpan('a`b`<i>c</i>')} end`);
    expect(html).toContain('<code>');
    expect(html).not.toMatch(/<i>/);
  });
});

describe('codeId(id)', () => {
  it('writes a rule id or metric name of the catalogue as plain inline code', () => {
    expect(codeId('span-past-reach')).toBe('`span-past-reach`');
    expect(codeId('precision.bf16.collidingPositions')).toBe('`precision.bf16.collidingPositions`');
  });

  it.each([
    'span-past-reach`<img src=x onerror=alert(1)>',
    'limit-crossed` **bold** [x](https://evil.example)',
    'rule\n## heading | cell',
    '@someone #12',
  ])(
    'shows a rule id read back from a tampered report, %j, as one code element and nothing else',
    (id) => {
      const html = render(`before ${codeId(id)} after`);
      expect(html.match(/<code>/g)).toHaveLength(1);
      expect(html).not.toMatch(/<(img|a|strong|em|h2|table|script)\b/i);
      expect(html.match(/<p>/g)).toHaveLength(1);
    },
  );
});

describe('linkUrl(url)', () => {
  it('percent-encodes what a URL may not hold and the parentheses that would end a markdown link target', () => {
    // encodeURI (ECMA-262 §19.2.6.5) leaves reserved characters such as / : # ? alone; ( ) are ours.
    expect(linkUrl('https://ci.example/run/1 (retry)?a=b#x')).toBe(
      'https://ci.example/run/1%20%28retry%29?a=b#x',
    );
    const html = render(
      `[the HTML report](${linkUrl('https://ci.example/r)**x** www.evil.example')})`,
    );
    expect(html.match(/<a /g)).toHaveLength(1);
    expect(html).not.toMatch(/<(strong|em)>/);
  });
});

describe('encodePath(path)', () => {
  it('percent-encodes each segment so a path cannot leave the link', () => {
    expect(encodePath('models/a b/c)d.json')).toBe('models/a%20b/c%29d.json');
    expect(encodePath('x/../y?z#w')).toBe('x/../y%3Fz%23w');
  });

  it('encodes the parentheses that would end a markdown link target, and what markdown reads as emphasis', () => {
    // RFC 3986 §2.3 leaves only ALPHA, DIGIT, "-", ".", "_", "~" unreserved; "~" is encoded too as GFM strikethrough.
    expect(encodePath("a)www.evil.example **b** ~~c~~!'(")).toBe(
      'a%29www.evil.example%20%2A%2Ab%2A%2A%20%7E%7Ec%7E%7E%21%27%28',
    );
    const html = render(
      `[line 1](https://github.example/o/r/blob/1/${encodePath('a)www.evil.example **b**/config.json')}#L3)`,
    );
    expect(html.match(/<a /g)).toHaveLength(1);
    expect(html).not.toMatch(/<(strong|em|del)>/);
  });
});
