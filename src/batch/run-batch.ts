import { formatInputProblem, InputError, WarmcastError, type InputProblem } from '../errors.js';
import type { EnsembleResult } from '../ensemble/index.js';
import type { Pathway } from '../pathway.js';
import { assessScenario, type AssessOptions, type ScenarioAssessment } from './assess-scenario.js';

/** One scenario of a batch: its place in the table and how to read it (reading may fail). */
export interface BatchScenario {
  /** 0-based position of the (model, scenario) in the table. */
  index: number;
  model: string;
  scenario: string;
  /** Reads the scenario as a run uses it, with the text of the agents an assumption fills; throws for a bad scenario. */
  read: () => { pathway: Pathway; filledBy: string };
}

/** A scenario the batch could not assess, with each problem as one line. */
export interface BatchError {
  index: number;
  model: string;
  scenario: string;
  /** Stable code of the first problem (`input.iamc-unit`, `numerical.failure`, `internal`). */
  code: string;
  /** The problems (file, sheet, row, column, model, scenario, variable and message), formatted. */
  problems: InputProblem[];
}

/** What a batch (or one shard of it) gives: a row per assessed scenario and an error per failed one, in table order. */
export interface BatchOutcome {
  rows: (ScenarioAssessment & { index: number })[];
  errors: BatchError[];
}

/**
 * Assesses every scenario in turn with the same ensemble settings (assessScenario), so that a row
 * equals what the scenario gives alone with the same seed. A scenario that cannot be read or run is
 * recorded in `errors` and the batch goes on; an unexpected failure (a bug) is recorded with the code
 * `internal`.
 *
 * @param scenarios in table order (a shard passes its slice)
 * @param options ensemble settings; `onProgress(done, total)` after each scenario; `onAssessed` with
 *   each scenario's ensemble (to write its trajectory)
 */
export async function runBatch(
  scenarios: BatchScenario[],
  options: AssessOptions & {
    onProgress?: (done: number, total: number) => void;
    onAssessed?: (scenario: BatchScenario, result: EnsembleResult, notes: string[]) => void;
  },
): Promise<BatchOutcome> {
  const rows: BatchOutcome['rows'] = [];
  const errors: BatchError[] = [];
  let done = 0;
  for (const s of scenarios) {
    try {
      const { pathway, filledBy } = s.read();
      const { assessment, result, notes } = await assessScenario(pathway, { model: s.model, scenario: s.scenario, filledBy }, options);
      rows.push({ index: s.index, ...assessment });
      options.onAssessed?.(s, result, [...pathway.provenance.notes, ...notes, ...result.notes]);
    } catch (e) {
      errors.push(batchError(s, e));
    }
    options.onProgress?.(++done, scenarios.length);
  }
  return { rows, errors };
}

function batchError(s: BatchScenario, e: unknown): BatchError {
  const ids = { index: s.index, model: s.model, scenario: s.scenario };
  if (e instanceof InputError) return { ...ids, code: e.code, problems: e.problems };
  const code = e instanceof WarmcastError ? e.code : 'internal';
  const message = e instanceof Error ? e.message : String(e);
  return { ...ids, code, problems: [{ file: '', code, message: code === 'internal' ? `internal error: ${message}` : message, model: s.model, scenario: s.scenario }] };
}

/** One line per problem of a batch error, as the terminal shows it. */
export function batchErrorLines(e: BatchError): string[] {
  return e.problems.map((p) => (p.file === '' ? `model "${e.model}", scenario "${e.scenario}": ${p.message}` : formatInputProblem(p)));
}
