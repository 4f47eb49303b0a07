import { describeWholePath } from './whole-path.js';

// A sample of the whole-path property (see whole-path.ts) for `npm test`: 100 generated pull
// requests, new ones each run. The 10,000 of whole-path-{1..4}.property.test.ts run in
// `npm run test:full`.
describeWholePath('sample', 1, 100);
