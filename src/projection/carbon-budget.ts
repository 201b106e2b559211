import type { ClimateParams } from '../climate/params.js';
import { energyBalance } from '../climate/energy-balance.js';
import { gtco2ToGtc } from '../carbon/units.js';
import { ConfigError } from '../errors.js';
import { co2Forcing } from '../forcing/co2.js';
import type { ForcingAgent } from '../forcing/agents.js';
import { forcingScaleKey, sliceMemberParameters, type MemberParameters, type MemberSource } from '../ensemble/member-parameters.js';
import { ar6Members } from '../ensemble/ar6-members.js';
import { BOOTSTRAP_STREAMS, bootstrapUniforms } from '../ensemble/member-generators.js';
import { AR6_SAMPLING } from '../ensemble/sampling.js';
import { runMembers, type MemberTask } from '../ensemble/run-members.js';
import { attributeWarming } from '../metrics/attribution.js';
import { rebase } from '../metrics/warming-levels.js';
import { quantileSorted } from '../numerics/quantiles.js';
import {
  BUDGET_TOLERANCE_GTCO2,
  budgetSamplingSpread,
  remainingBudget,
  straightLineFamily,
  stretchedShapeFamily,
  type BudgetMember,
  type BudgetRow,
  type BudgetSpread,
  type Co2PathFamily,
  type RemainingBudget,
} from '../metrics/remaining-budget.js';
import type { Pathway } from '../pathway.js';
import { ensembleInput } from './ensemble-input.js';
import { projectPathway } from './project-pathway.js';

/** Options of {@link carbonBudget}. */
export interface CarbonBudgetOptions {
  /** Warming limits, K above 1850-1900. */
  limits: number[];
  /** Chances of keeping peak warming at or below each limit, in (0, 1). */
  chances: number[];
  /** First calendar year counted (default: the first year after the history). */
  fromYear?: number;
  /** Members and seed of the ensemble (the seed also drives the bootstrap of the sampling spread). */
  members: number;
  seed: number;
  /** Where the members come from (default: AR6-range sampling). */
  source?: MemberSource;
  /**
   * Whether the members are a random draw, so that the budgets move with the seed (default true);
   * false for a whole fixed set taken in order (calibratedSetInOrder). Only the notes differ.
   */
  resampled?: boolean;
  /** Central parameters: the CH4 and N2O concentrations all members share, and the current CO2 rate. */
  params: ClimateParams;
  /** The central run's multiplier per forcing agent (the calibrated set's medians), as `run` uses. */
  forcingScale?: Partial<Record<ForcingAgent, number>>;
  /** Last year run (default: 250 years after fromYear, so a late net zero still shows its peak). */
  endYear?: number;
  /** Called as the members' searches go (members started so far, members), for a progress bar. */
  onProgress?: (done: number, total: number) => void;
  /**
   * The user's own net CO2 shape (Gt CO2 per calendar year from fromYear on), stretched in time
   * instead of the straight-line decline (`warmcast budget --shape`).
   */
  shape?: Float64Array;
}

/** What a budget rests on, for notes and provenance. */
export interface BudgetAssumptions {
  /** The members' warming over the ten years before fromYear, K: median, 5 % and 95 %. */
  historicalWarmingK: [number, number, number];
  /** Years of that mean. */
  historicalPeriod: [number, number];
  /** Net CO2 rate the straight-line decline starts from (diagnosed at the end of the history), Gt CO2 yr-1. */
  currentRateGtco2: number;
  /**
   * What the pathway of one asked budget shows: the first possible one in the order asked (a found
   * budget before a lower bound); absent when no asked budget is possible.
   */
  reference?: BudgetReference;
}

/** The non-CO2 warming and zero-emissions commitment along the pathway that spends one budget. */
export interface BudgetReference {
  /** The budget whose pathway this is: its limit, K, and chance, in (0, 1). */
  limitK: number;
  chance: number;
  /** Its net-zero year (the table's). */
  netZeroYear: number;
  /** Central run along that pathway: warming from every agent but CO2 in the net-zero year, K. */
  nonCo2WarmingAtNetZeroK: number;
  /**
   * Members' CO2-only warming change over the 50 years after that net zero with net CO2 held at
   * zero from then on (a shape's later net-negative emissions left out), K: median, 5 % and 95 %.
   */
  zeroEmissionsCommitmentK: [number, number, number];
}

