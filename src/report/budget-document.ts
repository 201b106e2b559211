import { chanceText, type CarbonBudget } from '../projection/carbon-budget.js';
import type { OutputDocument } from './output-document.js';
import type { OutputTable } from './output-table.js';
import { kelvin } from './format-numbers.js';
import { CALIBRATED_SET_CAUTION, shortCaution, standardCautions } from './standard-cautions.js';

/** What the chances of a budget cover, for its cautions. */
export const BUDGET_UNCERTAINTY =
  'The chances come from the spread of the ensemble members\' climate response and carbon cycle only: the non-CO2 path is one assumed path, ' +
  'the CO2 pathway family one shape, and the model structure one model. Budgets are very sensitive to the non-CO2 assumption and to warming to date; ' +
  'compare with the remaining carbon budgets the IPCC assesses before quoting them. ' +
  CALIBRATED_SET_CAUTION;

/**
 * The output document of `warmcast budget`: the table `limit_k, chance, budget_gtco2, net_zero_year`
 * (a budget that cannot be met has no value there and says so in `status`), and for the terminal and
 * human formats the budgets by limit and chance and the net-zero years.
 *
 * @param r the budgets
 * @param options notes, whether the family is a stretched shape, the members, and how they were
 *   taken: the whole calibrated set in order, a random subsample of it, or draws from the prior (for
 *   the last two the terminal says how far the budgets move with the seed)
 */
export function budgetDocument(r: CarbonBudget, options: { notes: string[]; shape: boolean; members: number; drawn: 'whole set' | 'subsample' | 'prior' }): OutputDocument {
  const rows = r.rows;
  const status = rows.map((x) => (!x.met ? 'not possible' : x.atLeast ? 'at least' : 'found'));
  const data: OutputTable = {
    name: 'budgets',
    columns: [
      { key: 'limit_k', values: Float64Array.from(rows, (x) => x.limitK), digits: 2 },
      { key: 'chance', values: Float64Array.from(rows, (x) => x.chance), digits: chanceDigits(rows.map((x) => x.chance)) },
      { key: 'budget_gtco2', values: Float64Array.from(rows, (x) => (x.met ? Math.round(x.budgetGtco2) : NaN)), digits: 0 },
      { key: 'net_zero_year', values: Float64Array.from(rows, (x) => x.netZeroYear), digits: 0 },
      { key: 'status', values: status },
    ],
  };
  const limits = [...new Set(rows.map((x) => x.limitK))];
  const chances = [...new Set(rows.map((x) => x.chance))];
  const cell = (limit: number, chance: number, what: 'budget' | 'year') => {
    const row = rows.find((x) => x.limitK === limit && x.chance === chance)!;
    if (!row.met) return 'not possible';
    const v = what === 'year' ? String(row.netZeroYear) : String(Math.round(row.budgetGtco2));
    return row.atLeast ? `>= ${v}` : v;
  };
  const grid = (what: 'budget' | 'year', caption: string): OutputTable => ({
    name: what === 'budget' ? 'budget_gtco2' : 'net_zero_year',
    caption,
    columns: [
      { key: 'peak warming at or below', values: limits.map((l) => `${l} K`) },
      ...chances.map((c) => ({ key: chanceText(c), values: limits.map((l) => cell(l, c, what)) })),
    ],
  });
  const combined: OutputTable = {
    name: 'budget_and_net_zero',
    caption: `Remaining CO2 budget from 1 January ${r.fromYear}, Gt CO2 (net-zero year ${options.shape ? 'of the stretched shape' : 'of a straight-line decline from today\'s rate'}), by chance of keeping peak warming at or below the limit`,
    columns: [
      { key: 'peak warming at or below', values: limits.map((l) => `${l} K`) },
      ...chances.map((c) => ({
        key: chanceText(c),
        values: limits.map((l) => (cell(l, c, 'budget') === 'not possible' ? 'not possible' : `${cell(l, c, 'budget')} (${cell(l, c, 'year').replace('>= ', '')})`)),
      })),
    ],
    terminalOverflow: 'wrap',
  };
  const a = r.assumptions;
  const budgets = grid('budget', `Remaining CO2 budget from 1 January ${r.fromYear}, Gt CO2, by chance of keeping peak warming at or below the limit`);
  const years = grid('year', options.shape ? 'Latest net-zero year of the given net CO2 shape that keeps within it' : "Net-zero year of a straight-line decline from today's rate that spends it");
  return {
    command: 'budget',
    title: `Remaining CO2 budgets from 1 January ${r.fromYear}`,
    subtitle:
      `${options.members} members; warming to date ${kelvin(a.historicalWarmingK[0])} K (${a.historicalPeriod[0]}-${a.historicalPeriod[1]} mean), ` +
      `net CO2 now ${a.currentRateGtco2.toFixed(1)} Gt CO2/yr; ` +
      (a.reference
        ? `along the ${a.reference.limitK} K, ${chanceText(a.reference.chance)} pathway (net zero ${a.reference.netZeroYear}): non-CO2 warming at net zero ` +
          `${kelvin(a.reference.nonCo2WarmingAtNetZeroK)} K, zero-emissions commitment ${kelvin(a.reference.zeroEmissionsCommitmentK[0])} K`
        : 'no budget asked for is possible, so no net-zero assumptions to show'),
    baseline: [1850, 1900],
    headline: [],
    data,
    tables: [combined, budgets, years],
    charts: [],
    notes: options.notes,
    terminalNotes: [
      ...(rows.some((x) => !x.met) ? ['"not possible": more members than the chance allows peak above the limit even if net CO2 stopped at once'] : []),
      ...(options.drawn !== 'whole set' ? seedNote(r, options.members, options.drawn === 'subsample') : []),
    ],
    cautions: standardCautions(BUDGET_UNCERTAINTY),
    shortCaution: shortCaution('budget', true),
  };
}

/** Decimals the chance column needs: 2 for whole per cents (0.67), up to 4 (0.6675). */
function chanceDigits(chances: number[]): number {
  for (let d = 2; d < 4; d++) if (chances.every((c) => Math.abs(c * 10 ** d - Math.round(c * 10 ** d)) < 1e-9)) return d;
  return 4;
}

/** For a random draw of members: the largest spread the bootstrap found, in one line (none when no budget is possible in any resample). */
function seedNote(r: CarbonBudget, members: number, subsample: boolean): string[] {
  const sds = r.spread.filter((s) => Number.isFinite(s.sdGtco2)).map((s) => s.sdGtco2);
  if (sds.length === 0) return [];
  const flips = r.spread.some((s) => s.notPossibleShare > 0 && s.notPossibleShare < 1) ? ', and some may flip between a number and "not possible"' : '';
  const hint = subsample ? '; leave out --members for budgets that do not move with the seed' : '';
  return [
    `${members} members drawn at random: the budgets move with --seed (a standard deviation of up to about ${Math.max(...sds).toFixed(0)} Gt CO2 from one draw to another${flips}); --notes gives each${hint}`,
  ];
}
