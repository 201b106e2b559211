// Renders the HTML files `warmcast compare` and `warmcast run` write in headless Chromium (Debian's
// `chromium` at /usr/bin/chromium, driven by playwright-core) and measures them in the DOM: each
// option's band is filled in the colour of its own median line and the legend ties them together;
// the observed record is drawn; nothing overflows the page width; no console errors, no requests
// beyond the file; Chromium's XML parser accepts the standalone SVG. Skips, saying why, when
// /usr/bin/chromium is absent (install: apt-get update && apt-get install -y chromium).
import { existsSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { escapeMarkup } from '../../src/report/escape-markup.js';
import { runCli, tempDirs } from '../cli/cli-harness.js';

// Browser globals used inside page.evaluate, which runs in the page; the project's tsconfig has no
// DOM library, so they are declared here, untyped.
declare const document: any;
declare const DOMParser: any;
declare const window: any;
declare const getComputedStyle: any;

const CHROMIUM = '/usr/bin/chromium';
const hasChromium = existsSync(CHROMIUM);
if (!hasChromium) {
  console.warn(`html-report browser test skipped: ${CHROMIUM} not found (install it with: apt-get update && apt-get install -y chromium)`);
}
const tempDir = tempDirs('browser');

describe.skipIf(!hasChromium)('HTML and SVG files in headless Chromium', () => {
  let browser: Browser;
  let dir: string;

  beforeAll(async () => {
    dir = tempDir();
    // Long option names given short labels, with members so that every option has bands and the
    // differences have paired ranges.
    const compare = await runCli(['compare', 'Option with a long name=steady', 'Second long option name=delayed', 'third=swift', '--labels', 'A,B,C', '--members', '60', '--out', 'cmp.html'], dir);
    expect(compare.code, compare.err).toBe(0);
    const run = await runCli(['run', 'swift', '--out', 'run.html'], dir);
    expect(run.code, run.err).toBe(0);
    expect((await runCli(['compare', 'steady', 'swift', '--members', '60', '--out', 'cmp.svg'], dir)).code).toBe(0);
    browser = await chromium.launch({
      executablePath: CHROMIUM,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    });
  }, 120_000);

  afterAll(async () => {
    await browser?.close();
  });

  it('compare --labels A,B,C --members: each band is filled in its own line\'s colour at low opacity, colours differ between options, and the legend shows each option\'s band and line in one colour', async () => {
    const page = await browser.newPage({ viewport: { width: 1000, height: 900 } });
    await page.goto(pathToFileURL(join(dir, 'cmp.html')).href, { waitUntil: 'load' });
    const chart = await page.evaluate(() => {
      const svg = document.querySelector('figure svg');
      const lines = Object.fromEntries([...svg.querySelectorAll('path[data-series]')].map((p: any) => [p.getAttribute('data-series'), getComputedStyle(p).stroke]));
      const bands = [...svg.querySelectorAll('path[data-band]')].map((p: any) => ({ of: p.getAttribute('data-of'), fill: getComputedStyle(p).fill, opacity: Number(getComputedStyle(p).fillOpacity) }));
      const legendBands = [...svg.querySelectorAll('rect.legend-band')].map((r: any) => ({ of: r.getAttribute('data-of'), fill: getComputedStyle(r).fill }));
      const legendLines = [...svg.querySelectorAll('line.legend-line')].map((l: any) => ({ of: l.getAttribute('data-series'), stroke: getComputedStyle(l).stroke }));
      const texts = [...svg.querySelectorAll('text')].map((t: any) => t.textContent);
      return { lines, bands, legendBands, legendLines, texts, observed: svg.querySelectorAll('path[data-observed]').length };
    });
    expect(Object.keys(chart.lines)).toEqual(['A', 'B', 'C']);
    expect(new Set(Object.values(chart.lines)).size).toBe(3);
    expect(chart.bands.length).toBe(6); // 5-95 % and 17-83 % for each option
    for (const b of chart.bands) {
      expect(b.fill).toBe(chart.lines[b.of]);
      expect(b.opacity).toBeLessThanOrEqual(0.15);
    }
    for (const l of chart.legendLines) expect(l.stroke).toBe(chart.lines[l.of]);
    expect(chart.legendBands.map((b: { of: string }) => b.of).sort()).toEqual(['A', 'A', 'B', 'B', 'C', 'C']);
    for (const b of chart.legendBands) expect(b.fill).toBe(chart.lines[b.of]);
    expect(chart.texts).toEqual(expect.arrayContaining(['A', 'B', 'C', 'observed (HadCRUT5, Morice et al. 2021)']));
    expect(chart.observed).toBe(1);
    // The difference chart shades the range of each difference across paired members.
    const diffBands = await page.evaluate(() => [...document.querySelectorAll('figure svg')][1].querySelectorAll('path[data-band]').length);
    expect(diffBands).toBe(4);
    await page.close();
  });

  it('compare and run pages do not overflow the page width at 1000 and 480 px (measured in the DOM), and no header repeats the long names', async () => {
    for (const file of ['cmp.html', 'run.html']) {
      for (const width of [1000, 480]) {
        const page = await browser.newPage({ viewport: { width, height: 900 } });
        await page.goto(pathToFileURL(join(dir, file)).href, { waitUntil: 'load' });
        const m = await page.evaluate(() => ({
          scroll: document.documentElement.scrollWidth,
          inner: window.innerWidth,
          // Elements whose right edge passes the viewport, outside the tables' own scroll boxes.
          over: [...document.querySelectorAll('body *')]
            .filter((e: any) => !e.closest('.table-wrap') && !e.closest('svg'))
            .filter((e: any) => e.getBoundingClientRect().right > window.innerWidth + 0.5)
            .map((e: any) => e.tagName),
          headers: [...document.querySelectorAll('th')].map((t: any) => t.textContent),
        }));
        expect(m.scroll, `${file} at ${width} px`).toBeLessThanOrEqual(m.inner);
        expect(m.over, `${file} at ${width} px`).toEqual([]);
        expect(m.headers.filter((h: string) => /long name/.test(h))).toEqual([]);
        await page.close();
      }
    }
  });

  it('the run page renders with its chart and tables visible, no console errors and no requests beyond the file (screenshot taken)', async () => {
    const file = join(dir, 'run.html');
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
    expect(await page.locator('table').first().isVisible()).toBe(true);
    expect(await page.locator('.cautions li').count()).toBe(3);
    const shotPath = join(tmpdir(), 'warmcast-report-screenshot.png');
    const shot = await page.screenshot({ path: shotPath, fullPage: true });
    console.info(`HTML report screenshot: ${shotPath}`);
    // PNG signature (ISO/IEC 15948, section 5.2).
    expect(Array.from(shot.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    expect(errors).toEqual([]);
    expect(requests).toEqual([pathToFileURL(file).href]);
    await page.close();
  });

  it('every text of the rendered charts lies inside its SVG (nothing clipped off the edges)', async () => {
    const page = await browser.newPage({ viewport: { width: 1000, height: 900 } });
    await page.goto(pathToFileURL(join(dir, 'cmp.html')).href, { waitUntil: 'load' });
    // Screen rectangles, so rotated text (the value-axis title) is measured as drawn; 0.5 px slack.
    const outside = await page.evaluate(() =>
      [...document.querySelectorAll('figure svg')].flatMap((svg: any) => {
        const frame = svg.getBoundingClientRect();
        return [...svg.querySelectorAll('text')]
          .map((t: any) => ({ text: t.textContent, r: t.getBoundingClientRect() }))
          .filter(({ r }: any) => r.left < frame.left - 0.5 || r.top < frame.top - 0.5 || r.right > frame.right + 0.5 || r.bottom > frame.bottom + 0.5)
          .map(({ text }: any) => text);
      }),
    );
    expect(outside).toEqual([]);
    await page.close();
  });

  it('Chromium\'s DOMParser reads the standalone SVG file (two charts stacked) as well-formed XML, and rejects a broken one (control)', async () => {
    const page = await browser.newPage();
    const svgs = [readFileSync(join(dir, 'cmp.svg'), 'utf8'), '<svg xmlns="http://www.w3.org/2000/svg"><g></svg>'];
    const errors = await page.evaluate((docs: string[]) => docs.map((d) => new DOMParser().parseFromString(d, 'image/svg+xml').getElementsByTagName('parsererror').length), svgs);
    expect(errors).toEqual([0, 1]);
    await page.close();
  });

  it('escapeMarkup text reads back exactly through Chromium\'s XML parser, specials and non-ASCII included', async () => {
    const page = await browser.newPage();
    const samples = ['a < b & c > d', `"quoted" and 'single'`, 'CO₂ 1.5 °C — Δ', '&amp; literally', '😀 astral'];
    const back = await page.evaluate(
      (docs: string[]) => docs.map((d) => new DOMParser().parseFromString(d, 'application/xml').documentElement.getAttribute('v') + '|' + new DOMParser().parseFromString(d, 'application/xml').documentElement.textContent),
      samples.map((s) => `<t v="${escapeMarkup(s)}">${escapeMarkup(s)}</t>`),
    );
    expect(back).toEqual(samples.map((s) => `${s}|${s}`));
    await page.close();
  });
});