/** Result of {@link carbonBudget}. */
export interface CarbonBudget extends RemainingBudget {
  fromYear: number;
  assumptions: BudgetAssumptions;
  /** How far each budget would move with another draw of as many members (bootstrap), one per row. */
  spread: BudgetSpread[];
  notes: string[];
}

/** Resamples of the bootstrap that estimates each budget's sampling spread: 200 give its standard deviation to about 5 % (1 / sqrt(2 x 199)). */
const SPREAD_REPLICATES = 200;

/**
 * Years of the non-CO2 path a budget needs after fromYear: at today's rate of about 40 Gt CO2 a
 * year, a straight-line decline over 50 years spends about 1000 Gt CO2, so the budgets of the usual
 * limits reach net zero within the path (common practice, no source). Past the path's end its
 * last values are held.
 */
const MIN_NON_CO2_YEARS = 50;

/**
 * A chance as the per cent a user would write: 0.5 -> "50 %", 0.667 -> "66.7 %" (never rounded
 * to a whole per cent, so two chances never print alike).
 * @example chanceText(0.667) // '66.7 %'
 */
export function chanceText(chance: number): string {
  return `${Number((chance * 100).toPrecision(12))} %`;
}

/** A pathway extended to `lastYear` by holding each series' last value. */
function extendPathway(p: Pathway, lastYear: number): Pathway {
  const n0 = p.years.length;
  const n = lastYear - p.years[0] + 1;
  if (n <= n0) return p;
  const years = Float64Array.from({ length: n }, (_, i) => p.years[0] + i);
  const series: Pathway['series'] = {};
  for (const [k, v] of Object.entries(p.series) as [keyof Pathway['series'], Float64Array][]) {
    const w = new Float64Array(n);
    w.set(v);
    w.fill(v[n0 - 1], n0);
    series[k] = w;
  }
  return { ...p, years, series };
}

/**
 * Remaining CO2 budgets for an ensemble (see remainingBudget in metrics/): the non-CO2 pathway
 * (spliced onto the history, held at its last values to the end of the run) fixes everything but
 * net CO2 from the end of the history on; net CO2 is diagnosed from the record to the end of the
 * history, held at the current rate until fromYear, and from fromYear follows the budget family.
 * Each member runs its own carbon cycle and two-box model (runMembers); its CH4 and N2O
 * concentrations come from one central run, as in an emission-driven ensemble. The assumptions
 * (non-CO2 warming at net zero, zero-emissions commitment) are read along the pathway of the first
 * possible budget asked for, so their net-zero year is that budget's.
 *
 * @param nonCo2 the non-CO2 pathway, spliced onto the history (any CO2 it gives is replaced)
 * @param options limits, chances, members, seed, central parameters, and an optional shape
 * @returns per limit and chance the budget and its net-zero year, per member budgets, assumptions,
 *   each budget's sampling spread
 * @throws ConfigError when the pathway has no history to continue from, or fromYear lies before
 *   the history's end or leaves fewer than 50 years of the non-CO2 path after it
 */
