import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

const tmp = () => mkdtempSync(join(tmpdir(), 'warmcast-compare-'));

describe('warmcast compare', () => {
  it('prints the headline table, the milestone table with short labels in every header, the differences and a legend', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'delayed', 'swift-emissions', '--years', '2030,2050,2100'], io)).toBe(0);
    // Labels are the arguments as typed (letters when long): no header repeats the full names.
    expect(io.out).toMatch(/^ {2}option +2030 K +2050 K +2100 K +peak K +peak year +1\.5 K reached +2 K reached$/m);
    expect(io.out).toMatch(/^ {2}year +steady K +delayed K +delayed - steady +C K +C - steady$/m);
    expect(io.out).toContain('steady = Steady growth; delayed = Delayed action; C = Swift transition (emissions)');
    expect(io.out).not.toMatch(/Delayed action vs|Steady growth K/);
    expect(io.out).toMatch(/o─ steady {3}\+─ delayed {3}x─ C/);
  });

  it('--labels A,B and LABEL=PATH arguments name the options in every header; a wrong count or a repeated label is refused with exit 2', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--labels', 'now,plan', '--no-chart'], io)).toBe(0);
    expect(io.out).toMatch(/^ {2}year +now K +plan K +plan - now$/m);
    const typed = captureIo();
    expect(await main(['compare', 'base=steady', 'fast=swift', '--no-chart'], typed)).toBe(0);
    expect(typed.out).toMatch(/^ {2}year +base K +fast K +fast - base$/m);
    const count = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--labels', 'A'], count)).toBe(2);
    expect(count.err).toMatch(/--labels must give one label per option: 2 options, 1 labels/);
    const twice = captureIo();
    expect(await main(['compare', 'x=steady', 'x=swift'], twice)).toBe(2);
    expect(twice.err).toMatch(/labels must be distinct; "x" appears twice/);
  });

  it('writes a long CSV whose reference differences are zero and whose other differences equal warming minus the reference', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--out', join(dir, 'c.csv')], io)).toBe(0);
    expect(readdirSync(dir).sort()).toEqual(['c.csv', 'c.meta.json']);
    // The sidecar carries the per-option figures the long table has no room for.
    const meta = JSON.parse(readFileSync(join(dir, 'c.meta.json'), 'utf8'));
    expect(meta.comparison.pathways.map((p: { pathway: string }) => p.pathway)).toEqual(['steady', 'swift']);
    expect(meta.comparison.pathways[0].crossings[0]).toMatchObject({ threshold_k: 1.5 });
    expect(meta.headline.map((h: { label: string }) => h.label)).toEqual(['steady', 'swift']);
    const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'c.csv'), 'utf8').trim(), { header: true }).data;
    const ref = new Map<number, number>();
    for (const r of rows.filter((r) => r.pathway === 'steady')) {
      expect(Number(r.difference_k)).toBe(0);
      ref.set(Number(r.year), Number(r.warming_k));
    }
    for (const r of rows.filter((r) => r.pathway === 'swift')) {
      expect(Number(r.difference_k)).toBe(Number(r.warming_k) - ref.get(Number(r.year))!);
    }
  });

  it('with --members shows ensemble ranges in brackets, the differences\' ranges from paired members, and records the seed in the provenance', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--members', '100', '--seed', '5', '--years', '2050,2100', '--out', join(dir, 'c.json')], io)).toBe(0);
    expect(io.out).toMatch(/^ {2}2100 +\d\.\d\d \[\d\.\d\d-\d\.\d\d\] +\d\.\d\d \[\d\.\d\d-\d\.\d\d\] +-\d\.\d\d \[-\d\.\d\d to -\d\.\d\d\]$/m);
    const doc = JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8'));
    expect(doc.provenance.seed).toBe(5);
    // No single parameter set was used: provenance records what the members share, not ECS 3 / TCR 1.8.
    expect(doc.provenance.caution).toMatch(/Ranges are shown for steady, swift/);
    expect(doc.provenance.caution).not.toMatch(/No uncertainty range is shown/);
    expect(doc.provenance.parameters).toEqual({ co2_formula: 'ar6' });
    expect(doc.columns).toEqual(expect.arrayContaining(['difference_p05_k', 'difference_p95_k', 'crossed_by_1.5', 'prob_above_1.5']));
    // Paired members: the spread of the difference is narrower than the two options' ranges side by side.
    const at2100 = (label: string) => doc.rows.find((r: Record<string, number | string>) => r.pathway === label && r.year === 2100);
    const s = at2100('steady');
    const w = at2100('swift');
    expect(w.difference_p95_k - w.difference_p05_k).toBeLessThan(w.warming_p95_k - w.warming_p05_k + (s.warming_p95_k - s.warming_p05_k));
    expect(w.difference_p05_k).toBeLessThanOrEqual(w.difference_p50_k);
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

  it('with --members takes its headline (crossing years, shares crossed, members\' peaks) from the members, as `warmcast ensemble` does for the same seed', async () => {
    const dir = tmp();
    const cmp = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--members', '150', '--seed', '5', '--no-chart', '--out', join(dir, 'c.json')], cmp)).toBe(0);
    expect(await main(['ensemble', 'swift', '--members', '150', '--seed', '5', '--thresholds', '1.5,2', '--no-chart', '--out', join(dir, 'e.json')], captureIo())).toBe(0);
    const c = JSON.parse(readFileSync(join(dir, 'c.json'), 'utf8')).headline[1];
    const e = JSON.parse(readFileSync(join(dir, 'e.json'), 'utf8')).headline[0];
    expect(c.peak).toEqual(e.peak);
    expect(c.crossings).toEqual(e.crossings);
    expect(c.atYears).toEqual(e.atYears);
    expect(cmp.out).toMatch(/^ {2}caution: .*ranges cover model parameters only/m);
  });

  it('--years are put in order once each, and a year outside the pathways is refused with exit 2', async () => {
    const io = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--years', '2100,2050,2100', '--no-chart'], io)).toBe(0);
    expect(io.out.match(/^  (2050|2100)  /gm)).toEqual(['  2050  ', '  2100  ']);
    const bad = captureIo();
    expect(await main(['compare', 'steady', 'swift', '--years', '2200,2050'], bad)).toBe(2);
    expect(bad.err).toMatch(/--years 2200 must lie within the years shown, 1750-2150/);
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

  it('--from starts the charts (terminal and SVG) and the files at that year, and a year outside the pathways is refused', async () => {
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
    expect(await main(['compare', 'steady', 'swift', '--from', '1700'], bad)).toBe(2);
    expect(bad.err).toMatch(/--from\/--to \(1700-2150\) must lie within the years of the run, 1750-2150/);
  });
});
