import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { percent as percentText } from '../../src/report/format-numbers.js';

const tmp = () => mkdtempSync(join(tmpdir(), 'warmcast-ens-'));

describe('warmcast ensemble and merge', () => {
  it('writes DESIGN.md columns and prints crossing probabilities for 2050 and 2100 and the median crossing year', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '200', '--seed', '7', '--out', join(dir, 'e.csv')], io)).toBe(0);
    const header = readFileSync(join(dir, 'e.csv'), 'utf8').split('\n')[0];
    expect(header).toBe(
      'year,warming_p05_k,warming_p17_k,warming_p50_k,warming_p83_k,warming_p95_k,crossed_by_1.5,prob_above_1.5,crossed_by_2,prob_above_2,crossed_by_3,prob_above_3',
    );
    expect(io.out.replace(/\n {12}/g, ' ')).toMatch(/^ {2}reached {3}1\.5 K: median \d{4}; members crossed: \d+ % by 2030, \d+ % by 2050, \d+ % by 2100 \(20-year means, the IPCC AR6 rule\)/m);
    const meta = JSON.parse(readFileSync(join(dir, 'e.meta.json'), 'utf8'));
    expect(meta.seed).toBe(7);
    expect(meta.notes.join("\n")).toMatch(/members drawn with replacement from the \d+ equally weighted members of the calibrated set/);
    // Both shares are explained in the file's notes.
    expect(meta.notes.some((n: string) => n.startsWith('crossed_by_<t>: share of members that have crossed t K by year y'))).toBe(true);
    expect(meta.notes.some((n: string) => n.startsWith('prob_above_<t>: share of members whose 20-year mean warming'))).toBe(true);
    // Percentiles ordered in every year (a property of order statistics).
    const rows = Papa.parse<string[]>(readFileSync(join(dir, 'e.csv'), 'utf8').trim()).data.slice(1);
    for (const r of rows) {
      const p = r.slice(1, 6).map(Number);
      for (let k = 1; k < 5; k++) expect(p[k]).toBeGreaterThanOrEqual(p[k - 1]);
    }
  });

  it('gives byte-identical output for the same seed, and shard-and-merge equals one run bit for bit', async () => {
    const dir = tmp();
    const run = (args: string[]) => main(['ensemble', 'delayed', '--members', '150', '--seed', '11', '--no-chart', ...args], captureIo());
    expect(await run(['--out', join(dir, 'a.csv')])).toBe(0);
    expect(await run(['--out', join(dir, 'b.csv')])).toBe(0);
    for (const k of [1, 2, 3]) expect(await run(['--shard', `${k}/3`, '--out', join(dir, `s${k}.json`)])).toBe(0);
    const io = captureIo();
    expect(await main(['merge', join(dir, 's3.json'), join(dir, 's1.json'), join(dir, 's2.json'), '--out', join(dir, 'm.csv'), '--no-chart'], io)).toBe(0);
    const a = readFileSync(join(dir, 'a.csv'));
    expect(readFileSync(join(dir, 'b.csv')).equals(a)).toBe(true);
    expect(readFileSync(join(dir, 'm.csv')).equals(a)).toBe(true);
  });

  it('ensemble prints the members\' own peak (median, 5-95 %, median year, share still rising), and the JSON, .meta.json and merged shards carry the same figures', async () => {
    const dir = tmp();
    const run = (args: string[], io = captureIo()) => main(['ensemble', 'delayed', '--members', '120', '--seed', '5', '--no-chart', ...args], io);
    const io = captureIo();
    expect(await run(['--out', join(dir, 'e.csv')], io)).toBe(0);
    const line = /^ {2}peak {6}(\d+\.\d\d) K \[(\d+\.\d\d)-(\d+\.\d\d)\] in (\d{4})(?:; ([<>]?\d+) % of members still rising at the end)?$/m.exec(io.out);
    expect(line, io.out).not.toBeNull();
    const meta = JSON.parse(readFileSync(join(dir, 'e.meta.json'), 'utf8'));
    const peak = meta.ensemble.peak;
    expect(line!.slice(1, 4).map(Number)).toEqual([peak.warming_k.p50, peak.warming_k.p05, peak.warming_k.p95].map((v: number) => +v.toFixed(2)));
    expect(Number(line![4])).toBe(Math.round(peak.year.p50));
    if (peak.still_rising > 0) expect(line![5]).toBe(percentText(peak.still_rising).replace(' %', ''));
    // Ordered percentiles; peak years within the run.
    const w = peak.warming_k;
    expect(w.p05 <= w.p17 && w.p17 <= w.p50 && w.p50 <= w.p83 && w.p83 <= w.p95).toBe(true);
    expect(peak.year.p05).toBeGreaterThanOrEqual(1750);
    expect(peak.year.p95).toBeLessThanOrEqual(2150);
    expect(meta.headline[0].peak).toMatchObject({ warmingK: w.p50, year: Math.round(peak.year.p50), range: { p05: w.p05, p95: w.p95 } });
    // The JSON output carries the same figures; merged shards (which find the peaks in the kept warming) give them bit for bit.
    expect(await run(['--out', join(dir, 'e.json')])).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'e.json'), 'utf8')).ensemble.peak).toEqual(peak);
    for (const k of [1, 2]) expect(await run(['--shard', `${k}/2`, '--out', join(dir, `s${k}.json`)])).toBe(0);
    const merged = captureIo();
    expect(await main(['merge', join(dir, 's2.json'), join(dir, 's1.json'), '--out', join(dir, 'm.csv'), '--no-chart'], merged)).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'm.meta.json'), 'utf8')).ensemble.peak).toEqual(peak);
    expect(merged.out).toContain(line![0]);
  });

  it('ensemble --out x.md has a table of the members\' own peak: peak warming and peak year at 5/17/50/83/95 %, and the share still rising', async () => {
    const dir = tmp();
    expect(await main(['ensemble', 'swift', '--members', '60', '--seed', '2', '--no-chart', '--out', join(dir, 'e.md')], captureIo())).toBe(0);
    const md = readFileSync(join(dir, 'e.md'), 'utf8');
    expect(md).toContain("**Peak warming (members' own): each member's highest annual warming and its year, across members**");
    expect(md).toMatch(/\n\| peak warming \(K\) +(\| +\d\.\d\d ){5}\|\n\| peak year +(\| +\d{4} ){5}\|\n/);
    expect(md).toMatch(/\n[<>]?\d+ % of members still rising in 2150 /);
  });

  it('ensemble --baseline 1995-2014 names thresholds "above the 1995-2014 mean" and carries the baseline note on the terminal and in the files', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['ensemble', 'delayed', '--members', '50', '--baseline', '1995-2014', '--no-chart', '--out', join(dir, 'e.csv')], io)).toBe(0);
    expect(io.out.replace(/\n {12}/g, ' ')).toMatch(/^ {2}reached {3}1\.5 K above the 1995-2014 mean: median/m);
    expect(io.out).not.toMatch(/1\.5 K: median/);
    const note = 'IPCC AR6 global warming levels (1.5 K, 2 K) are relative to 1850-1900; with the 1995-2014 baseline';
    const noted = captureIo();
    expect(await main(['ensemble', 'delayed', '--members', '50', '--baseline', '1995-2014', '--no-chart', '--notes'], noted)).toBe(0);
    expect(noted.out.replace(/\n {8}/g, ' ')).toContain(`note: ${note}`);
    expect(JSON.parse(readFileSync(join(dir, 'e.meta.json'), 'utf8')).notes.join('\n')).toContain(note);
    const plain = captureIo();
    expect(await main(['ensemble', 'delayed', '--members', '50', '--no-chart'], plain)).toBe(0);
    expect(plain.out).not.toContain('global warming levels');
  });

  it('refuses to merge an incomplete set of shards with exit 2', async () => {
    const dir = tmp();
    expect(await main(['ensemble', 'swift', '--members', '40', '--seed', '3', '--shard', '1/2', '--out', join(dir, 's1.json')], captureIo())).toBe(0);
    const io = captureIo();
    expect(await main(['merge', join(dir, 's1.json'), '--out', join(dir, 'm.csv')], io)).toBe(2);
    expect(readdirSync(dir)).toEqual(['s1.json']);
  });

  it('rejects a malformed --shard with exit 2', async () => {
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--shard', '4/3'], io)).toBe(2);
    expect(io.err).toMatch(/K\/N/);
  });

  it('ensemble refuses --ecs, --tcr and --params with exit 2 saying they are sampled, and writes nothing', async () => {
    const dir = tmp();
    writeFileSync(join(dir, 'p.json'), JSON.stringify({ upper_heat_capacity: 12 }));
    for (const extra of [['--ecs', '4.5'], ['--tcr=2.3'], ['--params', join(dir, 'p.json')]]) {
      const io = captureIo();
      expect(await main(['ensemble', 'swift', '--members', '20', ...extra, '--out', join(dir, 'e.csv')], io)).toBe(2);
      expect(io.err).toMatch(/ensemble does not take --(ecs|tcr|params): each member takes its own feedback, heat capacities, ocean exchange, efficacy and forcing multipliers from the calibrated parameter set/);
      expect(io.out).toBe('');
    }
    expect(readdirSync(dir)).toEqual(['p.json']);
  });

  it('ensemble --co2-formula log changes the ensemble and is recorded; provenance holds only what every member shares', async () => {
    const dir = tmp();
    const run = (args: string[]) => main(['ensemble', 'swift', '--members', '50', '--seed', '7', '--no-chart', ...args], captureIo());
    expect(await run(['--out', join(dir, 'ar6.csv')])).toBe(0);
    expect(await run(['--co2-formula', 'log', '--out', join(dir, 'log.csv')])).toBe(0);
    expect(readFileSync(join(dir, 'log.csv')).equals(readFileSync(join(dir, 'ar6.csv')))).toBe(false);
    const meta = JSON.parse(readFileSync(join(dir, 'log.meta.json'), 'utf8'));
    expect(meta.parameters).toEqual({ co2_formula: 'log' });
    expect(JSON.parse(readFileSync(join(dir, 'ar6.meta.json'), 'utf8')).parameters.co2_formula).toBe('ar6');
  });

  it('merge refuses --co2-formula, --ecs, --tcr and --params with exit 2 (it takes everything from the shards) and records the shards\' CO2 formula', async () => {
    const dir = tmp();
    for (const k of [1, 2]) {
      expect(await main(['ensemble', 'swift', '--members', '40', '--co2-formula', 'log', '--shard', `${k}/2`, '--out', join(dir, `s${k}.json`)], captureIo())).toBe(0);
    }
    const shards = [join(dir, 's1.json'), join(dir, 's2.json')];
    for (const extra of [['--co2-formula', 'ar6'], ['--ecs', '4.5'], ['--tcr', '2'], ['--params', 'p.json']]) {
      const io = captureIo();
      expect(await main(['merge', ...shards, ...extra, '--out', join(dir, 'm.csv')], io)).toBe(2);
      expect(io.err).toMatch(/merge does not take --[a-z0-9-]+: every setting comes from the shards/);
    }
    expect(readdirSync(dir).sort()).toEqual(['s1.json', 's2.json']);
    expect(await main(['merge', ...shards, '--out', join(dir, 'm.csv'), '--no-chart'], captureIo())).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'm.meta.json'), 'utf8')).parameters.co2_formula).toBe('log');
  });

  it('ensemble refuses warming levels of 0 K and below with exit 2 (levels are above the baseline)', async () => {
    for (const t of ['--thresholds=-1', '--thresholds=0', '--thresholds=1.5,0']) {
      const io = captureIo();
      expect(await main(['ensemble', 'swift', '--members', '20', t], io)).toBe(2);
      expect(io.err).toMatch(/--thresholds must be warming levels above 0 K/);
      expect(io.out).toBe('');
    }
  });

  it('ensemble says "or earlier" instead of a median crossing year when half the members are above a small level in the first 20-year window', async () => {
    // A file whose CO2 is high in 1750-1800 and back at 1750's value by 1820, so that 1750-1769 is
    // warmer than the 1850-1900 baseline in nearly every member.
    const file = join(tmp(), 'early.csv');
    writeFileSync(file, 'year,co2_ppm\n1750,450\n1800,450\n1820,278.3\n1900,278.3\n2000,380\n2100,450\n');
    const early = captureIo();
    expect(await main(['ensemble', file, '--members', '400', '--thresholds', '0.001,1.5', '--no-chart'], early)).toBe(0);
    expect(early.out).toMatch(/^ {2}reached {3}0\.001 K: median 1759 or earlier;/m);
    // With the bundled history (AR6 forcing), 1750-1769 is cooler than 1850-1900 in most members.
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '400', '--thresholds', '0.001,1.5', '--no-chart'], io)).toBe(0);
    expect(io.out).toMatch(/^ {2}reached {3}0\.001 K: median 1\d{3};/m);
    expect(io.out).toMatch(/^ {12}1\.5 K: median 20\d\d;/m);
  });

  it('ensemble of 1 or 2 members prints the ECS-TCR correlation as n/a and warns, on the terminal and in the notes, that its ranges are rough', async () => {
    const dir = tmp();
    for (const n of [1, 2]) {
      const io = captureIo();
      expect(await main(['ensemble', 'swift', '--members', String(n), '--no-chart', '--out', join(dir, `e${n}.json`)], io)).toBe(0);
      const json = JSON.parse(readFileSync(join(dir, `e${n}.json`), 'utf8'));
      expect(json.ensemble.ecs_tcr_correlation).toBeNull();
      expect(io.out).not.toMatch(/NaN/);
      expect(io.out).toMatch(new RegExp(`\\n  note: warning: only ${n} members?: percentile ranges and probabilities from so few members are rough`));
      expect(json.provenance.notes.some((note: string) => note.startsWith(`warning: only ${n} member`))).toBe(true);
    }
    const dir2 = tmp();
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '100', '--no-chart', '--out', join(dir2, 'e.md')], io)).toBe(0);
    expect(io.out).not.toMatch(/warning/);
    expect(readFileSync(join(dir2, 'e.md'), 'utf8')).toMatch(/ECS-TCR correlation across members: 0\.\d\d/);
  });

  it('an emission ensemble prints the 5-95 % range of its carbon-cycle multiplier, and its caution names the multiplier as the README does (on the pre-industrial iIRF100 r0)', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['ensemble', 'swift-emissions', '--members', '200', '--seed', '3', '--no-chart', '--out', join(dir, 'e.json')], io)).toBe(0);
    const json = JSON.parse(readFileSync(join(dir, 'e.json'), 'utf8'));
    const { p50, p05, p95 } = json.ensemble.sampled.irf100_scale;
    // Drawn with median 1 and 5-95 % 0.765-1.235 (src/ensemble/sampling.ts); 200 members land near it.
    expect(p05).toBeLessThan(p50);
    expect(p50).toBeLessThan(p95);
    expect(p05).toBeGreaterThan(0.6);
    expect(p95).toBeLessThan(1.4);
    expect(json.cautions.join(' ')).toMatch(/own multipliers on the pre-industrial iIRF100 r0 of its uptake feedback/);
    expect(json.cautions.join(' ')).not.toMatch(/response time/);
    expect(await main(['ensemble', 'swift', '--members', '200', '--seed', '3', '--no-chart', '--out', join(dir, 'plain.json')], captureIo())).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'plain.json'), 'utf8')).cautions.join(' ')).not.toMatch(/iIRF100/);
  });

  it('ensemble --out writes the headline: in .json and the .csv\'s .meta.json (the CSV stays a yearly table) and first in .md; crossed_by_<t> in the files equals the shares the headline quotes; merge --out the same', async () => {
    const dir = tmp();
    const args = ['delayed', '--members', '120', '--seed', '4', '--no-chart'];
    const io = captureIo();
    expect(await main(['ensemble', ...args, '--out', join(dir, 'e.json')], io)).toBe(0);
    for (const ext of ['csv', 'md']) expect(await main(['ensemble', ...args, '--out', join(dir, `e.${ext}`)], captureIo())).toBe(0);
    const json = JSON.parse(readFileSync(join(dir, 'e.json'), 'utf8'));
    const [h] = json.headline;
    expect(Object.keys(json)).toEqual(['provenance', 'command', 'title', 'baseline', 'headline', 'ensemble', 'notes', 'cautions', 'columns', 'rows']);
    expect(h.members).toBe(120);
    expect(h.crossings.map((t: { thresholdK: number }) => t.thresholdK)).toEqual([1.5, 2, 3]);
    // The headline's shares crossed by 2030/2050/2100 are the crossed_by_<t> columns of the data, year for year.
    const csv = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'e.csv'), 'utf8').trim(), { header: true }).data;
    for (const x of h.crossings) {
      for (const b of x.crossedBy) {
        const row = csv.find((r) => Number(r.year) === b.year)!;
        expect(Number(row[`crossed_by_${x.thresholdK}`])).toBe(b.share);
        expect(json.rows.find((r: { year: number }) => r.year === b.year)[`crossed_by_${x.thresholdK}`]).toBe(b.share);
      }
    }
    // ... and the terminal prints them.
    const t15 = h.crossings[0];
    expect(io.out).toContain(`1.5 K: median ${t15.year}; members crossed: ${t15.crossedBy.map((b: { year: number; share: number }) => `${percentText(b.share)} by ${b.year}`).join(', ')}`);
    expect(Object.keys(json.ensemble.sampled)).toEqual(['ecs_k', 'tcr_k']);
    expect(JSON.parse(readFileSync(join(dir, 'e.meta.json'), 'utf8')).headline).toEqual(json.headline);
    expect(readFileSync(join(dir, 'e.csv'), 'utf8').split('\n')[0]).toMatch(/^year,warming_p05_k,/);
    const md = readFileSync(join(dir, 'e.md'), 'utf8');
    expect(md.indexOf('**Headline: warming relative to 1850-1900**')).toBeLessThan(md.indexOf('| year |'));
    expect(md).toContain(`${t15.year} (${percentText(t15.crossedBy[2].share)} by 2100)`);

    for (const k of [1, 2]) expect(await main(['ensemble', ...args, '--shard', `${k}/2`, '--out', join(dir, `s${k}.json`)], captureIo())).toBe(0);
    expect(await main(['merge', join(dir, 's1.json'), join(dir, 's2.json'), '--no-chart', '--out', join(dir, 'm.json')], captureIo())).toBe(0);
    expect(await main(['merge', join(dir, 's1.json'), join(dir, 's2.json'), '--no-chart', '--out', join(dir, 'm.csv')], captureIo())).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'm.json'), 'utf8')).headline).toEqual(json.headline);
    expect(JSON.parse(readFileSync(join(dir, 'm.meta.json'), 'utf8')).headline).toEqual(json.headline);
  });

  it('crossed_by_<t> never decreases and is never below prob_above_<t> (a member above in a year has crossed by it)', async () => {
    const dir = tmp();
    expect(await main(['ensemble', 'swift', '--members', '300', '--seed', '8', '--no-chart', '--out', join(dir, 'e.csv')], captureIo())).toBe(0);
    const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'e.csv'), 'utf8').trim(), { header: true }).data;
    for (const t of ['1.5', '2', '3']) {
      let last = -Infinity;
      for (const r of rows) {
        if (r[`crossed_by_${t}`] === '') continue;
        const by = Number(r[`crossed_by_${t}`]);
        expect(by).toBeGreaterThanOrEqual(last);
        expect(by).toBeGreaterThanOrEqual(Number(r[`prob_above_${t}`]));
        last = by;
      }
    }
    // swift peaks and falls back: somewhere the share above 1.5 K is below the share that has crossed it.
    expect(rows.some((r) => Number(r['prob_above_1.5']) < Number(r['crossed_by_1.5']))).toBe(true);
  });

  it('merge reports the pathway the shards record: its name as the title, its files with SHA-256 and the same notes as one whole run', async () => {
    const dir = tmp();
    const args = ['swift', '--members', '60', '--seed', '2', '--no-chart'];
    const whole = captureIo();
    expect(await main(['ensemble', ...args, '--out', join(dir, 'whole.csv')], whole)).toBe(0);
    for (const k of [1, 2]) expect(await main(['ensemble', ...args, '--shard', `${k}/2`, '--out', join(dir, `s${k}.json`)], captureIo())).toBe(0);
    const io = captureIo();
    expect(await main(['merge', join(dir, 's1.json'), join(dir, 's2.json'), '--no-chart', '--out', join(dir, 'm.csv')], io)).toBe(0);
    expect(readFileSync(join(dir, 'm.csv')).equals(readFileSync(join(dir, 'whole.csv')))).toBe(true);
    expect(io.out.split('\n').slice(0, 2)).toEqual([expect.stringMatching(/^Swift transition$/), expect.stringMatching(/^ {2}60 members, seed 2:/)]);
    const a = JSON.parse(readFileSync(join(dir, 'whole.meta.json'), 'utf8'));
    const m = JSON.parse(readFileSync(join(dir, 'm.meta.json'), 'utf8'));
    expect(m.pathway).toBe('Swift transition');
    expect(a.pathway).toBe('Swift transition');
    expect(m.pathway_inputs).toEqual(a.inputs);
    expect(m.pathway_inputs.map((i: { path: string }) => i.path.split(/[\\/]/).pop())).toEqual(['swift.csv', 'history.csv']);
    expect(m.inputs.map((i: { path: string }) => i.path)).toEqual([join(dir, 's1.json'), join(dir, 's2.json')]);
    expect(m.notes).toEqual(a.notes);
    expect(m.notes.some((n: string) => /spliced onto bundled history/.test(n))).toBe(true);
  });

  it('merge of shards without a pathway record (older shard files) still merges bit for bit and says the pathway was not recorded', async () => {
    const dir = tmp();
    const args = ['delayed', '--members', '40', '--seed', '9', '--no-chart'];
    expect(await main(['ensemble', ...args, '--out', join(dir, 'whole.csv')], captureIo())).toBe(0);
    for (const k of [1, 2]) {
      expect(await main(['ensemble', ...args, '--shard', `${k}/2`, '--out', join(dir, `s${k}.json`)], captureIo())).toBe(0);
      const doc = JSON.parse(readFileSync(join(dir, `s${k}.json`), 'utf8'));
      delete doc.pathway;
      writeFileSync(join(dir, `s${k}.json`), JSON.stringify(doc));
    }
    const io = captureIo();
    expect(await main(['merge', join(dir, 's1.json'), join(dir, 's2.json'), '--no-chart', '--out', join(dir, 'm.csv')], io)).toBe(0);
    expect(readFileSync(join(dir, 'm.csv')).equals(readFileSync(join(dir, 'whole.csv')))).toBe(true);
    expect(io.out.split('\n')[0]).toBe('merged ensemble (pathway not recorded in the shards)');
    const m = JSON.parse(readFileSync(join(dir, 'm.meta.json'), 'utf8'));
    expect(m.pathway).toBeUndefined();
    expect(m.notes[0]).toMatch(/^the pathway's name, input files and notes were not recorded in the shards/);
  });

  it('merge of shards from different pathways exits 2 naming the pathway in the user\'s words, and writes nothing', async () => {
    const dir = tmp();
    expect(await main(['ensemble', 'swift', '--members', '40', '--shard', '1/2', '--out', join(dir, 's1.json')], captureIo())).toBe(0);
    expect(await main(['ensemble', 'delayed', '--members', '40', '--shard', '2/2', '--out', join(dir, 's2.json')], captureIo())).toBe(0);
    const io = captureIo();
    expect(await main(['merge', join(dir, 's1.json'), join(dir, 's2.json'), '--out', join(dir, 'm.csv')], io)).toBe(2);
    expect(io.err).toContain(`${join(dir, 's2.json')}: must come from the same ensemble as ${join(dir, 's1.json')}; it differs in the pathway (another file, or its contents differ)`);
    expect(io.err).not.toMatch(/inputChecksum|membersTotal|co2Formula/);
    expect(readdirSync(dir).sort()).toEqual(['s1.json', 's2.json']);
  });

  it('--shard without --out NAME.json is refused before any member is drawn or memory is sized', async () => {
    const io = captureIo();
    // 10^8 members kept for a shard would be refused by the memory estimate; the missing file is said first.
    expect(await main(['ensemble', 'swift', '--members', '100000000', '--shard', '1/1'], io)).toBe(2);
    expect(io.err).toMatch(/--shard writes a shard file: give --out NAME\.json/);
  });

  it('an emission file run without the history splice takes its --baseline in the ensemble too (as run does)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-ens-'));
    const file = join(dir, 'em.csv');
    writeFileSync(file, '# name: My emissions\nyear,co2_gtco2\n2025,40\n2050,0\n2100,-5\n');
    const io = captureIo();
    expect(await main(['ensemble', file, '--no-splice', '--baseline', '2025-2030', '--members', '20', '--no-chart', '--absent-emissions', 'hold'], io), io.err).toBe(0);
    expect(io.out.replace(/\n {2}/g, ' ')).toMatch(/warming relative to the 2025-2030 mean/);
  });

  it('the terminal ends with the few-members warning (said once), the count of notes and one caution line; --notes prints the notes', async () => {
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '20', '--no-chart'], io)).toBe(0);
    expect(io.out.match(/only 20 members/g)).toHaveLength(1);
    expect(io.out).toMatch(/^ {2}\d+ notes on how the inputs were read and run: add --notes to see them/m);
    expect(io.out.trimEnd().split('\n').slice(-3).join(' ')).toMatch(/caution: reduced-complexity global-mean estimates; .*warmcast ensemble --help/);
    const all = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '20', '--no-chart', '--notes'], all)).toBe(0);
    expect(all.out).toMatch(/^ {2}note: spliced onto bundled history at 2025/m);
    expect(all.out).toMatch(/^ {2}note: members drawn with replacement from the \d+ equally weighted members of the calibrated set/m);
  });

  it('for a pathway ending in 2100, "by 2100" is n/a and the share crossed by 2090 (the last 20-year mean) is given instead', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-ens-'));
    const file = join(dir, 'to2100.csv');
    writeFileSync(file, '# name: Ends in 2100\nyear,co2_ppm\n2030,440\n2060,500\n2100,560\n');
    const io = captureIo();
    expect(await main(['ensemble', file, '--members', '200', '--no-chart', '--out', join(dir, 'e.md')], io)).toBe(0);
    expect(io.out.replace(/\n {12}/g, ' ')).toMatch(/2 K: median [^;]+; members crossed: [<>]?\d+ % by 2030, [<>]?\d+ % by 2050, n\/a by 2100 \(by 2090, the run's last 20-year mean: [<>]?\d+ %\)/);
    expect(readFileSync(join(dir, 'e.md'), 'utf8')).toMatch(/\([<>]?\d+ % by 2090\)/);
  });
});


describe('warmcast ensemble: calibrated members and --prior', () => {
  it('gives the same output for the same seed, and the prior (--prior) spreads wider than the calibrated set in 2100 (the record narrows it)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-cal-'));
    const runTo = async (name: string, extra: string[]) => {
      expect(await main(['ensemble', 'delayed', '--members', '500', '--seed', '3', '--no-chart', '--out', join(dir, name), ...extra], captureIo())).toBe(0);
      return JSON.parse(readFileSync(join(dir, name), 'utf8')) as { rows: Record<string, number>[] };
    };
    const a = await runTo('a.json', []);
    const b = await runTo('b.json', []);
    expect(b.rows).toEqual(a.rows);
    const prior = await runTo('prior.json', ['--prior']);
    const width = (r: { rows: Record<string, number>[] }) => {
      const row = r.rows.find((x) => x.year === 2100)!;
      return row.warming_p95_k - row.warming_p05_k;
    };
    expect(width(prior)).toBeGreaterThan(width(a));
  });
});