export function carbonBudget(nonCo2: Pathway, options: CarbonBudgetOptions): CarbonBudget {
  const historyEnd = nonCo2.provenance.historyLastYear;
  if (historyEnd === undefined) throw new ConfigError('the non-CO2 pathway must start after the bundled history, to be spliced onto it', 'non-co2');
  const fromYear = options.fromYear ?? historyEnd + 1;
  if (fromYear <= historyEnd) throw new ConfigError(`--from must be after the history's last year, ${historyEnd}, got ${fromYear}`, 'from');
  const pathLast = nonCo2.years[nonCo2.years.length - 1];
  const pathName = nonCo2.provenance.source.startsWith('bundled:') ? `the bundled ${nonCo2.provenance.source.slice('bundled:'.length)} path` : nonCo2.provenance.source;
  if (pathLast - fromYear + 1 < MIN_NON_CO2_YEARS) {
    throw new ConfigError(
      `--from ${fromYear}: the non-CO2 path (${pathName}) covers ${nonCo2.provenance.spliceYear ?? nonCo2.years[0]}-${pathLast}, and a budget needs it to run at least ${MIN_NON_CO2_YEARS} years after --from, ` +
        `to ${fromYear + MIN_NON_CO2_YEARS - 1}: give --from ${pathLast - MIN_NON_CO2_YEARS + 1} or earlier, or a --non-co2 path that runs longer`,
      'from',
    );
  }
  const endYear = options.endYear ?? fromYear + 250;
  const pathway = extendPathway(nonCo2, endYear);
  const n = pathway.years.length;
  const y0 = pathway.years[0];
  const joinIndex = historyEnd + 1 - y0;
  const fromIndex = fromYear - y0;

  // CO2: the record's concentrations to the end of the history, emissions after it.
  const co2Ppm = Float64Array.from(pathway.series.co2_ppm ?? []);
  if (co2Ppm.length !== n) throw new ConfigError('the history must give co2_ppm', 'non-co2');
  co2Ppm.fill(NaN, joinIndex);
  const placeholder = new Float64Array(n).fill(NaN);
  placeholder.fill(0, joinIndex);
  const spliced: Pathway = { ...pathway, series: { ...pathway.series, co2_ppm: co2Ppm, co2_gtco2: placeholder } };
  const central = projectPathway(spliced, { params: options.params, forcingScale: options.forcingScale });
  const rate = central.columns.co2_gtco2[joinIndex - 1];
  const notes: string[] = [];
  if (!(rate > 0)) throw new ConfigError(`the net CO2 rate diagnosed at the end of the history is ${rate.toFixed(1)} Gt CO2 per year: a budget needs a positive rate to fall from`, 'rate');
  if (pathLast < endYear) notes.push(`the non-CO2 path (${pathName}) ends in ${pathLast}: its ${pathLast} values are held to ${endYear}, the end of the budget runs`);

  const { input, notes: inputNotes } = ensembleInput(spliced, options.params);
  notes.push(...inputNotes.filter((t) => !t.startsWith('emission-driven pathway')));
  const task: MemberTask = { co2Formula: options.params.co2Formula, forcing: input.forcing.byAgent, carbon: input.carbon };
  if (!task.carbon) throw new ConfigError('internal: the budget pathway is not emission-driven', 'non-co2');
  const carbon = task.carbon;
  const source = options.source ?? ar6Members(AR6_SAMPLING, options.params.co2Formula, true);
  const { parameters } = source.draw(options.seed, 0, options.members);

  const family: Co2PathFamily = options.shape
    ? stretchedShapeFamily(options.shape, fromYear, [0.05, maxStretch(options.shape, endYear - fromYear - 70)])
    : straightLineFamily(rate, fromYear, endYear - fromYear - 70);
  const baseline: [number, number] = [1850, 1900];
  const members: BudgetMember[] = [];
  // Each member's parameters as a block of one, sliced once: the search runs every member a dozen times.
  const blocks = Array.from({ length: parameters.count }, (_, r) => sliceMemberParameters(parameters, r, r + 1));
  const runOne = (r: number, future: Float64Array, co2Out?: Float64Array) => {
    const emission = new Float64Array(n).fill(NaN);
    for (let k = joinIndex; k < n; k++) emission[k] = gtco2ToGtc(k < fromIndex ? rate : future[k - fromIndex]);
    const w = runMembers({ ...task, carbon: { ...carbon, co2: { ...carbon.co2, emissionGtc: emission } } }, blocks[r], undefined, co2Out);
    return rebase(pathway.years, w, baseline, `member ${r}`);
  };
  const progress = options.onProgress;
  for (let r = 0; r < parameters.count; r++) {
    members.push({
      warming: (future) => {
        progress?.(r + 1, parameters.count);
        return runOne(r, future);
      },
    });
  }
  const result = remainingBudget(members, family, { years: pathway.years, fromYear, limits: options.limits, chances: options.chances });

  // The pathway of the first possible budget asked for (a found one before a lower bound), with net
  // CO2 held at zero after its net zero, so the commitment is that of zero emissions even for a shape
  // that goes net negative. Warming to date does not depend on the future, so with no possible
  // budget it is read along an immediate stop.
  const refRow = result.rows.find((r) => r.met && !r.atLeast) ?? result.rows.find((r) => r.met);
  const futureRef = refRow ? zeroAfterNetZero(family.path(refRow.x, n - fromIndex), refRow.netZeroYear - fromYear) : family.path(family.min, n - fromIndex);
  const zec: number[] = [];
  const hist: number[] = [];
  const co2 = new Float64Array(n);
  for (let r = 0; r < parameters.count; r++) {
    const w = runOne(r, futureRef, co2);
    hist.push(mean(w, fromIndex - 10, fromIndex - 1));
    if (refRow) zec.push(co2OnlyCommitment(parameters, r, co2, carbon.n2oPpb, options.params, refRow.netZeroYear - y0));
  }
  let reference: BudgetReference | undefined;
  if (refRow) {
    const refSeries = new Float64Array(n).fill(NaN);
    for (let k = joinIndex; k < n; k++) refSeries[k] = k < fromIndex ? rate : futureRef[k - fromIndex];
    const refRun = projectPathway({ ...spliced, series: { ...spliced.series, co2_gtco2: refSeries } }, { params: options.params, forcingScale: options.forcingScale });
    const forcing = Object.fromEntries(Object.entries(refRun.columns).filter(([k]) => /^forcing_.*_wm2$/.test(k) && k !== 'forcing_wm2' && k !== 'forcing_aerosol_wm2').map(([k, v]) => [k.slice(8, -4), v]));
    const parts = attributeWarming(options.params, refRun.years, forcing, baseline);
    const kz = refRow.netZeroYear - y0;
    reference = {
      limitK: refRow.limitK,
      chance: refRow.chance,
      netZeroYear: refRow.netZeroYear,
      nonCo2WarmingAtNetZeroK: refRun.columns.warming_k[kz] - parts.warmingK.co2[kz],
      zeroEmissionsCommitmentK: percentiles3(zec),
    };
  }

  const assumptions: BudgetAssumptions = {
    historicalWarmingK: percentiles3(hist),
    historicalPeriod: [fromYear - 10, fromYear - 1],
    currentRateGtco2: rate,
    reference,
  };
  const spread = budgetSamplingSpread(result, family, SPREAD_REPLICATES, bootstrapUniforms(options.seed, BOOTSTRAP_STREAMS.budgetSpread));
  notes.push(...budgetNotes(result.rows, spread, assumptions, fromYear, historyEnd, options, source));
  return { ...result, fromYear, assumptions, spread, notes };
}

