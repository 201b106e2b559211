import { expect } from 'vitest';
import type { EmissionRunResult } from '../../src/carbon/index.js';

/** Gt C per ppm used for the independent recomputation (Ballantyne et al. 2012; from memory). */
const GTC_PER_PPM = 2.124;

/**
 * Asserts CO2 mass conservation in a run, emitted = atmospheric increase + uptake, to 1e-6 of the
 * total: once through the run's own `massBalanceError`, and once recomputed from the reported
 * year-end concentrations rather than the box stocks (the budget is kept at the end of each year).
 */
export function expectMassConserved(run: EmissionRunResult, what = ''): void {
  expect(run.massBalanceError, `${what} massBalanceError`).toBeLessThan(1e-6);
  const { emittedGtc, uptakeGtc } = run.carbonBudget;
  let scale = 0;
  let worst = 0;
  for (let k = 0; k < emittedGtc.length; k++) {
    // The starting equilibrium: the first year's concentration when the run follows a record, else 1750 (AR6: 278.3 ppm).
    const start = run.diagnosedUntil !== undefined ? run.co2Ppm[0] : 278.3;
    const atmosphereGtc = (run.co2YearEndPpm[k] - start) * GTC_PER_PPM;
    scale = Math.max(scale, Math.abs(emittedGtc[k]), Math.abs(atmosphereGtc), Math.abs(uptakeGtc[k]));
    worst = Math.max(worst, Math.abs(emittedGtc[k] - atmosphereGtc - uptakeGtc[k]));
  }
  expect(scale === 0 ? 0 : worst / scale, `${what} emitted - (atmospheric increase + uptake), relative`).toBeLessThan(1e-6);
}
