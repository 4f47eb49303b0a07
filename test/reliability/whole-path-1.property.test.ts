import { describeWholePath } from './whole-path.js';

// Half of the 10,000 generated pull requests of the whole-path property (see whole-path.ts).
describeWholePath(1, 5, 1_000);