/**
 * A budget pathway with net CO2 held at zero after its net zero: annual totals from fromYear, the
 * net-zero year's total kept if positive and every later year zero.
 */
function zeroAfterNetZero(future: Float64Array, netZeroIndex: number): Float64Array {
  const out = Float64Array.from(future);
  if (netZeroIndex >= 0 && netZeroIndex < out.length) out[netZeroIndex] = Math.max(0, out[netZeroIndex]);
  out.fill(0, Math.max(0, netZeroIndex + 1));
  return out;
}

/** Largest stretch of a shape whose net zero still leaves `room` years in the run. */
function maxStretch(shape: Float64Array, room: number): number {
  let zero = shape.findIndex((v) => v <= 0);
  if (zero < 1) zero = 1;
  return Math.max(0.1, room / zero);
}

function mean(v: ArrayLike<number>, from: number, to: number): number {
  let s = 0;
  for (let k = from; k <= to; k++) s += v[k];
  return s / (to - from + 1);
}

/** Median, 5 % and 95 % of values (quantileSorted, definition 7). */
function percentiles3(values: number[]): [number, number, number] {
  const s = [...values].sort((a, b) => a - b);
  return [quantileSorted(s, 0.5), quantileSorted(s, 0.05), quantileSorted(s, 0.95)];
}

/**
 * Member r's CO2-only warming change over the 50 years after index `zero`: the two-box model run on
 * its CO2 ERF alone (its own CO2, scaled by its scale_co2), the zero-emissions commitment of CO2.
 */
function co2OnlyCommitment(
  parameters: MemberParameters,
  r: number,
  co2Ppm: Float64Array,
  n2oPpb: Float64Array,
  params: ClimateParams,
  zero: number,
): number {
  const v = parameters.values;
  const scale = v[forcingScaleKey('co2')]?.[r] ?? 1;
  const f = co2Ppm.map((c, k) => scale * co2Forcing(params.co2Formula, c, n2oPpb[k]));
  const t = energyBalance(
    { feedbackWm2K: v.feedback_wm2k[r], upperHeatCapacity: v.upper_heat_capacity[r], deepHeatCapacity: v.deep_heat_capacity[r], exchangeWm2K: v.exchange_wm2k[r], deepEfficacy: v.deep_efficacy[r] },
    f,
  ).surfaceK;
  const later = Math.min(t.length - 1, zero + 50);
  return t[later] - t[zero];
}

