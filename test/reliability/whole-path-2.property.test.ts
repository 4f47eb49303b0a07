import { describeWholePath } from './whole-path.js';

// A quarter of the 10,000 generated pull requests of the whole-path property (see whole-path.ts),
// one file each so vitest runs the quarters side by side.
describeWholePath(2, 5, 500);
