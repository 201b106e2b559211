import type { BatchScenario } from '../batch/run-batch.js';
import { pathwayCoverage, type PathwayCoverage } from '../io/iamc-coverage.js';
import { scenarioPathway } from '../io/iamc-read.js';
import type { IamcScenario } from '../io/iamc-table.js';
import type { LoadPathwayOptions } from '../io/load-pathway.js';

/**
 * A table's scenario as a batch item: read with the `load` options (splice, as a run reads pathways)
 * when the batch reaches it, with the text of the agents it does not give and how they are filled.
 */
export function batchScenario(s: IamcScenario, index: number, load: LoadPathwayOptions): BatchScenario {
  return {
    index,
    model: s.model,
    scenario: s.scenario,
    read: () => {
      const read = scenarioPathway(s, load);
      return { pathway: read.pathway, filledBy: filledByText(pathwayCoverage(read, s.notes)) };
    },
  };
}

/** Groups the filled agents by how they are filled: `aerosol, other: <note>; solar, volcanic: <note>`. */
export function filledByText(coverage: PathwayCoverage): string {
  const groups = new Map<string, string[]>();
  for (const f of coverage.filled) {
    const how = f.how.length > 0 ? f.how.join(' / ') : 'not given';
    groups.set(how, [...(groups.get(how) ?? []), f.agent]);
  }
  return [...groups].map(([how, agents]) => `${agents.join(', ')}: ${how}`).join('; ');
}
