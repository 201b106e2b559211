// A byte-exact rendering of everything an ensemble reports (with every member's peak), for same-output comparisons. JSON
// writes each number as the shortest text that reads back to the same double, so equal strings
// mean bit-identical numbers (NaN and the incomplete 20-year windows appear as null).
import { ensembleTable, type EnsembleResult } from '../../src/ensemble/index.js';

export function canonical(r: EnsembleResult): string {
  const t = ensembleTable(r);
  return JSON.stringify({
    columns: t.columns,
    values: t.columns.map((c) => Array.from(t.values[c])),
    crossings: r.crossings,
    parameters: r.parameters,
    ecsTcrCorrelation: r.ecsTcrCorrelation,
    peak: r.peak,
    memberPeaks: [Array.from(r.memberParameters.peaks.warmingK), Array.from(r.memberParameters.peaks.yearIndex)],
    redraws: r.redraws,
    memberCount: r.memberCount,
    notes: r.notes,
  });
}
