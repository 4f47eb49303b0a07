/**
 * The Octokit stack, loaded by `github-rest.ts` with `import()` on the first API call only: runs
 * that never call the API should not compile it at start-up. Octokit is composed as the toolkit's
 * `@actions/github` composes it (the core client with the REST endpoint methods and pagination)
 * plus the retry and throttling plugins; its requests go through node-fetch, over Node's own
 * `http` and `https`. The toolkit's default fetch is undici's, about 450 KB of code to load and a
 * WebAssembly HTTP parser to compile for the few requests of a run (issue 16). Behind a proxy the
 * toolkit's proxy-aware fetch is used instead (`octokit-proxy.ts`).
 */
export { Octokit } from '@octokit/core';
export { restEndpointMethods } from '@octokit/plugin-rest-endpoint-methods';
export { paginateRest } from '@octokit/plugin-paginate-rest';
export { retry } from '@octokit/plugin-retry';
export { throttling } from '@octokit/plugin-throttling';
export { default as Bottleneck } from 'bottleneck/light.js';
export { default as nodeFetch } from 'node-fetch';
