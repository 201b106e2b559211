/**
 * Builds `pathways/calibrated-members.json`: the parameter set every ensemble draws its members from.
 *
 * 1. Prior (src/ensemble/prior.ts): two-box physics from CMIP two-layer fits, a multiplier per
 *    forcing agent from the AR6 5-95 % ERF series (aerosol spreads doubled, since the AR6 aerosol
 *    assessment enters again as a constraint), carbon-cycle and CH4 lifetime multipliers. Never the
 *    assessed ECS/TCR ranges.
 * 2. Every prior member is run over the bundled history (1750 on, concentration-driven, its own
 *    forcing scales) with the exact two-box propagator.
 * 3. Constraint (src/ensemble/constrain.ts): members are weighted by a likelihood of
 *    (a) HadCRUT5 warming as period means relative to 1850-1900, errors from an AR(1) model of
 *        internal variability fitted to the residuals (fit, weight, refit on the weighted mean, weight
 *        again) plus the dataset's own uncertainty;
 *    (b) the AR6 ocean heat content change 1971-2018 (full depth);
 *    (c) the cumulative CO2 emissions 1850-2019 that the member's carbon cycle needs to follow the
 *        observed concentrations, against 2390 ± 240 Gt CO2 (AR6 WG1 SPM, from memory, "likely");
 *    (d) the AR6 assessed aerosol ERF 2005-2014 (mean of the AR6 series, 5/50/95 %).
 * 4. Systematic resampling of the weighted prior to `keep` members (equal weight), written with the
 *    provenance (data files and SHA-256, prior, likelihood, seed), the effective sample size, the
 *    posterior metrics and the representative parameters `run` uses (posterior medians).
 *
 * `--validate` instead constrains on 1850-2000 only (periods up to 2000, ocean heat 1971-2000) and
 * reports the predicted 2001-2023 warming against HadCRUT5 (held-out check); nothing is written.
 *
 * Deterministic: member i of the prior depends only on (seed, i); the same data, seed and counts give
 * the same bytes.
 *
 * Usage: node dist/scripts/calibrate-ensemble.js [--members 100000] [--keep 4000] [--seed 20261204]
 *        [--out pathways/calibrated-members.json] [--validate | --no-validate]
 * Without --no-validate the held-out check also runs and is recorded in the file's provenance.
 * Try: npm run build && node dist/scripts/calibrate-ensemble.js --members 20000 --out /tmp/set.json
 */
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { forcingByAgent, FORCING_AGENTS } from '../src/forcing/agents.js';
import { bundledPathwaysDir, loadHistory } from '../src/io/bundled-pathways.js';
import { CALIBRATED_SET_FORMAT } from '../src/ensemble/calibrated-set.js';
import { memberMetrics } from '../src/ensemble/constrain-metrics.js';
import { historyResponses, historyScratch, memberHistoryInto, type HistoryDrivers, type HistoryTargets } from '../src/ensemble/constrain-history.js';
import { fitAr1, importanceWeights, logLikelihoods, periodMeanCovariance, systematicResample, weightedQuantile, type Ar1, type Observations } from '../src/ensemble/constrain.js';
import { memberGenerators } from '../src/ensemble/member-generators.js';
import { ensemblePrior, forcingScaleRange, memberParameterKeys, samplePrior, type EnsemblePrior, type MemberColumns } from '../src/ensemble/prior.js';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';


/** The package root (the folder holding pathways/), from source or from the build. */
const ROOT = dirname(bundledPathwaysDir());

/** The published records, from pathways/records/ when bundled there, else the shared copies. */
function recordPath(root: string, name: string): string {
  const bundled = join(root, 'pathways', 'records', name);
  if (existsSync(bundled)) return bundled;
  return join('/work/shared/data', name);
}

/**
 * AR6 ERF columns behind each forcing agent (IPCC AR6 WG1 Annex III series; Smith et al. 2021).
 * The lumped `aerosol` and `other` agents stand until the agents are split by AR6 category.
 */
