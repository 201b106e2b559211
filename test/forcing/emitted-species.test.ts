/**
 * The split of forcing by emitted species: ozone shared out by the AR6 linear form (IPCC AR6 WG1
 * 7.SM.1.3.2, Thornhill et al. 2021; coefficients from memory as in src/forcing/ozone.ts), the parts
 * adding up to the agents' total, and the EESC series the halogen share uses.
 */
import { describe, expect, it } from 'vitest';
import { FORCING_AGENTS, type ForcingAgent } from '../../src/forcing/agents.js';
import { EMITTED_SPECIES, eescSeries, forcingBySpecies, ozoneShares, presentDayEescPpt } from '../../src/forcing/emitted-species.js';
import { expectClose } from '../asserts.js';

describe('ozoneShares', () => {
  it('gives CH4 1.75e-4, N2O 7.1e-4 W m-2 per ppb above 1750 and EESC -1.25e-4 per ppt (by hand, AR6 7.SM.1.3.2)', () => {
    // 2019-like state: CH4 1866.3 ppb, N2O 332.1 ppb (AR6 2019 concentrations, from memory), EESC 1000 ppt.
    const s = ozoneShares([1866.3], [332.1], [1000]);
    expectClose(s.ch4[0], 1.75e-4 * (1866.3 - 729.2), 1e-15, 'CH4 share');
    expectClose(s.ch4[0], 0.199, 5e-4, 'CH4 share, rounded');
    expectClose(s.n2o[0], 7.1e-4 * (332.1 - 270.1), 1e-15, 'N2O share');
    expectClose(s.halogens[0], -0.125, 1e-12, 'halogen share');
  });
  it('is zero at the 1750 state', () => {
    const s = ozoneShares([729.2], [270.1], [0]);
    expect([s.ch4[0], s.n2o[0], s.halogens[0]]).toEqual([0, 0, -0]);
  });
  it('refuses series of different lengths', () => {
    expect(() => ozoneShares([1, 2], [1], [1, 2])).toThrow(/one CH4, N2O and EESC value per year/);
  });
});

describe('forcingBySpecies', () => {
  const n = 40;
  const byAgent = Object.fromEntries(FORCING_AGENTS.map((a, i) => [a, Float64Array.from({ length: n }, (_, k) => Math.sin(k * 0.3 + i) * (i + 1) * 0.1)])) as Record<ForcingAgent, Float64Array>;
  const shares = { ch4: Float64Array.from({ length: n }, (_, k) => 0.005 * k), n2o: new Float64Array(n).fill(0.04), halogens: Float64Array.from({ length: n }, (_, k) => -0.003 * k) };

  it('adds up to the sum over agents in every year, whatever the ozone scale (every agent goes to one species or is split)', () => {
    for (const scale of [1, 0.6, 1.4]) {
      const s = forcingBySpecies(byAgent, shares, scale);
      for (let k = 0; k < n; k++) {
        const agents = FORCING_AGENTS.reduce((t, a) => t + byAgent[a][k], 0);
        const species = EMITTED_SPECIES.reduce((t, x) => t + s[x][k], 0);
        expectClose(species, agents, 1e-12, `year ${k}, scale ${scale}`);
      }
    }
  });
  it("gives methane its own ERF, strat. H2O and its scaled ozone share; the rest of ozone to NOx, CO and NMVOC", () => {
    const s = forcingBySpecies(byAgent, shares, 1.2);
    const k = 17;
    expectClose(s.ch4[k], byAgent.ch4[k] + byAgent.strat_h2o[k] + 1.2 * shares.ch4[k], 1e-15, 'CH4');
    expectClose(s.halogens[k], byAgent.other_ghg[k] + 1.2 * shares.halogens[k], 1e-15, 'halogens');
    expectClose(s.nox_co_nmvoc[k], byAgent.ozone[k] - 1.2 * (shares.ch4[k] + shares.n2o[k] + shares.halogens[k]), 1e-15, 'NOx, CO, NMVOC');
    expectClose(s.aerosol_precursors[k], byAgent.aerosol_ari[k] + byAgent.aerosol_aci[k] + byAgent.bc_snow[k], 1e-15, 'aerosol precursors');
  });
});

describe('eescSeries', () => {
  const years = Float64Array.from({ length: 2030 - 1750 + 1 }, (_, k) => 1750 + k);
  const other = Float64Array.from(years, (y) => (y < 1950 ? 0.001 : 0.001 + 0.005 * (y - 1950)));
  const i2019 = 2019 - 1750;

  it("without computed gases: follows the halogen forcing, equal to the bundled 2019 concentrations' EESC in 2019", () => {
    const e = eescSeries(years, other);
    expectClose(e[i2019], presentDayEescPpt(), 1e-9, 'EESC 2019');
    expectClose(e[2000 - 1750] / e[i2019], other[2000 - 1750] / other[i2019], 1e-12, 'proxy ratio');
  });
  it('with computed gases from 2025: those from 2025, the proxy to 2019, a straight line between', () => {
    const computed = Float64Array.from({ length: 6 }, (_, k) => 1000 - 10 * k);
    const e = eescSeries(years, other, { fromYear: 2025, eescPpt: computed });
    const i2025 = 2025 - 1750;
    expectClose(e[i2025], 1000, 1e-9, '2025');
    expectClose(e[2030 - 1750], 950, 1e-9, '2030');
    expectClose(e[i2019], presentDayEescPpt(), 1e-9, '2019');
    expectClose(e[2022 - 1750], e[i2019] + ((e[i2025] - e[i2019]) * 3) / 6, 1e-9, '2022 on the line');
  });
  it('refuses computed EESC that stops before the run does', () => {
    expect(() => eescSeries(years, other, { fromYear: 2025, eescPpt: [1, 2] })).toThrow(/computed EESC covers 2025-2026/);
  });
  it('refuses a run with neither 2019 nor computed gases to anchor to', () => {
    expect(() => eescSeries(Float64Array.of(2050, 2051), [0.3, 0.3])).toThrow(/anchored at 2019/);
  });
});
