import { describe, expect, it } from 'vitest';
import { HALOGEN_PRESENT_DAY } from '../../src/carbon/halogen-present-day.js';
import { HALOGEN_SPECIES } from '../../src/carbon/halogen-species.js';
import { halogenEmissionsKt } from '../../src/carbon/halogen-cycle.js';
import { InputError } from '../../src/errors.js';
import { PRECURSOR_PRESENT_DAY } from '../../src/forcing/aerosol.js';
import { fluorinatedShares, resolveEmissionForcing } from '../../src/forcing/emission-forcing.js';
import type { Pathway } from '../../src/pathway.js';
import { expectClose } from '../asserts.js';

/** A history 1750-2024 whose agent columns hold AR6's 2019 values (ar6-erf-1750-2019.csv) in every year from 2000. */
function history(): Pathway {
  const years = Float64Array.from({ length: 275 }, (_, i) => 1750 + i);
  const ramp = (v: number) => years.map((y) => (y >= 2000 ? v : (v * (y - 1750)) / 250));
  return {
    name: 'history',
    years,
    series: {
      aerosol_ari_wm2: ramp(-0.2156),
      aerosol_aci_wm2: ramp(-0.8428),
      ozone_wm2: ramp(0.4745),
      strat_h2o_wm2: ramp(0.05),
      other_ghg_wm2: ramp(0.4081),
      bc_snow_wm2: ramp(0.08),
    } as Pathway['series'],
    metadata: {},
    provenance: { source: 'bundled:history', notes: [] },
  };
}

/** A planner-style emission file 2025-2100 with linear series from `start` to `end`. */
function file(columns: Record<string, [number, number]>): Pathway {
  const years = Float64Array.from({ length: 76 }, (_, i) => 2025 + i);
  const series: Record<string, Float64Array> = {};
  for (const [c, [a, b]] of Object.entries(columns)) series[c] = years.map((y) => a + ((b - a) * (y - 2025)) / 75);
  return { name: 'plan', years, series: series as Pathway['series'], metadata: {}, provenance: { source: 'plan.csv', notes: [] } };
}

const present = (p: keyof typeof PRECURSOR_PRESENT_DAY): [number, number] => [PRECURSOR_PRESENT_DAY[p], PRECURSOR_PRESENT_DAY[p]];

describe('resolveEmissionForcing', () => {
  it('aerosol forcing equals the history at the join and is zero when the precursors are zero (the issue\'s check)', () => {
    const r = resolveEmissionForcing(file({ co2_gtco2: [40, 0], so2_mt: [80, 0], bc_mt: [6, 0], oc_mt: [16, 0], nh3_mt: [60, 0], nox_mt: [110, 0], co_mt: [550, 0], nmvoc_mt: [145, 0], hfc134a_kt: [240, 0] }), history(), { absent: { kind: 'hold' } });
    const s = r.pathway.series as Record<string, Float64Array>;
    expectClose(s.aerosol_ari_wm2[0], -0.2156, 1e-12, 'ari at the join');
    expectClose(s.aerosol_aci_wm2[0], -0.8428, 1e-12, 'aci at the join');
    expect(Math.abs(s.aerosol_ari_wm2[75])).toBeLessThan(1e-15);
    expect(Math.abs(s.aerosol_aci_wm2[75])).toBeLessThan(1e-15);
    expect(Math.abs(s.bc_snow_wm2[75])).toBeLessThan(1e-15);
    // The factors on the AR6 forms stay near 1 for inventory-like emissions.
    expect(r.aerosolScale!.ari).toBeGreaterThan(0.5);
    expect(r.aerosolScale!.aci).toBeLessThan(2);
    expectClose(s.ozone_wm2[0], 0.4745, 1e-12, 'ozone at the join');
    expect(s.ozone_wm2[75]).toBeLessThan(s.ozone_wm2[0]);
  });

  it('refuses an emission file without aerosol, ozone or halogen emissions unless an assumption is chosen, listing the choices', () => {
    const f = file({ co2_gtco2: [40, 0] });
    let error: unknown;
    try {
      resolveEmissionForcing(f, history());
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).exitCode).toBe(2);
    expect((error as InputError).message).toMatch(/aerosol precursors.*ozone precursors.*halogenated gases/);
    expect((error as InputError).message).toMatch(/--absent-emissions hold \| follow-co2 \| zero-by-YEAR/);
  });

  it('follow-co2 takes the aerosol to zero with the CO2 emissions and records the assumption', () => {
    const r = resolveEmissionForcing(file({ co2_gtco2: [40, 0] }), history(), { absent: { kind: 'follow-co2' } });
    const s = r.pathway.series as Record<string, Float64Array>;
    expectClose(s.aerosol_aci_wm2[0], -0.8428, 1e-12);
    expect(Math.abs(s.aerosol_aci_wm2[75])).toBeLessThan(1e-15);
    expect(r.assumptions.join(' ')).toMatch(/follow the file's CO2 emissions/);
    expect(r.pathway.provenance.assumptions).toEqual(r.assumptions);
    expect(r.sources.aerosol_aci).toMatch(/assumed precursor emissions/);
  });

  it('hold keeps every assumed species at present-day emissions, so the aerosol forcing stays at the history\'s value', () => {
    const r = resolveEmissionForcing(file({ co2_gtco2: [40, 40] }), history(), { absent: { kind: 'hold' } });
    const s = r.pathway.series as Record<string, Float64Array>;
    for (let k = 0; k < 76; k++) expectClose(s.aerosol_ari_wm2[k], -0.2156, 1e-12);
  });

  it('refuses aerosol emissions given beside aerosol forcing', () => {
    expect(() => resolveEmissionForcing(file({ co2_gtco2: [40, 0], so2_mt: [80, 0], aerosol_wm2: [-1, 0] }), history(), { absent: { kind: 'hold' } })).toThrow(/not both/);
  });

  it('refuses first-year precursors a thousand times too large (kt given as Mt) with the factor they would need', () => {
    expect(() => resolveEmissionForcing(file({ co2_gtco2: [40, 0], so2_mt: [80000, 0], bc_mt: [6000, 0], oc_mt: [16000, 0] }), history(), { absent: { kind: 'hold' } })).toThrow(/are they in Mt per year/);
  });

  it('fgas_mtco2e at the present-day total gives the same halogen forcing as holding the fluorinated gases (AR6 GWP100 split)', () => {
    let total = 0;
    for (const g of HALOGEN_SPECIES) {
      if (!['hfc', 'pfc', 'other-fluorinated'].includes(g.group)) continue;
      const pd = HALOGEN_PRESENT_DAY[g.column];
      total += (Math.max(0, halogenEmissionsKt(g, pd.ppt2019 - pd.preindustrialPpt, pd.trendPptPerYr)) * g.gwp100) / 1000;
    }
    const shares = fluorinatedShares();
    expectClose(Object.values(shares).reduce((a, b) => a + b, 0), 1, 1e-12, 'shares sum to 1');
    const base = { co2_gtco2: [40, 0] as [number, number], so2_mt: present('so2'), nox_mt: present('nox') };
    const withTotal = resolveEmissionForcing(file({ ...base, fgas_mtco2e: [total, total] }), history(), { absent: { kind: 'hold' } });
    const held = resolveEmissionForcing(file(base), history(), { absent: { kind: 'hold' } });
    const a = (withTotal.pathway.series as Record<string, Float64Array>).other_ghg_wm2;
    const b = (held.pathway.series as Record<string, Float64Array>).other_ghg_wm2;
    for (let k = 0; k < 76; k++) expectClose(a[k], b[k], 1e-12);
    // Present-day F-gas emissions implied by the bundled concentrations, AR6 GWP100 (about 1.3-1.6 Gt CO2-eq in inventories; from memory).
    expect(total).toBeGreaterThan(900);
    expect(total).toBeLessThan(2000);
  });

  it('a file without emission columns is returned unchanged', () => {
    const f = file({ co2_ppm: [425, 500] });
    expect(resolveEmissionForcing(f, history()).pathway).toBe(f);
  });
});