const AR6_COLUMNS: Record<string, string[]> = {
  co2: ['co2'],
  ch4: ['ch4'],
  n2o: ['n2o'],
  other_ghg: ['other_wmghg'],
  ozone: ['o3'],
  strat_h2o: ['h2o_stratospheric'],
  contrails: ['contrails'],
  aerosol_ari: ['aerosol-radiation_interactions'],
  aerosol_aci: ['aerosol-cloud_interactions'],
  bc_snow: ['bc_on_snow'],
  land_use: ['land_use'],
  solar: ['solar'],
  volcanic: ['volcanic'],
  aerosol: ['aerosol'],
  other: ['other_wmghg', 'o3', 'h2o_stratospheric', 'contrails', 'bc_on_snow', 'land_use'],
};

/** A numeric CSV: header names and rows of numbers. */
interface Csv {
  file: string;
  header: string[];
  rows: number[][];
}

function readCsv(file: string, skipLines = 0): Csv {
  const lines = readFileSync(file, 'utf8').split(/\r?\n/).slice(skipLines).filter((l) => l.trim() !== '');
  const header = lines[0].split(',').map((h) => h.trim());
  const rows = lines.slice(1).map((line, r) =>
    line.split(',').map((v, c) => {
      const x = Number(v);
      if (!Number.isFinite(x)) throw new Error(`${file}:${r + 2 + skipLines}: column ${header[c]} must be a number, got "${v}"`);
      return x;
    }),
  );
  return { file, header, rows };
}

function column(csv: Csv, name: string): number[] {
  const j = csv.header.indexOf(name);
  if (j < 0) throw new Error(`${csv.file}: no column ${name}`);
  return csv.rows.map((r) => r[j]);
}

function sumColumns(csv: Csv, names: string[]): number[] {
  const cols = names.map((n) => column(csv, n));
  return cols[0].map((_, k) => cols.reduce((s, c) => s + c[k], 0));
}

function sha256(file: string): string {
  return createHash('sha256').update(readFileSync(file)).digest('hex');
}

/** Options of {@link calibrateEnsemble}. */
export interface CalibrationOptions {
  /** Prior members (default 100,000). */
  members?: number;
  /** Members kept in the written set (default 4000). */
  keep?: number;
  /** Seed (default 20261204). */
  seed?: number;
  /** Constrain on 1850-2000 only and report the held-out years (default false). */
  heldOut?: boolean;
  /** Package root (default: this script's). */
  root?: string;
  /**
   * Also run the held-out check (constrain on 1850-2000, predict 2001-2023) and record it in the
   * file's provenance (default false; the script turns it on unless --no-validate).
   */
  validate?: boolean;
}

/** The periods of HadCRUT5 compared, and the other targets. */
function targetsFor(heldOut: boolean): HistoryTargets {
  return {
    baseline: [1850, 1900],
    periods: heldOut
      ? [[1901, 1930], [1931, 1960], [1961, 1980], [1981, 2000]]
      : [[1901, 1930], [1931, 1960], [1961, 1980], [1981, 2000], [2001, 2012], [2013, 2023]],
    oceanHeat: heldOut ? [1971, 2000] : [1971, 2018],
    aerosol: [2005, 2014],
    emissions: [1850, 2019],
  };
}

/** Observed HadCRUT5 relative to the 1850-1900 mean, and its per-year standard deviation. */
function hadcrut(file: string): { firstYear: number; warmingK: number[]; sigmaK: number[] } {
  const csv = readCsv(file);
  const years = csv.rows.map((r) => r[0]);
  const anomaly = csv.rows.map((r) => r[1]);
  const base = anomaly.slice(0, 51).reduce((s, v) => s + v, 0) / 51;
  if (years[0] !== 1850 || years[50] !== 1900) throw new Error(`${file}: expected annual rows from 1850`);
  return {
    firstYear: years[0],
    warmingK: anomaly.map((v) => v - base),
    // HadCRUT5's 2.5-97.5 % limits -> one standard deviation.
    sigmaK: csv.rows.map((r) => (r[3] - r[2]) / (2 * 1.959964)),
  };
}

