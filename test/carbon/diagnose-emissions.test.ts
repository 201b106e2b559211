import { describe, expect, it } from 'vitest';
import { diagnoseEmissions, runEmissionDriven, type EmissionRunOptions } from '../../src/carbon/index.js';
import { calibrate, energyBalance } from '../../src/climate/index.js';
import { forcingByAgent } from '../../src/forcing/index.js';
import { loadHistory } from '../../src/io/index.js';
import type { Pathway } from '../../src/pathway.js';
import { expectAllClose } from '../asserts.js';
import { expectMassConserved } from './mass-conserved.js';

const params = calibrate();
const forcing = { co2Formula: 'ar6' as const, forcing2xWm2: params.forcing2xWm2 };

/** Warming of the concentration-driven path: ERF of the pathway, then the two-box model by odex. */
function concentrationDrivenWarming(p: Pathway): Float64Array {
  const s = p.series;
  const f = forcingByAgent(p.years.length, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, forcing);
  return energyBalance(params, f.total).surfaceK;
}

describe('diagnoseEmissions round trip', () => {
  const history = loadHistory();

  for (const feedback of [true, false]) {
    it(`history concentrations and the emissions diagnosed from them give the same warming to 1e-3 K (feedback ${feedback ? 'on' : 'off'})`, () => {
      const options: EmissionRunOptions = { forcing, feedback };
      const { emissions, run } = diagnoseEmissions(history, params, options);
      const back = runEmissionDriven(emissions, params, options);
      // The round-trip criterion, against the concentration-driven energy balance.
      expectAllClose(back.surfaceK, concentrationDrivenWarming(history), 1e-3, 'warming');
      // The diagnosing run itself differs from the concentration-driven path only in how forcing
      // varies within a year (current concentrations vs linear between nodes): second order.
      expectAllClose(run.surfaceK, concentrationDrivenWarming(history), 1e-4, 'diagnosing run');
      expectMassConserved(run, 'diagnosing run');
      expectMassConserved(back, 'forward run');
    });
  }

  it('the emission pathway has emission columns and the prescribed forcing, no concentrations', () => {
    const { emissions } = diagnoseEmissions(history, params, { forcing });
    expect(Object.keys(emissions.series).sort()).toEqual([
      'aerosol_aci_wm2', 'aerosol_ari_wm2', 'bc_snow_wm2', 'ch4_mt', 'co2_gtco2', 'contrails_wm2', 'land_use_wm2', 'n2o_mt', 'other_ghg_wm2', 'ozone_wm2',
      'solar_wm2', 'strat_h2o_wm2', 'volcanic_wm2',
    ]);
    expect(emissions.provenance.notes).toContain('emissions diagnosed from concentrations by the carbon cycle');
  });

  it('constant pre-industrial concentrations need no anthropogenic emissions', () => {
    const n = 50;
    const years = Float64Array.from({ length: n }, (_, i) => 1750 + i);
    const flat: Pathway = {
      name: 'flat',
      years,
      series: { co2_ppm: new Float64Array(n).fill(278.3), ch4_ppb: new Float64Array(n).fill(729.2), n2o_ppb: new Float64Array(n).fill(270.1) },
      metadata: {},
      provenance: { source: 'flat', notes: [] },
    };
    const { emissions } = diagnoseEmissions(flat, params, { forcing });
    for (const column of ['co2_gtco2', 'ch4_mt', 'n2o_mt'] as const) expectAllClose(emissions.series[column]!, new Float64Array(n), 1e-9, column);
  });
});
