import { EMITTED_SPECIES_LABELS, type EmittedSpecies } from '../forcing/emitted-species.js';
import type { Attribution } from '../metrics/attribution.js';
import type { AttributionRanges, PartRange } from '../projection/attribute-members.js';
import type { AttributedProjection } from '../projection/attribute-pathway.js';
import type { OutputDocument } from './output-document.js';
import type { OutputColumn, OutputTable } from './output-table.js';
import { CALIBRATED_SET_CAUTION, shortCaution, standardCautions } from './standard-cautions.js';
import type { ChartLine } from './terminal-chart.js';

/** What an attribution document shows besides the result. */
export interface AttributionDocumentOptions {
  /** Notes on how the inputs were read and run. */
  notes: string[];
  /** Ranges across members (`--members`). */
  ranges?: AttributionRanges;
  /** First and last year of the tables, charts and files (`--from`, `--to`). */
  from?: number;
  to?: number;
  /** Years of the milestone tables' columns (`--years`, `--every`); default the 2010-2019 mean, 2030, 2050 and 2100. */
  columns?: readonly number[];
}

/** Mean of a series over inclusive years (years consecutive from `first`). */
function periodMean(first: number, values: ArrayLike<number>, from: number, to: number): number {
  let s = 0;
  for (let y = from; y <= to; y++) s += values[y - first];
  return s / (to - from + 1);
}

/**
 * The output document of `warmcast attribute`: the yearly `warming_<agent>_k` table (with
 * `_p05/_p50/_p95` across members when there are ranges) and, for emission pathways, the
 * `warming_from_<species>_k` columns of the split by emitted species; a table of agents by period
 * (2010-2019 mean, 2030, 2050, 2100 where the run has them, or the years of `columns`) and one of
 * species; and a chart of the main agents (and one of the main species).
 */
