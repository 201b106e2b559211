/**
 * The calibrated parameter set (pathways/calibrated-members.json) against published values:
 * - IPCC AR6 WG1 likely ranges: ECS 2.5-4 K (SPM A.4.4, confirmed), TCR 1.4-2.2 K (chapter 7.5,
 *   from memory), TCRE 1.0-2.3 K per 1000 Pg C (SPM D.1.1, quoted by a secondary page). The
 *   posterior medians must land inside: a check of the method, not a target it was tuned to.
 * - HadCRUT5 (Morice et al. 2021; the shared data copy) rebased to 1850-1900: the deterministic run
 *   (posterior medians) within 0.05 K over 1995-2014 and 2011-2020 and 0.08 K RMS over the decades
 *   1850-2019 (issue 13 item 4 tolerances).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { expectWithin } from '../asserts.js';
import { memberMetrics } from '../../src/ensemble/constrain-metrics.js';
import { historyScratch, memberHistoryInto } from '../../src/ensemble/constrain-history.js';
import { calibratedMemberSource } from '../../src/ensemble/calibrated-set.js';
import { forcingByAgent } from '../../src/forcing/agents.js';
import { readCalibratedSet } from '../../src/io/read-calibrated-set.js';
import { readPathway } from '../../src/io/load-pathway.js';
import { calibrate } from '../../src/climate/calibrate.js';
import { representativeParams } from '../../src/ensemble/calibrated-set.js';
import { projectPathway } from '../../src/projection/project-pathway.js';

const set = readCalibratedSet();

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
}

/** HadCRUT5 annual anomalies rebased to their 1850-1900 mean, by year. */
function hadcrut(): Map<number, number> {
  const rows = readFileSync('/work/shared/data/hadcrut5-global-annual.csv', 'utf8').trim().split('\n').slice(1).map((l) => l.split(',').map(Number));
  const base = rows.slice(0, 51).reduce((s, r) => s + r[1], 0) / 51;
  return new Map(rows.map((r) => [r[0], r[1] - base]));
}

function mean(series: Map<number, number>, from: number, to: number): number {
  let s = 0;
  for (let y = from; y <= to; y++) s += series.get(y)!;
  return s / (to - from + 1);
}

/** The deterministic run of a bundled pathway with the set's representative parameters, warming by year. */
function representativeRun(name: string): Map<number, number> {
  const { targets, forcingScale } = representativeParams(set);
  const p = projectPathway(readPathway(name).pathway, { params: calibrate(targets), forcingScale, method: 'exact' });
  return new Map(Array.from(p.years, (y, k) => [y, p.columns.warming_k[k]]));
}

describe('posterior of the calibrated set', () => {
  it('was drawn from at least 100,000 prior members with an effective sample size of at least 1,000 (issue 13 item 2)', () => {
    expect(set.provenance.priorMembers).toBeGreaterThanOrEqual(100_000);
    expect(set.provenance.effectiveSampleSize).toBeGreaterThanOrEqual(1000);
  });

  it('has ECS, TCR and TCRE medians inside the AR6 likely ranges', () => {
    const metrics = Array.from({ length: set.count }, (_, i) => memberMetrics(set.members, i));
    expectWithin(median(metrics.map((m) => m.ecsK)), 2.5, 4, 'ECS median, K');
    expectWithin(median(metrics.map((m) => m.tcrK)), 1.4, 2.2, 'TCR median, K');
    expectWithin(median(metrics.map((m) => m.tcreKPer1000Pgc)), 1.0, 2.3, 'TCRE median, K per 1000 Pg C');
  });
});

describe('deterministic run with the posterior medians', () => {
  const obs = hadcrut();
  const run = representativeRun('history');

  it('follows HadCRUT5 over 1995-2014 and 2011-2020 within 0.05 K', () => {
    expectWithin(mean(run, 1995, 2014) - mean(obs, 1995, 2014), -0.05, 0.05, '1995-2014 run minus HadCRUT5, K');
    expectWithin(mean(run, 2011, 2020) - mean(obs, 2011, 2020), -0.05, 0.05, '2011-2020 run minus HadCRUT5, K');
  });

  it('follows the decadal means of HadCRUT5 1850-2019 within 0.08 K RMS', () => {
    let ss = 0;
    for (let d = 1850; d < 2020; d += 10) ss += (mean(run, d, d + 9) - mean(obs, d, d + 9)) ** 2;
    expectWithin(Math.sqrt(ss / 17), 0, 0.08, 'decadal RMS, K');
  });

  it.each(['swift', 'delayed', 'steady'])('agrees with the median of 2000 calibrated members of %s within 0.05 K in every year 2025-2150', (name) => {
    const { pathway } = readPathway(name);
    const s = pathway.series;
    const n = pathway.years.length;
    const f = forcingByAgent(n, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, { co2Formula: 'ar6' });
    const drivers = { years: pathway.years, byAgent: { ...f.byAgent }, co2Ppm: s.co2_ppm! };
    const members = 2000;
    const { parameters } = calibratedMemberSource(set).draw(7, 0, members);
    const scratch = historyScratch(n);
    const y0 = pathway.years[0];
    const warming = Array.from({ length: n }, () => new Array<number>(members));
    for (let i = 0; i < members; i++) {
      memberHistoryInto(parameters.values, i, drivers, scratch);
      let base = 0;
      for (let y = 1850; y <= 1900; y++) base += scratch.surface[y - y0];
      base /= 51;
      for (let k = 0; k < n; k++) warming[k][i] = scratch.surface[k] - base;
    }
    const run = representativeRun(name);
    let worst = 0;
    for (let y = 2025; y <= 2150; y++) worst = Math.max(worst, Math.abs(run.get(y)! - median(warming[y - y0])));
    expectWithin(worst, 0, 0.05, `largest |run - ensemble median| 2025-2150, K`);
  });
});
