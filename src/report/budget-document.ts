import type { CarbonBudget } from '../projection/carbon-budget.js';
import type { OutputDocument } from './output-document.js';
import type { OutputTable } from './output-table.js';
import { shortCaution, standardCautions } from './standard-cautions.js';

/** What the chances of a budget cover, for its cautions. */
export const BUDGET_UNCERTAINTY =
  'The chances come from the spread of the ensemble members\' climate response and carbon cycle only: the non-CO2 path is one assumed path, ' +
  'the CO2 pathway family one shape, and the model structure one model. Budgets are very sensitive to the non-CO2 assumption and to warming to date; ' +
  'compare with the remaining carbon budgets the IPCC assesses before quoting them.';

/**
 * The output document of `warmcast budget`: the table `limit_k, chance, budget_gtco2, net_zero_year`
 * (a budget that cannot be met has no value there and says so in `status`), and for the terminal and
 * human formats the budgets by limit and chance and the net-zero years.
 *
 * @param r the budgets
 * @param options notes, whether the family is a stretched shape
 */
export function budgetDocument(r: CarbonBudget, options: { notes: string[]; shape: boolean; members: number }): OutputDocument {
  const rows = r.rows;
  const status = rows.map((x) => (!x.met ? 'not possible' : x.atLeast ? 'at least' : 'found'));
  const data: OutputTable = {
    name: 'budgets',
    columns: [
      { key: 'limit_k', values: Float64Array.from(rows, (x) => x.limitK), digits: 2 },
      { key: 'chance', values: Float64Array.from(rows, (x) => x.chance), digits: 2 },
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
  const pct = (c: number) => `${Math.round(c * 100)} %`;
  const grid = (what: 'budget' | 'year', caption: string): OutputTable => ({
    name: what === 'budget' ? 'budget_gtco2' : 'net_zero_year',
    caption,
    columns: [
      { key: 'peak warming at or below', values: limits.map((l) => `${l} K`) },
      ...chances.map((c) => ({ key: pct(c), values: limits.map((l) => cell(l, c, what)) })),
    ],
  });
  const combined: OutputTable = {
    name: 'budget_and_net_zero',
    caption: `Remaining CO2 budget from 1 January ${r.fromYear}, Gt CO2 (net-zero year ${options.shape ? 'of the stretched shape' : 'of a straight-line decline from today\'s rate'}), by chance of keeping peak warming at or below the limit`,
    columns: [
      { key: 'peak warming at or below', values: limits.map((l) => `${l} K`) },
      ...chances.map((c) => ({
        key: pct(c),
        values: limits.map((l) => (cell(l, c, 'budget') === 'not possible' ? 'not possible' : `${cell(l, c, 'budget')} (${cell(l, c, 'year').replace('>= ', '')})`)),
      })),
    ],
  };
  const a = r.assumptions;
  const budgets = grid('budget', `Remaining CO2 budget from 1 January ${r.fromYear}, Gt CO2, by chance of keeping peak warming at or below the limit`);
  const years = grid('year', options.shape ? 'Latest net-zero year of the given net CO2 shape that keeps within it' : "Net-zero year of a straight-line decline from today's rate that spends it");
  return {
    command: 'budget',
    title: `Remaining CO2 budgets from 1 January ${r.fromYear}`,
    subtitle:
      `${options.members} members; warming to date ${a.historicalWarmingK[0].toFixed(2)} K (${a.historicalPeriod[0]}-${a.historicalPeriod[1]} mean), ` +
      `net CO2 now ${a.currentRateGtco2.toFixed(1)} Gt CO2/yr, non-CO2 warming at net zero ${a.nonCo2WarmingAtNetZeroK.toFixed(2)} K, ` +
      `zero-emissions commitment ${a.zeroEmissionsCommitmentK[0].toFixed(2)} K`,
    baseline: [1850, 1900],
    headline: [],
    data,
    tables: [combined, budgets, years],
    charts: [],
    notes: options.notes,
    terminalNotes: rows.some((x) => !x.met) ? ['"not possible": more members than the chance allows peak above the limit even if net CO2 stopped at once'] : [],
    cautions: standardCautions(BUDGET_UNCERTAINTY),
    shortCaution: shortCaution('budget', true),
  };
}
