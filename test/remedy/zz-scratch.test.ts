import { readFileSync } from 'node:fs';
import { it } from 'vitest';
import { inspectModel } from '../../src/core/inspect.js';
import { computeMetrics } from '../../src/core/metrics/compute.js';
it('time', () => {
for (const p of ['fixtures/demo/head/models/quill-mini/model.reach.yaml','fixtures/demo/head/models/quill-8b/config.json']) {
  const r = inspectModel(readFileSync('/work/main/'+p,'utf8'), p);
  let t = performance.now();
  for (let i=0;i<5;i++) computeMetrics(r.spec);
  console.log(p, ((performance.now()-t)/5).toFixed(1),'ms');
  const s = {...r.spec, serving: {...r.spec.serving, span: 1<<20}};
  t = performance.now(); computeMetrics(s); console.log('1M', (performance.now()-t).toFixed(1));
}
});
