import { describeScansAgainstReference } from './scans-vs-reference.js';

// A fifth of the generated cases of scans.property.test.ts (the first ones: the seeds are fixed),
// without the check past 2^24 tokens, for `npm test`.
describeScansAgainstReference(true);
