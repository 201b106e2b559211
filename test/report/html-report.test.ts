import { describe, expect, it } from 'vitest';
import { htmlReport } from '../../src/report/html-report.js';
import { standardCautions } from '../../src/report/standard-cautions.js';

const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10"/></svg>\n';
const page = htmlReport({
  title: 'Report <&>',
  summaryLines: ['line "one"'],
  tables: [{ name: 't', caption: 'Cap', columns: [{ key: 'Pathway', values: ['<b>x</b>'] }, { key: 'peak_k', label: 'Peak (K)', values: Float64Array.of(1.52) }], notes: ['a note'] }],
  charts: [svg],
  assumptions: { 'CO2 formula': 'ar6', 'history splice': 'before 2024' },
  provenance: { version: '0.1.0', inputs: [{ path: '/p/a.csv', sha256: 'ab'.repeat(32) }], seed: 7, empty: [] },
  cautions: [...standardCautions(), 'extra caution'],
});

describe('htmlReport', () => {
  it('htmlReport is one self-contained page: inline CSS, no scripts, no external URLs, a policy that loads nothing', () => {
    expect(page.startsWith('<!DOCTYPE html>\n<html lang="en">')).toBe(true);
    expect(page).not.toMatch(/<script|<link|<img|<iframe|\bsrc=|href=|url\(|@import/i);
    // The only URL is the SVG namespace name, which is an identifier, never fetched.
    expect([...page.matchAll(/https?:\/\/[^"\s]+/g)].map((m) => m[0])).toEqual(['http://www.w3.org/2000/svg']);
    expect(page).toContain(`content="default-src 'none'; style-src 'unsafe-inline'; img-src data:"`);
  });

  it('htmlReport shows the standard cautions (reduced-complexity estimate, uncertainty, defer to IPCC and local guidance) and the extra ones', () => {
    for (const c of [...standardCautions(), 'extra caution']) expect(page).toContain(`<li>${c}</li>`);
    expect(standardCautions().join(' ')).toMatch(/reduced-complexity, global-mean/);
    expect(standardCautions().join(' ')).toMatch(/IPCC/);
    expect(standardCautions().join(' ')).toMatch(/your own jurisdiction/);
    expect(standardCautions('Ranges are 5-95 %.')[1]).toBe('Ranges are 5-95 %.');
  });

  it('htmlReport escapes every text it is given and inlines the chart SVG as given', () => {
    expect(page).toContain('<title>Report &lt;&amp;&gt;</title>');
    expect(page).toContain('<td>&lt;b&gt;x&lt;/b&gt;</td><td class="num">1.52</td>');
    expect(page).toContain('<p>line &quot;one&quot;</p>');
    expect(page).toContain(`<figure>${svg.trim()}</figure>`);
  });

  it('htmlReport lists assumptions and provenance, nesting objects and arrays', () => {
    expect(page).toContain('<dt>history splice</dt><dd>before 2024</dd>');
    expect(page).toContain(`<dt>sha256</dt><dd>${'ab'.repeat(32)}</dd>`);
    expect(page).toContain('<dt>seed</dt><dd>7</dd>');
    expect(page).toContain('<dt>empty</dt><dd>none</dd>');
  });
});
