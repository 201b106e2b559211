import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { percentText } from '../../src/report/ensemble-headlines-text.js';

const tmp = () => mkdtempSync(join(tmpdir(), 'warmcast-compare-'));

describe('warmcast compare', () => {
  it('prints milestones, differences from the reference, crossings and a legend that names each marker', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'delayed', 'swift-emissions', '--years', '2030,2050,2100'], io)).toBe(0);
    expect(io.out).toMatch(/Delayed action vs Steady growth/);
    expect(io.out).toMatch(/Reaches 1\.5 K/);
    expect(io.out).toMatch(/CO2 to net zero/);
    expect(io.out).toMatch(/o─ Steady growth/);
  });

  it('writes a long CSV whose reference differences are zero and whose other differences equal warming minus the reference', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--out', join(dir, 'c.csv')], io)).toBe(0);
    expect(readdirSync(dir).sort()).toEqual(['c.csv', 'c.meta.json']);
    // The sidecar carries the per-pathway figures the long table has no room for.
    const meta = JSON.parse(readFileSync(join(dir, 'c.meta.json'), 'utf8'));
    expect(meta.comparison.pathways.map((p: { pathway: string }) => p.pathway)).toEqual(['Steady growth', 'Swift transition']);
    expect(meta.comparison.pathways[0].crossings[0]).toMatchObject({ threshold_k: 1.5 });
    expect(meta.comparison.pathways[0].annual).toBeUndefined();
    const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'c.csv'), 'utf8').trim(), { header: true }).data;
    const ref = new Map<number, number>();
    for (const r of rows.filter((r) => r.pathway === 'Steady growth')) {
      expect(Number(r.difference_k)).toBe(0);
      ref.set(Number(r.year), Number(r.warming_k));
    }
    for (const r of rows.filter((r) => r.pathway === 'Swift transition')) {
      expect(Number(r.difference_k)).toBe(Number(r.warming_k) - ref.get(Number(r.year))!);
    }
  });

  it('writes Markdown, JSON, SVG and HTML, each with provenance or a title, and refuses an unknown extension', async () => {
    const dir = tmp();
    for (const ext of ['md', 'json', 'svg', 'html']) {
      expect(await main(['compare', 'steady', 'swift', '--out', join(dir, `c.${ext}`)], captureIo()), ext).toBe(0);
    }
    expect(readFileSync(join(dir, 'c.md'), 'utf8')).toMatch(/sha256|SHA-256/i);
    expect(JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8')).provenance.tool).toBe('warmcast');
    expect(readFileSync(join(dir, 'c.svg'), 'utf8')).toMatch(/^<svg[\s\S]*<\/svg>\s*$/);
    const html = readFileSync(join(dir, 'c.html'), 'utf8');
    expect(html).toMatch(/<svg/);
    expect(html).not.toMatch(/(src|href)="https?:/);
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--out', join(dir, 'c.xlsx')], io)).toBe(2);
    expect(io.err).toMatch(/extension must be one of/);
  });

  it('with --members shows ensemble ranges in brackets and records the seed in the provenance', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--members', '100', '--seed', '5', '--years', '2050,2100', '--out', join(dir, 'c.json')], io)).toBe(0);
    expect(io.out).toMatch(/\d\.\d\d \(\d\.\d\d to \d\.\d\d\) \[\d\.\d\d to \d\.\d\d\]/);
    const doc = JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8'));
    expect(doc.provenance.seed).toBe(5);
    // No single parameter set was used: provenance records what the members share, not ECS 3 / TCR 1.8.
    expect(doc.provenance.caution).toMatch(/Ranges are shown for Steady growth, Swift transition/);
    expect(doc.provenance.caution).not.toMatch(/No uncertainty range is shown/);
    expect(doc.provenance.parameters).toEqual({ co2_formula: 'ar6' });
    expect(doc.provenance.notes).toContain('warming_k and the milestone values are the ensemble median of each pathway; its crossing years are the first years by which half of the members have crossed');
  });

  it('--out - writes the long CSV alone on stdout, and provenance hashes the history a pathway was spliced onto', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--out', '-'], io)).toBe(0);
    expect(io.out.split('\n')[0]).toBe('pathway,year,warming_k,difference_k');
    expect(io.err).toMatch(/Warming at milestone years/);
    const dir = tmp();
    expect(await main(['compare', 'steady', 'swift', '--out', join(dir, 'c.json')], captureIo())).toBe(0);
    const inputs = JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8')).provenance.inputs.map((i: { path: string }) => i.path);
    expect(inputs.some((p: string) => p.endsWith('history.csv'))).toBe(true);
  });

  it('with --members takes crossing years and chances from the members, as `warmcast ensemble` does for the same seed, and ends with notes and cautions', async () => {
    const cmp = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--members', '300', '--seed', '5', '--no-chart'], cmp)).toBe(0);
    const ens = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '300', '--seed', '5', '--no-chart'], ens)).toBe(0);
    for (const level of ['1.5', '2']) {
      const e = new RegExp(`^  ${level.replace('.', '\\.')} K \\(20-year mean\\): probability of crossing by 2050 ([<>]?\\d+) %, by 2100 ([<>]?\\d+) %; (?:median crossing year (\\d+)|fewer than half)`, 'm').exec(ens.out)!;
      const c = new RegExp(`Swift transition: .*${level.replace('.', '\\.')} K: probability of crossing ([<>]?\\d+) % by 2050, ([<>]?\\d+) % by 2100, (?:median crossing year (\\d+)|fewer than half)`).exec(cmp.out)!;
      expect(e, ens.out).not.toBeNull();
      expect(c, cmp.out).not.toBeNull();
      expect(c.slice(1)).toEqual(e.slice(1));
    }
    expect(cmp.out).toMatch(/Probability of crossing each warming level/);
    expect(cmp.out).toMatch(/^  note: all ensembles: members drawn with replacement from the \d+ equally weighted members of the calibrated set/m);
    expect(cmp.out).toMatch(/^  caution: .*weighted by how well each member reproduces the observed warming/m);
  });

  it('with --members the peak is the members\' own, as `warmcast ensemble` gives it for the same seed: in the headline, the table and the JSON', async () => {
    const dir = tmp();
    const cmp = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--members', '150', '--seed', '5', '--no-chart'], cmp)).toBe(0);
    const ens = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '150', '--seed', '5', '--no-chart', '--out', join(dir, 'e.json')], ens)).toBe(0);
    const peak = JSON.parse(readFileSync(join(dir, 'e.json'), 'utf8')).headlines.peak;
    const k = (v: number) => v.toFixed(2);
    const rising = peak.still_rising > 0 ? ` \\(${percentText(peak.still_rising)} still rising in 2150\\)` : '';
    expect(cmp.out).toMatch(new RegExp(`Swift transition: members' median peak ${k(peak.warming_k.p50)} K \\[${k(peak.warming_k.p05)} to ${k(peak.warming_k.p95)}\\] in ${Math.round(peak.year.p50)}${rising}; `));
    expect(cmp.out).not.toMatch(/median peaks at/);
    expect(cmp.out).toMatch(new RegExp(`^  Swift transition +${k(peak.warming_k.p50)} \\[${k(peak.warming_k.p05)} to ${k(peak.warming_k.p95)}\\] +${Math.round(peak.year.p50)}`, 'm'));
    expect(cmp.out).toMatch(/the peak is the members' own, not the median line's/);
    expect(await main(['compare', 'steady', 'swift', '--members', '150', '--seed', '5', '--no-chart', '--out', join(dir, 'c.json')], captureIo())).toBe(0);
    const doc = JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8'));
    expect(doc.pathways[1].members_peak).toEqual(peak);
  });

  it('--years are put in order once each, and a year no pathway covers is refused with exit 2', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--years', '2100,2050,2100', '--no-chart'], io)).toBe(0);
    expect(io.out.match(/^  (2050|2100)  /gm)).toEqual(['  2050  ', '  2100  ']);
    const bad = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--years', '2200,2050'], bad)).toBe(2);
    expect(bad.err).toMatch(/--years 2200 must lie within the years the pathways cover, 1750-2150/);
    const half = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--years', '2030,2035.5'], half)).toBe(2);
    expect(half.err).toMatch(/--years must be whole years, such as 2030,2050,2100; got 2035\.5/);
  });

  it('with --members refuses --ecs, --tcr and --params (each member draws its own) instead of ignoring them', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--members', '50', '--ecs', '4', '--tcr', '2'], io)).toBe(2);
    expect(io.err).toMatch(/with --members each member takes its parameters from the calibrated set, so --ecs, --tcr would be ignored/);
    expect(await main(['compare', 'steady', 'swift', '--members', '50', '--co2-formula', 'log', '--no-chart'], captureIo())).toBe(0);
    const feedback = captureIo();
    expect(await main(['compare', 'swift-emissions', '--members', '50', '--no-carbon-feedback'], feedback)).toBe(2);
    expect(feedback.err).toMatch(/--no-carbon-feedback would be ignored/);
  });

  it('--from starts the charts (terminal and SVG) at that year, and a year outside the pathways is refused', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--from', '2000', '--out', join(dir, 'c.svg')], io)).toBe(0);
    // The year axis: the line of tick labels under the chart.
    const axis = /^\s+(\d{4})(\s+\d{4})+\s*$/m.exec(io.out)!;
    expect(Number(axis[1])).toBe(2000);
    const svg = readFileSync(join(dir, 'c.svg'), 'utf8');
    expect(svg).not.toMatch(/>1900</);
    expect(svg).toMatch(/>2000</);
    const bad = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--from', '2150'], bad)).toBe(2);
    expect(bad.err).toMatch(/--from 2150 must lie within the years of the pathways and before their end, 1750-2149/);
  });
});