/** Mean of an observed series over inclusive years. */
function periodMean(series: number[], firstYear: number, [a, b]: [number, number]): number {
  let s = 0;
  for (let y = a; y <= b; y++) s += series[y - firstYear];
  return s / (b - a + 1);
}

/** The bundled history as drivers: ERF per agent as every run computes it, CO2 for the carbon cycle. */
function historyDrivers(root: string): HistoryDrivers {
  const h = loadHistory(join(root, 'pathways'));
  const s = h.series;
  const forcing = forcingByAgent(h.years.length, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, { co2Formula: 'ar6' });
  if (!s.co2_ppm) throw new Error('history lacks co2_ppm');
  return { years: h.years, byAgent: { ...forcing.byAgent }, co2Ppm: s.co2_ppm };
}

/** The prior with forcing multipliers read off the AR6 5 / 50 / 95 % series. */
function buildPrior(erf: Csv, p05: Csv, p95: Csv, files: string[]): EnsemblePrior {
  const scales = FORCING_AGENTS.map((agent) => {
    const cols = AR6_COLUMNS[agent];
    if (!cols) throw new Error(`no AR6 ERF column for agent ${agent}`);
    const aerosol = agent.startsWith('aerosol');
    return {
      agent,
      range: forcingScaleRange(sumColumns(erf, cols), sumColumns(p05, cols), sumColumns(p95, cols), aerosol ? 2 : 1),
      source: `AR6 ERF 5/95 % series ${cols.join(' + ')} (${files.join(', ')}; least-squares multiplier over 1750-2019)${aerosol ? ', spread doubled (the AR6 aerosol assessment is a constraint)' : ''}`,
    };
  });
  return ensemblePrior(scales);
}

/** Rounds to 6 significant digits (the stored set). */
function round6(v: number): number {
  return Number(v.toPrecision(6));
}

function quantiles(values: ArrayLike<number>, ps: number[]): number[] {
  const sorted = Float64Array.from(values).sort();
  return ps.map((p) => {
    const h = (sorted.length - 1) * p;
    const lo = Math.floor(h);
    return sorted[lo] + (h - lo) * ((sorted[Math.min(lo + 1, sorted.length - 1)] ?? sorted[lo]) - sorted[lo]);
  });
}

const PS = [0.05, 0.17, 0.5, 0.83, 0.95];

/** The result of a calibration: the file's JSON and a few figures for the console. */
export interface CalibrationResult {
  json: Record<string, unknown>;
  report: string[];
}

/**
 * Runs the whole calibration. Pure apart from reading the data files.
 * @param options member counts, seed, held-out mode
 */
