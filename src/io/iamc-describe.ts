import { formatInputProblem, InputError, type InputProblem } from '../errors.js';
import { pathwayCoverage } from './iamc-coverage.js';
import { scenarioPathway } from './iamc-read.js';
import type { IamcTable } from './iamc-table.js';
import type { LoadPathwayOptions } from './load-pathway.js';

/**
 * What `warmcast check TABLE` prints: the table (layout, scenarios, models, notes), then for each
 * (model, scenario) its years, the forcing agents it gives (with the variables read), those the run
 * fills and how (history, held values, a stated assumption), the variables it gives that this version
 * does not use, and its notes; or its problems.
 *
 * @param table a scenario table (readScenarioTable)
 * @param options splice and pathwaysDir, as a run would read the scenarios
 * @returns the lines, and every problem of every scenario (the caller decides the exit code)
 */
export function describeScenarioTable(table: IamcTable, options: LoadPathwayOptions = {}): { lines: string[]; problems: InputProblem[] } {
  const models = new Set(table.scenarios.map((s) => s.model));
  const lines = [`file: ${table.file}`, `scenario table: IAMC ${table.layout} layout, ${table.scenarios.length} scenario${table.scenarios.length === 1 ? '' : 's'} from ${models.size} model${models.size === 1 ? '' : 's'}; region World read`];
  for (const note of table.notes) lines.push(`note: ${note}`);
  const problems: InputProblem[] = [];
  let bad = 0;
  for (const s of table.scenarios) {
    lines.push('', `scenario "${s.scenario}", model "${s.model}"`);
    let read;
    try {
      read = scenarioPathway(s, options);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      bad++;
      problems.push(...e.problems);
      lines.push(`  problems (${e.problems.length}):`, ...e.problems.map((p) => `    ${formatInputProblem(p)}`));
      continue;
    }
    const t = read.parsed.times;
    lines.push(`  years in table: ${t[0]} to ${t[t.length - 1]} (${t.length} values); run covers ${read.pathway.years[0]} to ${read.pathway.years[read.pathway.years.length - 1]}`);
    const variableOf = new Map<string, string>();
    for (const v of s.variables) variableOf.set(v.column, variableOf.has(v.column) ? `${variableOf.get(v.column)} + ${v.variable}` : v.variable);
    const coverage = pathwayCoverage(read, s.notes);
    lines.push(`  gives: ${coverage.given.map((g) => `${g.agent} (${g.columns.map((c) => variableOf.get(c) ?? c).join(', ')})`).join('; ') || 'no forcing agent'}`);
    // Agents filled the same way share one line.
    const groups = new Map<string, string[]>();
    for (const f of coverage.filled) {
      const how = f.how.length > 0 ? f.how.join('; ') : 'not given (see the notes of a run)';
      groups.set(how, [...(groups.get(how) ?? []), f.agent]);
    }
    for (const [how, agents] of groups) lines.push(`  filled: ${agents.join(', ')}: ${how}`);
    for (const note of s.notes) lines.push(`  note: ${note}`);
  }
  lines.push('', bad === 0 ? `all ${table.scenarios.length} scenarios can be run` : `${bad} of ${table.scenarios.length} scenarios have problems (listed above); the others can be run`);
  return { lines, problems };
}
