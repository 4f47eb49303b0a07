import { describe, expect, it } from 'vitest';
import { renderHtmlReport } from '../../src/core/render/html-report.js';
import { escapeHtml } from '../../src/core/render/escape.js';
import { h } from '../../src/core/render/html/markup.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';
import { checkpointConfig } from '../support/scenario-repo.js';
import { HOSTILE, hostileReport } from './hostile.js';

const { base, head } = demoTrees();
/** Substring checks that do not print a 170 KB page when they fail. */
const has = (html: string, text: string) => expect(html.includes(text), text).toBe(true);
const hasNot = (html: string, pattern: RegExp) =>
  expect(pattern.exec(html)?.[0] ?? null, String(pattern)).toBeNull();
const { report } = await gateOver(base, head);

describe('renderHtmlReport(report)', () => {
  const html = renderHtmlReport(report);

  it('is one self-contained page: no script, no external reference, a policy that forbids loading anything', () => {
    expect(html.startsWith('<!doctype html>\n<html lang="en">')).toBe(true);
    hasNot(html, /<script|<link|<iframe|<img|@import|url\(/i);
    hasNot(html, /(?:src|href)="(?:https?:)?\/\//i);
    // Attribute quotes are escaped; the browser reads &#39; as '.
    has(
      html,
      '<meta http-equiv="Content-Security-Policy" content="default-src &#39;none&#39;; style-src &#39;unsafe-inline&#39;; img-src data:; base-uri &#39;none&#39;; form-action &#39;none&#39;">',
    );
  });

  it('has one section per changed config with a spectrum, a memory and a similarity chart each', () => {
    const sections = html.split('<section class="file"').slice(1);
    expect(sections).toHaveLength(report.files.length);
    for (const section of sections) {
      expect(section.match(/<svg class="chart"/g)).toHaveLength(3);
      for (const chart of ['spectrum', 'memory', 'similarity'])
        expect(section).toMatch(new RegExp(`data-chart="file-\\d+-${chart}"`));
    }
  });

  it("shows the fixes in the file's own keys, with what they still need, never claiming more than these rules", () => {
    has(html, 'What passes these rules:');
    has(html, '<code>model.position.scaling.factor</code> 4 → <span class="after">8</span>');
    has(html, '<code>serving.sequences</code> 8 → <span class="after">3</span>');
    has(
      html,
      '<pre><code>&quot;rope_scaling&quot;: {&quot;rope_type&quot;: &quot;linear&quot;, &quot;factor&quot;: 4.0, &quot;original_max_position_embeddings&quot;: 8192}</code></pre>',
    );
    has(
      html,
      '<div class="caution"><b>Still needs: </b>fine-tuning at the longer span with the new linear factor 4.</div>',
    );
    hasNot(html, /proven/i);
  });

  it('marks the assumed trained span, and puts the memory caution beside the memory figures', () => {
    has(html, '<p class="caution"><b>Assumed: </b>The position code did not change');
    has(
      html,
      `† Memory figures: weights and key/value cache only; the usable memory leaves out the reserve`,
    );
    hasNot(html, /text-transform:\s*uppercase/);
  });

  it("has a palette of its own, not the code host's, and shapes for severity", () => {
    for (const hostHex of ['#0969da', '#cf222e', '#1a7f37', '#9a6700', '#0d1117', '#1f2328'])
      hasNot(html, new RegExp(hostHex, 'i'));
    has(html, '.chip.block::before { content: "■"; }');
    has(html, '.verdict.warn::before, .chip.warn::before { content: "▲"; }');
  });

  it('reads in light and dark colour schemes and prints', () => {
    has(html, '@media (prefers-color-scheme: dark)');
    has(html, '@media print');
  });

  it('stays small: under 400 KB for the demo', () => {
    expect(Buffer.byteLength(html)).toBeLessThan(400_000);
  });
});

describe('renderHtmlReport(report) with hostile paths, keys and messages', () => {
  const html = renderHtmlReport(hostileReport(report));

  it('lets no hostile string open an element or an attribute', () => {
    for (const text of HOSTILE) {
      expect(html.includes(text), text).toBe(false);
      has(html, escapeHtml(text));
    }
    hasNot(html, /<(script|img|iframe|svg onload)\b/i);
    // Inside a tag (every `<` of a hostile string is escaped, so a raw `<` starts one of ours).
    hasNot(html, /<[^>]*\son(?:error|load)=/i);
    hasNot(html, /href="javascript/i);
  });
});

describe('h(tag, attrs, ...children)', () => {
  it('escapes text and attribute values, and refuses names that are not plain', () => {
    expect(h('p', { title: '"><x>' }, '<b>').html).toBe(
      '<p title="&quot;&gt;&lt;x&gt;">&lt;b&gt;</p>',
    );
    expect(() => h('p', { 'on"x': 1 })).toThrow('attribute name "on\\"x" is not a plain name');
    expect(() => h('p x', null)).toThrow('tag "p x" is not a plain name');
  });
});

describe('renderHtmlReport on a span the curve cannot afford', () => {
  it('draws memory per device with the usable memory of one device, and says the fit per replica, when a replica spans 8 devices', async () => {
    // 70B-class shape (80 layers, 64 heads, 8 key/value heads of 128; Touvron et al. 2023, Llama 2): 137,953,296,384 fp16
    // weight bytes, 17,244,162,048 (16.1 GiB) per device over tensor-parallel 8.
    const policy = { '.github/context-reach.yml': 'files: ["models/**"]\n' };
    const big = (layers: number) =>
      checkpointConfig({
        hidden_size: 8192,
        intermediate_size: 28672,
        num_hidden_layers: layers,
        num_attention_heads: 64,
        num_key_value_heads: 8,
        torch_dtype: 'float16',
      });
    const { report: tp } = await gateOver(
      { ...policy, 'models/x/config.json': big(80) },
      {
        ...policy,
        'models/x/config.json': big(80).replace(
          '"max_position_embeddings": 4096',
          '"max_position_embeddings": 4095',
        ),
      },
      { tensorParallel: 8, deviceGiB: 80, sequences: 64 },
    );
    const page = renderHtmlReport(tp);
    has(page, 'Memory per device against span');
    has(page, 'usable memory per device');
    has(
      page,
      'Head: per device, 8 devices (tensor-parallel 8 × pipeline-parallel 1): weights 16.1 GiB, cache 10 GiB at 4,095 tokens × 64 sequences',
    );
    has(page, 'after the 10 % reserve kept for activations, workspace and fragmentation');
  }, 30_000);
});