export function calibrateEnsemble(options: CalibrationOptions = {}): CalibrationResult {
  const root = options.root ?? ROOT;
  const members = options.members ?? 100_000;
  const keep = options.keep ?? 4000;
  const seed = options.seed ?? 20261204;
  const heldOut = options.heldOut ?? false;
  const files = {
    erf: recordPath(root, 'ar6-erf-1750-2019.csv'),
    p05: recordPath(root, 'ar6-erf-1750-2019-p05.csv'),
    p95: recordPath(root, 'ar6-erf-1750-2019-p95.csv'),
    ohc: recordPath(root, 'ar6-ocean-heat-content-1971-2018.csv'),
    hadcrut: recordPath(root, 'hadcrut5-global-annual.csv'),
    history: join(root, 'pathways', 'history.csv'),
  };
  const erf = readCsv(files.erf);
  const p05 = readCsv(files.p05);
  const p95 = readCsv(files.p95);
  const prior = buildPrior(erf, p05, p95, [files.p05, files.p95].map((f) => f.split('/').pop()!));
  const drivers = historyDrivers(root);
  const targets = targetsFor(heldOut);
  const obsT = hadcrut(files.hadcrut);
  const firstYear = drivers.years[0];

  // (b) ocean heat content: change between the annual means of the two years, with the errors of
  // both ends taken as independent (sqrt(31^2 + 59^2) = 67 ZJ for 1971-2018, which matches AR6's
  // very likely 285-506 ZJ; from memory).
  const ohc = readCsv(files.ohc, 1);
  const ohcYear = (y: number) => ohc.rows.find((r) => r[0] === y + 0.5)!;
  const [o0, o1] = targets.oceanHeat.map(ohcYear);
  const fullDepth = ohc.header.indexOf('Central Estimate Full-depth');
  const oceanHeat = { value: o1[fullDepth] - o0[fullDepth], sigma: Math.hypot(o1[fullDepth + 1], o0[fullDepth + 1]) };
  // (d) aerosol: the AR6 series' 2005-2014 mean, 5 / 50 / 95 %.
  const aerosolMean = (csv: Csv) => periodMean(column(csv, 'aerosol'), 1750, targets.aerosol);
  const aerosol = { p05: aerosolMean(p05), p50: aerosolMean(erf), p95: aerosolMean(p95) };
  // (c) 2390 ± 240 Gt CO2 1850-2019 (AR6 WG1 SPM A.1 footnote / D.1, likely range; from memory):
  // the ± as a 17-83 % range gives one standard deviation of 240 / 0.954.
  const emissions = { value: 2390, sigma: 240 / 0.9542 };

  const priorColumns = samplePrior(seed, members, prior);
  const responses = historyResponses(priorColumns, drivers, targets, 0, members);

  const lastObsYear = Math.max(...targets.periods.map((p) => p[1]));
  const observed = targets.periods.map((p) => periodMean(obsT.warmingK, obsT.firstYear, p));
  // The AR(1) is fitted to HadCRUT5 minus a forced response: first the run of the prior medians, then
  // the weighted mean of the members under the first weights.
  const medianColumns = Object.fromEntries(prior.quantities.map((q) => [q.key, Float64Array.of(q.range.p50)])) as MemberColumns;
  let reference = rebasedWarming(medianColumns, [0], Float64Array.of(1), drivers);
  let ar1: Ar1 = { phi: 0, sigmaK: 0 };
  let weighted: { weights: Float64Array; effectiveSize: number } = { weights: new Float64Array(0), effectiveSize: 0 };
  let obs: Observations | undefined;
  for (let pass = 0; pass < 2; pass++) {
    const residual: number[] = [];
    for (let y = 1850; y <= lastObsYear; y++) residual.push(obsT.warmingK[y - obsT.firstYear] - reference[y - firstYear]);
    ar1 = fitAr1(residual);
    obs = {
      periodWarmingK: observed,
      periodCovariance: periodMeanCovariance(obsT.firstYear, targets.periods, targets.baseline, ar1, obsT.sigmaK),
      oceanHeatZj: oceanHeat,
      aerosolWm2: aerosol,
      emissionsGtco2: emissions,
    };
    weighted = importanceWeights(logLikelihoods(responses, obs));
    if (pass === 0) {
      // Members below 1e-12 of the total weight change the mean by less than rounding.
      const active = [...weighted.weights.keys()].filter((i) => weighted.weights[i] > 1e-12);
      reference = rebasedWarming(priorColumns, active, weighted.weights, drivers);
    }
  }

  // Consistency of the error model: the weighted mean chi-square of the period means should be near
  // their number if the covariance is neither too tight nor too loose.
  const temperatureOnly = logLikelihoods(responses, { periodWarmingK: obs!.periodWarmingK, periodCovariance: obs!.periodCovariance });
  let chi2 = 0;
  for (let i = 0; i < temperatureOnly.length; i++) chi2 += weighted.weights[i] * -2 * temperatureOnly[i];

  const rng = memberGenerators(seed, 2 ** 52)();
  const picks = systematicResample(weighted.weights, keep, uniformFloat64(rng));
  const keys = memberParameterKeys(FORCING_AGENTS);
  const set = Object.fromEntries(keys.map((k) => [k, Float64Array.from(picks, (i) => round6(priorColumns[k]![i]))])) as MemberColumns;
  const distinct = new Set(picks).size;

  const metrics = Array.from({ length: keep }, (_, i) => memberMetrics(set, i));
  const metric = (f: (m: (typeof metrics)[number]) => number) => quantiles(metrics.map(f), PS).map((v) => Number(v.toFixed(3)));
  const priorSample = Math.min(members, 4000);
  const priorMetrics = Array.from({ length: priorSample }, (_, i) => memberMetrics(priorColumns, i));
  const priorMetric = (f: (m: (typeof metrics)[number]) => number) => quantiles(priorMetrics.map(f), PS).map((v) => Number(v.toFixed(3)));
  const aerosolPosterior = quantiles(Array.from(picks, (i) => responses.aerosolWm2[i]), PS).map((v) => Number(v.toFixed(3)));
  const aerosolPrior = quantiles(responses.aerosolWm2, PS).map((v) => Number(v.toFixed(3)));

  // The representative parameters: the median of each parameter over the kept members.
  const representative = Object.fromEntries(keys.map((k) => [k, round6(quantiles(set[k]!, [0.5])[0])]));

  const report: string[] = [];
  report.push(`prior members ${members}, effective sample size ${weighted.effectiveSize.toFixed(0)}, kept ${keep} (${distinct} distinct)`);
  report.push(`AR(1) of HadCRUT5 residuals: phi ${ar1.phi.toFixed(3)}, sigma ${ar1.sigmaK.toFixed(3)} K; posterior mean chi-square of the ${targets.periods.length} period means ${chi2.toFixed(2)}`);
  report.push(`ECS  prior ${priorMetric((m) => m.ecsK).join(' / ')}  posterior ${metric((m) => m.ecsK).join(' / ')} K (AR6 likely 2.5-4, very likely 2-5)`);
  report.push(`TCR  prior ${priorMetric((m) => m.tcrK).join(' / ')}  posterior ${metric((m) => m.tcrK).join(' / ')} K (AR6 likely 1.4-2.2)`);
  report.push(`TCRE prior ${priorMetric((m) => m.tcreKPer1000Pgc).join(' / ')}  posterior ${metric((m) => m.tcreKPer1000Pgc).join(' / ')} K/1000PgC (AR6 likely 1.0-2.3)`);
  report.push(`aerosol ERF 2005-2014 prior ${aerosolPrior.join(' / ')}  posterior ${aerosolPosterior.join(' / ')} W m-2 (AR6 series ${[aerosol.p05, aerosol.p50, aerosol.p95].map((v) => v.toFixed(2)).join(' / ')})`);
  const wq = (values: Float64Array) => PS.map((p) => weightedQuantile(values, weighted.weights, p).toFixed(0)).join(' / ');
  report.push(`ocean heat ${targets.oceanHeat.join('-')} observed ${oceanHeat.value.toFixed(0)} ± ${oceanHeat.sigma.toFixed(0)} ZJ, posterior ${wq(responses.oceanHeatZj)}`);
  report.push(`emissions 1850-2019 posterior ${wq(responses.emissionsGtco2)} Gt CO2 (2390 ± 240)`);
  targets.periods.forEach((p, j) => {
    const v = Array.from(picks, (i) => responses.periodWarmingK[i * targets.periods.length + j]);
    report.push(`warming ${p.join('-')} observed ${observed[j].toFixed(3)} posterior ${quantiles(v, PS).map((x) => x.toFixed(3)).join(' / ')} K`);
  });

  const heldOutChecks: { period: [number, number]; observedK: number; posteriorK: number[] }[] = [];
  if (heldOut) {
    const check: [number, number][] = [[2001, 2023], [2001, 2012], [2013, 2023], [2011, 2020]];
    const late = historyResponses(set, drivers, { ...targets, periods: check }, 0, keep);
    check.forEach((p, j) => {
      const v = Array.from({ length: keep }, (_, i) => late.periodWarmingK[i * check.length + j]);
      const q = quantiles(v, PS);
      const o = periodMean(obsT.warmingK, obsT.firstYear, p);
      heldOutChecks.push({ period: p, observedK: round6(o), posteriorK: q.map(round6) });
      report.push(`held out ${p.join('-')}: observed ${o.toFixed(3)}, posterior ${q.map((x) => x.toFixed(3)).join(' / ')} K (median error ${(q[2] - o).toFixed(3)})`);
    });
  }

  let validation: Record<string, unknown> | undefined;
  if (options.validate && !heldOut) {
    const check = calibrateEnsemble({ ...options, heldOut: true, validate: false });
    const c = check.json as { provenance: { effectiveSampleSize: number }; posterior: Record<string, unknown>; heldOut: unknown };
    validation = {
      method: 'the same prior and likelihood with HadCRUT5 periods up to 2000 and ocean heat 1971-2000 only; the posterior then predicts the held-out years',
      effectiveSampleSize: c.provenance.effectiveSampleSize,
      posterior: c.posterior,
      checks: c.heldOut,
    };
    report.push(...check.report.filter((l) => l.startsWith('held out')).map((l) => `validation: ${l}`));
  }

  const json = {
    format: CALIBRATED_SET_FORMAT,
    description:
      'Two-box, forcing-scale, carbon-cycle and CH4-lifetime parameters of ensemble members, drawn from a prior over complex-model and process-study spreads and weighted by the observed record (HadCRUT5 warming, AR6 ocean heat content, AR6 aerosol ERF, cumulative CO2 emissions). Generated by scripts/calibrate-ensemble.ts; do not edit.',
    provenance: {
      script: 'scripts/calibrate-ensemble.ts',
      seed,
      priorMembers: members,
      keptMembers: keep,
      distinctMembers: distinct,
      effectiveSampleSize: Number(weighted.effectiveSize.toFixed(1)),
      data: Object.values(files).map((f) => ({ path: relative(root, f).startsWith('..') ? f.replace('/work/shared/data/', 'shared/data/') : relative(root, f), sha256: sha256(f) })),
      prior: prior.quantities.map((q) => ({ key: q.key, p05: round6(q.range.p05), p50: round6(q.range.p50), p95: round6(q.range.p95), lower: q.lower, source: q.source })),
      likelihood: {
        warming: {
          source: 'HadCRUT5 (Morice et al. 2021) annual means rebased to 1850-1900',
          baseline: targets.baseline,
          periods: targets.periods,
          observedK: observed.map(round6),
          errorModel: 'multivariate normal on the period means: AR(1) internal variability fitted to HadCRUT5 minus the weighted-mean member (two passes), plus the dataset 95 % range / 3.92 per year, fully correlated within a period',
          ar1: { phi: round6(ar1.phi), sigmaK: round6(ar1.sigmaK) },
        },
        oceanHeat: { source: 'AR6 ocean heat content, full depth (data file)', years: targets.oceanHeat, valueZj: round6(oceanHeat.value), sigmaZj: round6(oceanHeat.sigma), model: '0.91 x (C T + C_d T_d) change (AR6 Box 7.2 ocean share, from memory)' },
        emissions: { source: 'AR6 WG1 SPM 2390 ± 240 Gt CO2 1850-2019, likely range (from memory)', years: targets.emissions, valueGtco2: emissions.value, sigmaGtco2: round6(emissions.sigma) },
        aerosol: { source: 'AR6 ERF series aerosol column, mean 2005-2014 (data files), two-piece normal', years: targets.aerosol, p05: round6(aerosol.p05), p50: round6(aerosol.p50), p95: round6(aerosol.p95) },
      },
      resampling: 'systematic resampling (Kitagawa 1996) of the weighted prior, offset from the seeded generator of member 2^52',
    },
    posterior: {
      percentiles: PS,
      ecsK: metric((m) => m.ecsK),
      tcrK: metric((m) => m.tcrK),
      tcreKPer1000Pgc: metric((m) => m.tcreKPer1000Pgc),
      aerosolWm2_2005_2014: aerosolPosterior,
    },
    prior_metrics: { ecsK: priorMetric((m) => m.ecsK), tcrK: priorMetric((m) => m.tcrK), tcreKPer1000Pgc: priorMetric((m) => m.tcreKPer1000Pgc), aerosolWm2_2005_2014: aerosolPrior },
    ...(heldOut ? { heldOut: heldOutChecks } : {}),
    ...(validation ? { heldOutValidation: validation } : {}),
    representative,
    members: {
      ...Object.fromEntries(keys.map((k) => [k, Array.from(set[k]!)])),
      // Diagnostics carried with each member (summaries report them; the kernel does not read them).
      ecs_k: metrics.map((m) => round6(m.ecsK)),
      tcr_k: metrics.map((m) => round6(m.tcrK)),
      tcre_k_per_1000pgc: metrics.map((m) => round6(m.tcreKPer1000Pgc)),
    },
  };
  return { json, report };
}

