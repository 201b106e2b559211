// Renders the HTML comparison report in headless Chromium (Debian's `chromium` package at
// /usr/bin/chromium, driven by playwright-core): the page must show its chart and table, log no
// console errors and request nothing beyond its own file; Chromium's XML parser must accept the
// standalone SVG. Skips, saying why, when /usr/bin/chromium is absent.
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comparisonCharts } from '../../src/report/comparison-charts.js';
import { comparisonHtml } from '../../src/report/comparison-html.js';
import { escapeMarkup } from '../../src/report/escape-markup.js';
import { fixtureComparison, provenance } from './comparison-fixture.js';

// Browser globals used inside page.evaluate, which runs in the page; the project's tsconfig has no
// DOM library, so they are declared here, untyped.
declare const document: any;
declare const DOMParser: any;

const CHROMIUM = '/usr/bin/chromium';
const hasChromium = existsSync(CHROMIUM);
if (!hasChromium) {
  console.warn(`html-report browser test skipped: ${CHROMIUM} not found (install it with: apt-get update && apt-get install -y chromium)`);
}

describe.skipIf(!hasChromium)('HTML report in headless Chromium', () => {
  let browser: Browser;
  let dir: string;
  const c = fixtureComparison();

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'warmcast-html-'));
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    });
  });

  afterAll(async () => {
    await browser?.close();
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('comparisonHtml renders with its chart and table visible, no console errors and no requests beyond the file (screenshot taken)', async () => {
    const file = join(dir, 'report.html');
    writeFileSync(file, comparisonHtml(c, { provenance, assumptions: { 'CO2 formula': 'ar6' }, fromYear: 1950 }));
    const page = await browser.newPage({ viewport: { width: 1000, height: 900 } });
    const errors: string[] = [];
    const requests: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(String(e)));
    page.on('request', (r) => requests.push(r.url()));
    await page.goto(pathToFileURL(file).href, { waitUntil: 'load' });

    const chart = page.locator('figure svg').first();
    await expect.poll(() => chart.isVisible()).toBe(true);
    const box = (await chart.boundingBox())!;
    expect(box.width).toBeGreaterThan(300);
    expect(box.height).toBeGreaterThan(200);
    const table = page.locator('table').first();
    expect(await table.isVisible()).toBe(true);
    expect(await table.locator('tbody tr').count()).toBe(c.milestoneYears.length);
    expect(await page.locator('.cautions li').count()).toBe(3);

    // Kept after the run for a look (CI can keep it as an artifact).
    const shotPath = join(tmpdir(), 'warmcast-report-screenshot.png');
    const shot = await page.screenshot({ path: shotPath, fullPage: true });
    console.info(`HTML report screenshot: ${shotPath}`);
    // PNG signature (ISO/IEC 15948, section 5.2), and a page of some size.
    expect(Array.from(shot.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    expect(shot.length).toBeGreaterThan(20_000);

    expect(errors).toEqual([]);
    expect(requests).toEqual([pathToFileURL(file).href]);
    await page.close();
  });

  it('every text of the rendered charts lies inside its SVG (nothing clipped off the edges), long names included', async () => {
    const page = await browser.newPage();
    const long = { ...c.pathways[2], label: 'A pathway with a very long descriptive name, '.repeat(4) + 'as planners write them' };
    const wide = { ...c, pathways: [...c.pathways, long] };
    await page.setContent(comparisonHtml(wide, { provenance, assumptions: {} }));
    // Screen rectangles, so rotated text (the value-axis title) is measured as drawn; 0.5 px slack.
    const outside = await page.evaluate(() =>
      [...document.querySelectorAll('figure svg')].flatMap((svg) => {
        const frame = svg.getBoundingClientRect();
        return [...svg.querySelectorAll('text')]
          .map((t) => ({ text: t.textContent, r: t.getBoundingClientRect() }))
          .filter(({ r }) => r.left < frame.left - 0.5 || r.top < frame.top - 0.5 || r.right > frame.right + 0.5 || r.bottom > frame.bottom + 0.5)
          .map(({ text }) => text);
      }),
    );
    const count = await page.locator('figure svg text').count();
    expect(count).toBeGreaterThan(20);
    expect(outside).toEqual([]);
    await page.close();
  });

  it('Chromium\'s DOMParser reads each standalone SVG as well-formed XML, and rejects a broken one (control)', async () => {
    const page = await browser.newPage();
    const svgs = [...comparisonCharts(c), '<svg xmlns="http://www.w3.org/2000/svg"><g></svg>'];
    const errors = await page.evaluate((docs) => docs.map((d) => new DOMParser().parseFromString(d, 'image/svg+xml').getElementsByTagName('parsererror').length), svgs);
    expect(errors).toEqual([0, 0, 1]);
    await page.close();
  });

  it('escapeMarkup text reads back exactly through Chromium\'s XML parser, specials and non-ASCII included', async () => {
    const page = await browser.newPage();
    const samples = ['a < b & c > d', `"quoted" and 'single'`, 'CO₂ 1.5 °C — Δ', '&amp; literally', '😀 astral'];
    const back = await page.evaluate(
      (docs) => docs.map((d) => new DOMParser().parseFromString(d, 'application/xml').documentElement.getAttribute('v') + '|' + new DOMParser().parseFromString(d, 'application/xml').documentElement.textContent),
      samples.map((s) => `<t v="${escapeMarkup(s)}">${escapeMarkup(s)}</t>`),
    );
    expect(back).toEqual(samples.map((s) => `${s}|${s}`));
    await page.close();
  });
});
