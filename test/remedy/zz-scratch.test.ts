import { mkdirSync, writeFileSync } from 'node:fs';
import { it } from 'vitest';
import { renderHtmlReport } from '../../src/core/render/html-report.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';
it('scratch', async () => {
  const { base, head } = demoTrees();
  const { report } = await gateOver(base, head);
  const t = performance.now();
  const html = renderHtmlReport(report);
  console.log('html ms', performance.now() - t, 'bytes', html.length);
  mkdirSync('test-artifacts', { recursive: true });
  writeFileSync('test-artifacts/scratch.html', html);
});