/** The notes a budget carries: method, sampling spread, assumptions, and what could not be met. */
function budgetNotes(
  rows: BudgetRow[],
  spread: BudgetSpread[],
  a: BudgetAssumptions,
  fromYear: number,
  historyEnd: number,
  options: CarbonBudgetOptions,
  source: MemberSource,
): string[] {
  const k = (x: number) => x.toFixed(2).replace(/^-(0\.00)$/, '$1');
  const resampled = options.resampled ?? true;
  const notes = [
    `remaining CO2 budget: per member, the largest cumulative net CO2 from 1 January ${fromYear} for which its peak warming (highest 20-year mean, the IPCC AR6 convention) stays at or below the limit, along ` +
      (options.shape
        ? "the given net CO2 shape stretched or compressed in time; the cumulative CO2 is the shape's net CO2 up to its net zero: net-negative emissions after it are not subtracted, though the members' runs, and so their peaks, include them"
        : `net CO2 falling in a straight line from the current rate, ${a.currentRateGtco2.toFixed(1)} Gt CO2 a year (diagnosed from the record at the end of ${historyEnd}), to net zero, then zero`) +
      `; each member's budget found to within ${BUDGET_TOLERANCE_GTCO2} Gt CO2; the budget at a chance p is the (1 - p) quantile of the members' budgets (${options.members} members${resampled ? `, seed ${options.seed}` : ''})`,
    `members: ${source.notes.join(' ')}`.trim(),
    samplingNote(spread, options.members, options.seed, resampled),
    `historical warming to date: ${k(a.historicalWarmingK[0])} K [${k(a.historicalWarmingK[1])} to ${k(a.historicalWarmingK[2])}] (members' ${a.historicalPeriod[0]}-${a.historicalPeriod[1]} mean above 1850-1900; median [5-95 %])`,
  ];
  const ref = a.reference;
  if (ref) {
    const along = `the pathway of the ${ref.limitK} K, ${chanceText(ref.chance)} budget`;
    notes.push(
      `non-CO2 warming at net zero: ${k(ref.nonCo2WarmingAtNetZeroK)} K in ${ref.netZeroYear} (every agent but CO2), in the central run along ${along}; the non-CO2 path is fixed, so a weaker non-CO2 mitigation shrinks every budget`,
      `zero-emissions commitment: CO2-only warming changes by ${k(ref.zeroEmissionsCommitmentK[0])} K [${k(ref.zeroEmissionsCommitmentK[1])} to ${k(ref.zeroEmissionsCommitmentK[2])}] across the members in the 50 years after net zero in ${ref.netZeroYear}, along ${along} with net CO2 held at zero from then on; ` +
        (options.shape
          ? "the shape's own net CO2 after its net zero (net-negative emissions, if any) is left out of this figure but is part of the budget runs"
          : "it is part of every member's peak"),
    );
  } else {
    notes.push('non-CO2 warming at net zero and zero-emissions commitment: not given, as no budget asked for is possible, so there is no budget pathway to read them along');
  }
  if (fromYear > historyEnd + 1) notes.push(`net CO2 is held at the current rate from ${historyEnd + 1} to ${fromYear - 1}, before the budget starts`);
  for (const r of rows) {
    if (!r.met) notes.push(`${r.limitK} K with ${chanceText(r.chance)} chance cannot be met: more than ${chanceText(1 - r.chance)} of the members peak above it even if net CO2 fell to zero at once in ${fromYear}`);
    else if (r.atLeast) notes.push(`${r.limitK} K with ${chanceText(r.chance)}: at least ${r.budgetGtco2.toFixed(0)} Gt CO2 (enough members stay below it with the latest net zero searched)`);
  }
  return notes;
}

/** How far the budgets would move with another draw of the members, one note. */
function samplingNote(spread: BudgetSpread[], members: number, seed: number, resampled: boolean): string {
  const per = spread
    .map((s) => {
      const where = `${s.limitK} K ${chanceText(s.chance)}`;
      if (s.notPossibleShare >= 1) return `${where} not possible in every resample`;
      const sd = `${where} ±${s.sdGtco2.toFixed(0)} Gt CO2`;
      return s.notPossibleShare > 0 ? `${sd} and not possible in ${Math.round(100 * s.notPossibleShare)} % of resamples` : sd;
    })
    .join('; ');
  const how = `sampling spread (1 standard deviation of each budget over ${SPREAD_REPLICATES} bootstrap resamples of the members' budgets)`;
  return resampled
    ? `${how}: these ${members} members are a random draw (seed ${seed}), so each budget moves with the seed, by about this from one draw to another: ${per}`
    : `${how}: the ${members} members are a whole set taken in order, so the budgets do not depend on the seed; the set is itself a finite sample, and its budgets carry a sampling error of about: ${per}`;
}
