/**
 * The page in a real browser: playwright-core driving Debian's chromium (/usr/bin/chromium,
 * installed by .ci/run when missing), headless, against a server on an ephemeral loopback
 * port with a fresh temporary catalog. Test 1 runs an invented demo end to end and checks
 * the page against the API's JSON for the same input; test 2 submits a bad system and
 * finds the message under the field.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { parse } from '@retorquere/bibtex-parser';
import { type BrowserContext, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loopbackHostHeaders } from '../../src/api/address.ts';
import { createApp } from '../../src/api/app.ts';
import { type RunningServer, startServer } from '../../src/api/server.ts';
import { type Catalog, openCatalog } from '../../src/catalog/index.ts';

const CHROMIUM = '/usr/bin/chromium';
const SCREENSHOT = new URL('../../scratch/page-demo.png', import.meta.url).pathname;

let dir: string;
let catalog: Catalog;
let server: RunningServer;
let browser: BrowserContext;
const logged: string[] = [];
const pageErrors: string[] = [];

beforeAll(async () => {
  dir = mkdtempSync(path.join(os.tmpdir(), 'hesper-web-'));
  catalog = openCatalog({ path: path.join(dir, 'catalog.sqlite'), env: {} });
  let hosts: string[] = [];
  server = await startServer(createApp({ catalog, log: (l) => logged.push(l), allowedHosts: () => hosts }), { host: '127.0.0.1', port: 0 });
  hosts = loopbackHostHeaders('127.0.0.1', server.port);
  browser = await chromium.launchPersistentContext(path.join(dir, 'profile'), {
    executablePath: CHROMIUM,
    headless: true,
    viewport: { width: 1366, height: 900 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
  catalog?.close();
  rmSync(dir, { recursive: true, force: true });
});

async function openPage(): Promise<Page> {
  const page = await browser.newPage();
  page.on('pageerror', (e) => pageErrors.push(e.message));
  page.on('requestfailed', (r) => pageErrors.push(`request failed: ${r.url()}`));
  page.on('request', (r) => {
    if (!r.url().startsWith(server.url) && !r.url().startsWith('data:') && !r.url().startsWith('blob:')) pageErrors.push(`request to another origin: ${r.url()}`);
  });
  await page.goto(`${server.url}/`);
  await page.waitForSelector('body[data-ready="true"]');
  return page;
}

async function loadDemo(page: Page, name: string) {
  await page.selectOption('#demo-select', name);
  await page.click('#load-demo');
  await page.waitForFunction((n) => document.getElementById('run-status')?.textContent?.includes('Loaded'), name);
}

/** Half a unit in the last place shown: how far a displayed number may be from the exact one. */
function shownTolerance(text: string): number {
  const t = text.trim();
  const exp = /e([-+]\d+)$/.exec(t);
  const mantissa = exp ? t.slice(0, exp.index) : t;
  const decimals = mantissa.includes('.') ? mantissa.length - mantissa.indexOf('.') - 1 : 0;
  return 0.5 * 10 ** (-decimals + (exp ? Number(exp[1]) : 0));
}

describe('the page in chromium', () => {
  it('runs an invented demo: the verdict, summary, figure and candidates match the API for the same input', async () => {
    const page = await openPage();
    await loadDemo(page, 'tessaly-b');
    await page.click('#run-button');
    await page.waitForSelector('#verdict-title[data-verdict]', { timeout: 30_000 });
    await page.waitForSelector('#figure svg');

    const system = await (await fetch(`${server.url}/api/demos/tessaly-b`)).json();
    const res = await fetch(`${server.url}/api/interpret`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(system) });
    expect(res.status).toBe(200);
    const json = await res.json();

    const verdict = await page.getAttribute('#verdict-title', 'data-verdict');
    expect(verdict).toBe(json.verdict.cloudsOrIceRequired);

    const cells = await page.$$eval('#summary-table [data-field][data-part]', (nodes) =>
      nodes.map((n) => ({ field: n.getAttribute('data-field')!, part: n.getAttribute('data-part')!, text: n.textContent!.replace(/\s*(K|ppm)$/, '') })));
    expect(cells.length).toBe(8 * 5); // 8 quantities x (median + two intervals of two ends)
    for (const c of cells) {
      const exact = json[c.field][c.part] as number;
      // derived: the page rounds the API's number for display; it must not differ by more than the rounding.
      expect(Math.abs(Number.parseFloat(c.text) - exact), `${c.field}.${c.part}: shown ${c.text}, API ${exact}`).toBeLessThanOrEqual(shownTolerance(c.text) * (1 + 1e-9));
    }

    const figureTexts = await page.$$eval('#figure svg text', (nodes) => nodes.map((n) => n.textContent ?? ''));
    expect(figureTexts.some((t) => t.includes('geometric albedo'))).toBe(true);
    const rowLabels = figureTexts.filter((t) => /\[(consistent|marginal|excluded)\]$/.test(t));
    expect(rowLabels.length).toBeGreaterThan(0);

    const fitting = json.candidates.filter((c: { status: string }) => c.status !== 'excluded');
    const rows = await page.$$eval('#candidates-table tbody tr', (trs) => trs.map((tr) => ({ id: tr.getAttribute('data-id'), status: tr.getAttribute('data-status') })));
    expect(rows.length).toBe(Math.min(10, fitting.length));
    expect(rows.map((r) => r.id)).toEqual(fitting.slice(0, rows.length).map((c: { id: string }) => c.id));
    await page.selectOption('#candidate-view', 'all');
    expect(await page.locator('#candidates-table tbody tr').count()).toBe(json.candidates.length);

    const paragraph = await page.textContent('#paragraph');
    expect(paragraph).toContain('Tessaly b');
    await page.click('#copy-paragraph');
    await page.waitForFunction(() => /Copied|Selected/.test(document.getElementById('copy-status')?.textContent ?? ''));
    const [download] = await Promise.all([page.waitForEvent('download'), page.click('#download-bib')]);
    expect(download.suggestedFilename()).toBe('tessaly-b.bib');
    const bib = readFileSync((await download.path())!, 'utf8');
    const lib = parse(bib);
    expect(lib.errors).toEqual([]);
    expect(lib.entries.length).toBeGreaterThan(0);
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({ path: SCREENSHOT, fullPage: false });
    await page.close();
    expect(pageErrors).toEqual([]);
    expect(logged).toEqual([]);
  });

  it('shows the message for the field when the system is bad, and keeps the keyboard path working', async () => {
    const page = await openPage();
    await loadDemo(page, 'aurelia-b');
    await page.fill('#f-planet-radiusRatio-value', '1.3');
    await page.focus('#f-planet-radiusRatio-value');
    await page.keyboard.press('Enter');
    const error = page.locator('#f-planet-radiusRatio-errors li');
    await error.waitFor({ timeout: 20_000 });
    expect(await error.textContent()).toMatch(/must be in \(0, 1\)/);
    expect(await page.getAttribute('#f-planet-radiusRatio-value', 'aria-invalid')).toBe('true');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('f-planet-radiusRatio-value');
    expect(await page.isVisible('#problem-box')).toBe(true);
    expect(await page.textContent('#run-status')).toMatch(/Not interpreted/);

    await page.check('input[name="input-mode"][value="file"]');
    await page.fill('#system-text', '{"name": "broken", ');
    await page.click('#run-button');
    const fileError = page.locator('#system-text-errors li');
    await fileError.waitFor();
    expect(await fileError.textContent()).toMatch(/^body: not valid JSON/);
    await page.close();
    expect(pageErrors).toEqual([]);
  });
});
