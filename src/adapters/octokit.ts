/**
 * The Octokit stack (client, the runner's request defaults, the retry and throttling plugins),
 * loaded by `github-rest.ts` with `import()` on the first API call only: it is most of the action's
 * bundle, and runs that never call the API should not compile it at start-up.
 */
export { getOctokit } from '@actions/github';
export { defaults as actionsDefaults } from '@actions/github/lib/utils';
export { retry } from '@octokit/plugin-retry';
export { throttling } from '@octokit/plugin-throttling';
export { default as Bottleneck } from 'bottleneck/light.js';
