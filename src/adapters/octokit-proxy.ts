/**
 * The toolkit's request defaults for a runner behind a proxy (`https_proxy` and the like, read by
 * `@actions/http-client`): a fetch through undici's proxy agent. Loaded only when a proxy applies
 * to the API's address (`github-rest.ts`).
 */
export { defaults as proxyDefaults } from '@actions/github/lib/utils';