/** Weighted mean over `members` of each member's warming relative to 1850-1900, one value per history year. */
function rebasedWarming(columns: MemberColumns, members: number[], weights: Float64Array, drivers: HistoryDrivers): Float64Array {
  const n = drivers.years.length;
  const scratch = historyScratch(n);
  const mean = new Float64Array(n);
  const b0 = 1850 - drivers.years[0];
  let total = 0;
  for (const i of members) {
    memberHistoryInto(columns, i, drivers, scratch);
    let base = 0;
    for (let k = b0; k <= b0 + 50; k++) base += scratch.surface[k];
    base /= 51;
    for (let k = 0; k < n; k++) mean[k] += weights[i] * (scratch.surface[k] - base);
    total += weights[i];
  }
  for (let k = 0; k < n; k++) mean[k] /= total;
  return mean;
}

/** The file's text: indented JSON, each member parameter's array on one line. */
export function calibratedSetText(json: Record<string, unknown>): string {
  const { members, ...rest } = json as { members: Record<string, number[]> };
  const head = JSON.stringify(rest, null, 1).replace(/\n}$/, '');
  const rows = Object.entries(members).map(([k, v]) => ` ${JSON.stringify(k)}: [${v.join(',')}]`);
  return `${head},\n "members": {\n${rows.join(',\n')}\n }\n}\n`;
}

function main(argv: string[]): void {
  const value = (name: string) => {
    const i = argv.indexOf(name);
    return i >= 0 ? argv[i + 1] : undefined;
  };
  const num = (name: string, min: number, max: number) => {
    const text = value(name);
    if (text === undefined) return undefined;
    const v = Number(text);
    if (!(Number.isInteger(v) && v >= min && v <= max)) throw new Error(`${name} must be a whole number from ${min} to ${max}, got ${text}`);
    return v;
  };
  const heldOut = argv.includes('--validate');
  const options = { members: num('--members', 100, 10_000_000), keep: num('--keep', 1, 1_000_000), seed: num('--seed', 0, 2 ** 32 - 1), heldOut, validate: !argv.includes('--no-validate') };
  const { json, report } = calibrateEnsemble(options);
  for (const line of report) console.log(line);
  if (!heldOut) {
    const out = resolve(value('--out') ?? join(ROOT, 'pathways', 'calibrated-members.json'));
    writeFileSync(out, calibratedSetText(json));
    console.log(`wrote ${out}`);
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === resolve(process.argv[1])) main(process.argv.slice(2));