export function attributionDocument(r: AttributedProjection, options: AttributionDocumentOptions): OutputDocument {
  const { attribution: a, projection: p } = r;
  const { ranges } = options;
  const first = p.years[0];
  const last = p.years[p.years.length - 1];
  const lo = Math.max(first, options.from ?? first);
  const hi = Math.min(last, options.to ?? last);
  const i0 = lo - first;
  const i1 = hi - first + 1;
  const cut = (v: Float64Array) => v.slice(i0, i1);

  const species = r.bySpecies;
  const data: OutputColumn[] = [
    { key: 'year', values: cut(p.years) },
    { key: 'warming_k', values: cut(p.columns.warming_k) },
    ...a.agents.map((x) => ({ key: `warming_${x}_k`, values: cut(a.warmingK[x]) })),
    ...(species ? species.agents.map((x) => ({ key: `warming_from_${x}_k`, values: cut(species.warmingK[x]) })) : []),
  ];
  if (ranges) for (const q of ['p05', 'p50', 'p95'] as const) data.push({ key: `warming_${q}_k`, values: cut(ranges.total[q]) });
  if (ranges) for (const x of a.agents) for (const q of ['p05', 'p50', 'p95'] as const) data.push({ key: `warming_${x}_${q}_k`, values: cut(ranges.byAgent[x][q]) });
  if (ranges?.bySpecies && species) for (const x of species.agents) for (const q of ['p05', 'p50', 'p95'] as const) data.push({ key: `warming_from_${x}_${q}_k`, values: cut(ranges.bySpecies[x][q]) });

  const periods: { label: string; from: number; to: number }[] = [];
  if (!options.columns && lo <= 2010 && hi >= 2019) periods.push({ label: '2010-2019', from: 2010, to: 2019 });
  for (const y of options.columns ?? [2030, 2050, 2100]) if (y >= lo && y <= hi) periods.push({ label: String(y), from: y, to: y });
  const rangeNote = "each member's parts add up to its warming; the ranges of the parts do not add up to a range of the total";
  /** Milestone table of one split (by agent or by species): a row per part and the total. */
  const periodTable = (name: string, what: string, split: Attribution, labels: (x: string) => string, partRanges?: Record<string, PartRange>): OutputTable => {
    const cell = (central: Float64Array, q: { from: number; to: number }, b?: PartRange) => {
      const c = periodMean(first, central, q.from, q.to);
      if (!b) return c.toFixed(3);
      return `${c.toFixed(2)} [${periodMean(first, b.p05, q.from, q.to).toFixed(2)}, ${periodMean(first, b.p95, q.from, q.to).toFixed(2)}]`;
    };
    return {
      name,
      caption: `Warming by ${what}, K relative to ${p.baseline[0]}-${p.baseline[1]}` + (partRanges ? ' (central run [5 %, 95 %] of the members)' : ''),
      columns: [
        { key: name === 'by_agent' ? 'agent' : 'species', values: [...split.agents.map(labels), 'total (warming_k)'] },
        ...periods.map((q) => ({
          key: q.label,
          values: [...split.agents.map((x) => cell(split.warmingK[x], q, partRanges?.[x])), cell(p.columns.warming_k, q, ranges?.total)],
        })),
      ],
      notes: partRanges ? [rangeNote] : [],
      terminalOverflow: 'wrap',
    };
  };
  const tables = [periodTable('by_agent', 'forcing agent', a, (x) => x, ranges?.byAgent)];
  if (species) tables.push(periodTable('by_species', 'emitted species (each with the ozone and strat. H2O it makes)', species, (x) => EMITTED_SPECIES_LABELS[x as EmittedSpecies] ?? x, ranges?.bySpecies));

  // The chart: the three main gases, all aerosol, and the rest together (a chart, so grouping is fine; the files keep every agent).
  const c0 = Math.max(i0, 1850 - first);
  const years = p.years.slice(c0, i1);
  const sum = (agents: string[]) => {
    const v = new Float64Array(years.length);
    for (const x of agents) for (let i = 0; i < v.length; i++) v[i] += a.warmingK[x][c0 + i];
    return v;
  };
  const aerosol = a.agents.filter((x) => x.startsWith('aerosol'));
  const gases = ['co2', 'ch4', 'n2o'].filter((x) => a.agents.includes(x));
  const rest = a.agents.filter((x) => !gases.includes(x) && !aerosol.includes(x));
  const series: ChartLine[] = [
    ...gases.map((x) => ({ label: x.toUpperCase(), years, values: a.warmingK[x].slice(c0, i1) })),
    ...(aerosol.length ? [{ label: 'aerosol (all)', years, values: sum(aerosol) }] : []),
    { label: 'all other agents', years, values: sum(rest) },
  ];
  // For emission pathways, a second chart: the species that matter most for planning, each with the chemistry it drives.
  const speciesSeries: ChartLine[] = species
    ? (['co2', 'ch4', 'n2o', 'halogens', 'nox_co_nmvoc', 'aerosol_precursors'] as const).map((x) => ({ label: EMITTED_SPECIES_LABELS[x], years, values: species.warmingK[x].slice(c0, i1) }))
    : [];
  const yLabel = `Warming relative to ${p.baseline[0]}-${p.baseline[1]} (K)`;
  const subtitle =
    `ECS ${p.params.ecsK.toFixed(2)} K, TCR ${p.params.tcrK.toFixed(2)} K, one central run` +
    (ranges ? ` with ranges from ${ranges.members} members` : '') +
    `; warming relative to the ${p.baseline[0]}-${p.baseline[1]} mean; the parts add up to warming_k in every year`;
  return {
    command: 'attribute',
    title: `${p.name}: warming by forcing agent${species ? ' and by emitted species' : ''}`,
    subtitle,
    baseline: p.baseline,
    headline: [],
    data: { name: 'data', columns: data },
    tables,
    terminalTables: tables.length,
    charts: [
      { title: `Warming by agent, ${p.name}`, xLabel: 'Year', yLabel, series },
      ...(species ? [{ title: `Warming by emitted species, ${p.name}`, xLabel: 'Year', yLabel, series: speciesSeries }] : []),
    ],
    terminalChart: { series, options: { title: `Warming by agent, ${p.name} (K)`, yLabel: 'K', height: 10 } },
    notes: options.notes,
    ...(r.speciesSkipped ? { terminalNotes: [r.speciesSkipped] } : {}),
    cautions: standardCautions(ranges ? `Ranges are the 5-95 % spread of ${ranges.members} members; they cover the members' parameters only, not the pathway or the model structure.${ranges.scheme.startsWith('calibrated set') ? ` ${CALIBRATED_SET_CAUTION}` : ''}` : undefined),
    shortCaution: shortCaution('attribute', Boolean(ranges)),
  };
}