describe('resolveEmissionForcing with halogen concentrations', () => {
  it('a concentration file with hfc134a_ppt moves other_ghg by RE x the change from its first year; absent groups stay with the history', () => {
    const f = file({ co2_ppm: [425, 500], hfc134a_ppt: [130, 330] });
    const r = resolveEmissionForcing(f, history());
    const s = r.pathway.series as Record<string, Float64Array>;
    const hfc = HALOGEN_SPECIES.find((g) => g.column === 'hfc134a')!;
    const heldOthers = s.other_ghg_wm2[75] - 0.4081 - (hfc.radiativeEfficiency * 200) / 1000;
    // The other gases continue from their present-day state with present-day emissions (held); CFCs decline.
    expect(heldOthers).toBeLessThan(0);
    expect(s.aerosol_aci_wm2).toBeUndefined();
    expect(r.sources.other_ghg).toMatch(/the file's halogenated gases/);
    expect(r.assumptions.join(' ')).toMatch(/35 halogenated gases not in the file/);
  });
});

describe('resolveEmissionForcing for a file starting in 2000', () => {
  it('ozone precursors without halogens: EESC held at the join, stated as an assumption', () => {
    const years = Float64Array.from({ length: 101 }, (_, i) => 2000 + i);
    const series = { co2_ppm: years.map(() => 400), nox_mt: years.map((y) => 110 - (y - 2000)) } as Pathway['series'];
    const f: Pathway = { name: 'early', years, series, metadata: {}, provenance: { source: 'early.csv', notes: [] } };
    const r = resolveEmissionForcing(f, history());
    expect(r.assumptions.join(' ')).toMatch(/EESC/);
    const ozone = (r.pathway.series as Record<string, Float64Array>).ozone_wm2;
    expectClose(ozone[100] - ozone[0], 1.797e-3 * -100, 1e-12, 'NOx term only');
  });

  it('halogen emissions from 2000 are refused: the present-day state covers joins in 2010-2040', () => {
    const years = Float64Array.from({ length: 11 }, (_, i) => 2000 + i);
    const f: Pathway = { name: 'early', years, series: { co2_ppm: years.map(() => 400), sf6_kt: years.map(() => 9) } as Pathway['series'], metadata: {}, provenance: { source: 'early.csv', notes: [] } };
    expect(() => resolveEmissionForcing(f, history())).toThrow(/must start between 2010 and 2040/);
  });
});
