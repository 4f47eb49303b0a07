import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { renderHtmlReport } from '../../src/core/render/html-report.js';
import { demoTrees, gateOver } from '../support/demo-gate.js';
import { HOSTILE, hostileReport } from './hostile.js';

// The HTML report in a real browser: Debian's Chromium, headless, offline, a fresh profile. The
// pages and screenshots stay under test-artifacts/html-report/ for people to look at. Without a
// browser this test fails (it never skips): .ci/run installs the `chromium` package.

const CHROMIUM = '/usr/bin/chromium';
const ARTIFACTS = resolve(import.meta.dirname, '../../test-artifacts/html-report');
// The first screen of each scheme, kept in docs/ so the look can be reviewed: written there only
// when asked (`CONTEXT_REACH_DOC_SCREENSHOTS=1 npm run test:full`), so a test run leaves the
// checkout as it found it.
const DOCS = process.env.CONTEXT_REACH_DOC_SCREENSHOTS
  ? resolve(import.meta.dirname, '../../docs')
  : ARTIFACTS;
const FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

let context: BrowserContext | null = null;
let profile: string | null = null;
const requests: string[] = [];

/** The browser, launched on first use; every test that needs it fails (never skips) when it is missing. */
async function browser(): Promise<BrowserContext> {
  if (context) return context;
  if (!existsSync(CHROMIUM)) {
    throw new Error(
      `No browser at ${CHROMIUM}: install Debian's chromium package (apt-get update && apt-get install -y chromium); .ci/run does this before the tests.`,
    );
  }
  mkdirSync(ARTIFACTS, { recursive: true });
  profile = mkdtempSync(join(tmpdir(), 'context-reach-chromium-'));
  context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: FLAGS,
    offline: true,
    viewport: { width: 1280, height: 900 },
  });
  // Anything but the page itself is recorded and refused: the report must need nothing else.
  await context.route('**/*', (route) => {
    const url = route.request().url();
    if (url.startsWith('file:')) return route.continue();
    requests.push(url);
    return route.abort();
  });
  return context;
}

afterAll(async () => {
  await context?.close();
  if (profile) rmSync(profile, { recursive: true, force: true });
});

/** Writes the page under test-artifacts and opens it, collecting console errors and page errors. */
async function open(name: string, html: string): Promise<{ page: Page; errors: string[] }> {
  await browser();
  const file = join(ARTIFACTS, `${name}.html`);
  writeFileSync(file, html);
  const page = await (await browser()).newPage();
  const errors: string[] = [];
  page.on('console', (message) => {
    if (message.type() === 'error' || message.type() === 'warning') errors.push(message.text());
  });
  page.on('pageerror', (error) => errors.push(error.message));
  await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });
  return { page, errors };
}

describe('the HTML report in headless Chromium', async () => {
  const { base, head } = demoTrees();
  const { report } = await gateOver(base, head);

  it('draws three charts for every changed config of the demo, offline, with no console error', async () => {
    const { page, errors } = await open('demo', renderHtmlReport(report));
    const sections = page.locator('section.file');
    expect(await sections.count()).toBe(report.files.length);
    for (let i = 0; i < report.files.length; i++) {
      const charts = sections.nth(i).locator('svg.chart');
      expect(await charts.count()).toBe(3);
      for (let c = 0; c < 3; c++) {
        const box = await charts.nth(c).boundingBox();
        expect(box!.width).toBeGreaterThan(400);
        expect(box!.height).toBeGreaterThan(150);
        expect(await charts.nth(c).locator('path, circle').count()).toBeGreaterThan(2);
      }
    }
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    await page.screenshot({ path: join(ARTIFACTS, 'demo-light.png'), fullPage: true });
    await page.close();
  });

  it('switches to dark colours under prefers-color-scheme: dark, and to light ones for print', async () => {
    const { page } = await open('demo', renderHtmlReport(report));
    const background = () => page.evaluate(() => getComputedStyle(document.body).backgroundColor);
    await page.emulateMedia({ colorScheme: 'light' });
    expect(await background()).toBe('rgb(251, 250, 246)');
    await page.emulateMedia({ colorScheme: 'dark' });
    expect(await background()).toBe('rgb(23, 22, 20)');
    await page.screenshot({ path: join(ARTIFACTS, 'demo-dark.png'), fullPage: true });
    await page.screenshot({ path: join(DOCS, 'report-dark.png') });
    await page.emulateMedia({ colorScheme: 'light' });
    await page.screenshot({ path: join(DOCS, 'report-light.png') });
    await page.emulateMedia({ colorScheme: 'dark', media: 'print' });
    expect(await background()).toBe('rgb(255, 255, 255)');
    await page.screenshot({ path: join(ARTIFACTS, 'demo-print.png'), fullPage: true });
    await page.close();
  });

  it('shows hostile paths, keys and messages as text: no element, no handler, no request', async () => {
    const { page, errors } = await open('hostile', renderHtmlReport(hostileReport(report)));
    expect(
      await page.locator('script, img, iframe, object, embed, a[href^="javascript"]').count(),
    ).toBe(0);
    const handlers = await page.evaluate(() =>
      [...document.querySelectorAll('*')].flatMap((el) =>
        [...el.attributes]
          .filter((a) => a.name.startsWith('on'))
          .map((a) => `${el.tagName} ${a.name}`),
      ),
    );
    expect(handlers).toEqual([]);
    const text = await page.evaluate(() => document.body.innerText);
    for (const hostile of HOSTILE.slice(0, 4)) expect(text.includes(hostile), hostile).toBe(true);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    await page.screenshot({ path: join(ARTIFACTS, 'hostile.png'), fullPage: true });
    await page.close();
  });
});
