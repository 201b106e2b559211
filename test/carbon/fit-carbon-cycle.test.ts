import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CARBON_TARGETS, carbonRecordFigures, fitCarbonCycle, fittedCarbonCycleModule } from '../../src/carbon/fit-carbon-cycle.js';
import { CARBON_CYCLE, MILLAR_2017 } from '../../src/carbon/uptake-feedback.js';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory } from '../../src/io/index.js';

const history = loadHistory();
const params = calibrate();
const fit = fitCarbonCycle(history, params);

describe('fitCarbonCycle on the bundled history', () => {
  it('regenerating src/carbon/fitted-carbon-cycle.ts gives the committed file byte for byte (scripts/fit-carbon-cycle.ts)', () => {
    const committed = readFileSync(new URL('../../src/carbon/fitted-carbon-cycle.ts', import.meta.url), 'utf8');
    expect(
      fittedCarbonCycleModule(fit),
      'the history or the carbon scheme changed: run `npx tsc -p tsconfig.build.json && node dist/scripts/fit-carbon-cycle.js` and commit src/carbon/fitted-carbon-cycle.ts',
    ).toBe(committed);
  });

  it('the defaults are the fit: Millar et al. 2017 r0 and rT, the fitted rC', () => {
    expect(CARBON_CYCLE).toEqual(fit.cycle);
    expect(CARBON_CYCLE.r0Yr).toBe(MILLAR_2017.r0Yr);
    expect(CARBON_CYCLE.rTemperatureYrPerK).toBe(MILLAR_2017.rTemperatureYrPerK);
  });

  it('is a minimum: moving rC by 10 % either way fits the targets worse', () => {
    const misfit = (rC: number) => {
      const f = carbonRecordFigures(history, params, { ...fit.cycle, rUptakeYrPerGtc: rC });
      const t = CARBON_TARGETS;
      return ((f.cumulative1850to2019Gtco2 - t.cumulative1850to2019Gtco2.value) / t.cumulative1850to2019Gtco2.sigma) ** 2
        + ((f.mean2010to2019Gtco2PerYr - t.mean2010to2019Gtco2PerYr.value) / t.mean2010to2019Gtco2PerYr.sigma) ** 2;
    };
    const rC = fit.cycle.rUptakeYrPerGtc;
    expect(misfit(rC * 0.9)).toBeGreaterThan(fit.chiSquare);
    expect(misfit(rC * 1.1)).toBeGreaterThan(fit.chiSquare);
  });

  it("fits the record better than Millar et al. 2017's published rC, whose sinks are too weak", () => {
    expect(fit.after.mean2010to2019Gtco2PerYr).toBeGreaterThan(fit.before.mean2010to2019Gtco2PerYr);
    expect(fit.after.sink2010to2019GtcPerYr).toBeGreaterThan(fit.before.sink2010to2019GtcPerYr);
  });
});
