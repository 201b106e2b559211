import { comparePathways } from '../metrics/compare-pathways.js';
import type { Series } from '../metrics/series.js';
import type { Projection } from '../projection/index.js';
import type { OutputDocument } from './output-document.js';
import type { OutputColumn, OutputTable } from './output-table.js';
import { projectionDocument, type RowChoice } from './projection-document.js';
import { shortCaution, standardCautions } from './standard-cautions.js';

/** Columns of the compact table of a single run, with their human headers. */
const COMPACT: readonly [string, string][] = [
  ['warming_k', 'warming K'],
  ['deep_ocean_k', 'deep ocean K'],
  ['forcing_wm2', 'ERF W m-2'],
  ['imbalance_wm2', 'imbalance W m-2'],
  ['co2_ppm', 'CO2 ppm'],
  ['co2_gtco2', 'CO2 Gt/yr'],
];

/** What {@link runDocument} needs besides the projection. */
export interface RunDocumentOptions {
  rows: RowChoice;
  /** Warming levels of the headline, K (default 1.5 and 2). */
  thresholdsK?: readonly number[];
  /** The observed record rebased to the run's baseline, with its legend text. */
  observed?: Series & { label: string };
  /** Notes of the run beyond the projection's own (parameters, baseline). */
  notes?: readonly string[];
}

/**
 * The document of `warmcast run`: the headline of the run (warming at 2030/2050/2100, peak,
 * crossings of the whole run), its yearly table (every output column, DESIGN.md order), the
 * compact table (warming, deep ocean, ERF, imbalance, CO2), the warming chart with the observed
 * record, the notes and the cautions of a single central run.
 *
 * @param p the projection over all its years (`--from`/`--to` are applied through `rows`)
 * @param options rows, thresholds, observed record, notes
 */
export function runDocument(p: Projection, options: RunDocumentOptions): OutputDocument {
  const names = Object.keys(p.columns);
  const data: OutputTable = {
    name: 'data',
    columns: [{ key: 'year', values: p.years }, ...names.map((key): OutputColumn => ({ key, values: p.columns[key] }))],
  };
  const compact: OutputTable = {
    name: 'milestones',
    caption: `Milestone years (warming K relative to ${p.baseline[0]}-${p.baseline[1]})`,
    columns: [{ key: 'year', values: p.years }, ...COMPACT.filter(([key]) => p.columns[key]).map(([key, label]): OutputColumn => ({ key, label, values: p.columns[key] }))],
  };
  const comparison = comparePathways(
    [{ label: p.name, years: p.years, warmingK: p.columns.warming_k, ...(p.columns.co2_gtco2 ? { co2Gtco2: p.columns.co2_gtco2 } : {}) }],
    { milestoneYears: [...options.rows.years], thresholdsK: options.thresholdsK ?? [1.5, 2] },
  );
  const subtitle =
    `${p.provenance.source}; ECS ${p.params.ecsK.toFixed(2)} K, TCR ${p.params.tcrK.toFixed(2)} K, CO2 forcing ${p.params.co2Formula}, one central run; ` +
    `warming relative to the ${p.baseline[0]}-${p.baseline[1]} mean${spliceText(p)}`;
  // Stated assumptions (what the file lacks, filled by a rule) stand on the terminal, never only in --notes.
  const assumptions = (p.provenance.assumptions ?? []).map((a) => `assumption: ${a}`);
  const notes = [...assumptions, ...p.provenance.notes, ...p.notes, ...(options.notes ?? [])];
  return projectionDocument({
    command: 'run',
    title: p.name,
    subtitle,
    baseline: p.baseline,
    comparison,
    data,
    compact,
    rows: options.rows,
    ...(options.observed ? { observed: options.observed } : {}),
    notes,
    terminalNotes: [...assumptions, ...notes.filter((n) => n.startsWith('warning'))],
    cautions: standardCautions(),
    shortCaution: shortCaution('run', false),
  });
}

/** `; years before 2025 from the bundled history`, or with a bridge `; years to 2024 from the bundled history, 2025-2029 bridged to the file's first year, 2030`. */
function spliceText(p: Projection): string {
  const { spliceYear, historyLastYear } = p.provenance;
  if (spliceYear === undefined) return '';
  if (historyLastYear === undefined || historyLastYear >= spliceYear - 1) return `; years before ${spliceYear} from the bundled history`;
  const bridge = historyLastYear + 1 === spliceYear - 1 ? String(historyLastYear + 1) : `${historyLastYear + 1}-${spliceYear - 1}`;
  return `; years to ${historyLastYear} from the bundled history, ${bridge} bridged to the file's first year, ${spliceYear}`;
}
