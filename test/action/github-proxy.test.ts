import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterEach, describe, expect, test, vi } from 'vitest';
import { ApiError, createGitHubClient } from '../../src/adapters/github-rest.js';

// The API's requests and a proxy. The client sends them straight over Node's http and https
// (node-fetch) unless a proxy applies to the API's address: https_proxy / HTTPS_PROXY, less the
// hosts in no_proxy, as the toolkit (@actions/http-client) reads them; then they go through the
// toolkit's proxy-aware fetch, which opens a tunnel with CONNECT (RFC 9110, section 9.3.6).

const API = 'https://api.github.invalid';
const silent = { debug: () => {}, info: () => {}, warn: () => {} };

/** A proxy that records what it is asked and refuses every tunnel. */
async function refusingProxy(): Promise<{ url: string; asked: string[]; server: Server }> {
  const asked: string[] = [];
  const server = createServer((request, response) => {
    asked.push(`${request.method} ${request.url}`);
    response.statusCode = 502;
    response.end();
  });
  server.on('connect', (request, socket) => {
    asked.push(`CONNECT ${request.url}`);
    socket.end('HTTP/1.1 502 Bad Gateway\r\n\r\n');
  });
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  return { url: `http://127.0.0.1:${(server.address() as AddressInfo).port}`, asked, server };
}

describe('the API client behind a proxy', () => {
  let server: Server | null = null;
  afterEach(async () => {
    vi.unstubAllEnvs();
    vi.resetModules();
    await new Promise((done) => (server ? server.close(done) : done(undefined)));
    server = null;
  });

  /** A client of the API behind the refusing proxy, with `no_proxy` as given, and what the proxy was asked. */
  const behindProxy = async (noProxy: string) => {
    const proxy = await refusingProxy();
    server = proxy.server;
    // The toolkit's proxy defaults are made for GITHUB_API_URL when they load.
    vi.stubEnv('GITHUB_API_URL', API);
    for (const name of ['https_proxy', 'HTTPS_PROXY']) vi.stubEnv(name, proxy.url);
    for (const name of ['no_proxy', 'NO_PROXY']) vi.stubEnv(name, noProxy);
    vi.resetModules();
    const client = createGitHubClient('t0ken-value', {
      baseUrl: API,
      log: silent,
      retries: 0,
      requestTimeoutMs: 3_000,
    });
    return { client, asked: proxy.asked };
  };

  test('sends every request through the proxy https_proxy names', async () => {
    const { client, asked } = await behindProxy('');
    const failed = await client.getPullRequest('o', 'r', 1).catch((error: unknown) => error);
    expect(failed).toBeInstanceOf(ApiError);
    expect(String((failed as Error).message)).not.toContain('t0ken-value');
    expect(asked).toEqual(['CONNECT api.github.invalid:443']);
  });

  test('goes straight to a host that no_proxy names, asking the proxy nothing', async () => {
    const { client, asked } = await behindProxy('example.invalid,api.github.invalid');
    // No such host (RFC 6761 reserves .invalid): the direct request fails, the proxy is not asked.
    await expect(client.getPullRequest('o', 'r', 1)).rejects.toBeInstanceOf(ApiError);
    expect(asked).toEqual([]);
  });
});
