import { describeScansAgainstReference } from './scans-vs-reference.js';

// Every run of the comparisons of the fast scans with the straightforward loops (`npm run
// test:full`); scans.test.ts runs a sample of them in `npm test`.
describeScansAgainstReference(false);
