import { describe, expect, it } from 'vitest';
import { InputError, type InputProblem } from '../../src/errors.js';
import { parsePathway } from '../../src/io/parse-pathway.js';
import { VALUE_BOUNDS } from '../../src/io/value-bounds.js';
import { COLUMN_UNITS, PATHWAY_COLUMNS } from '../../src/pathway.js';

function problems(text: string): InputProblem[] {
  try {
    parsePathway(text, 'plan.csv');
  } catch (e) {
    if (e instanceof InputError) return e.problems;
    throw e;
  }
  return [];
}

describe('precursor and halogenated-gas columns', () => {
  it('reads so2_mt ... nmvoc_mt, fgas_mtco2e and <gas>_kt columns with their values', () => {
    const p = parsePathway('# name: plan\nyear,co2_gtco2,so2_mt,bc_mt,oc_mt,nh3_mt,nox_mt,co_mt,nmvoc_mt,hfc134a_kt,sf6_kt,cfc12_ppt\n2025,40,80,6,16,60,110,550,145,240,9,490\n', 'plan.csv');
    expect(p.columns.so2_mt![0]).toBe(80);
    expect(p.columns.hfc134a_kt![0]).toBe(240);
    expect(p.columns.cfc12_ppt![0]).toBe(490);
  });

  it('every column has a unit and bounds', () => {
    for (const c of PATHWAY_COLUMNS) {
      expect(COLUMN_UNITS[c], c).toBeTruthy();
      expect(VALUE_BOUNDS[c], c).toBeDefined();
    }
  });

  it('refuses negative SO2, BC and OC with the file, line (comments counted), column and bound', () => {
    const ps = problems('# name: plan\n# comment\nyear,so2_mt,bc_mt,oc_mt\n2025,80,6,16\n2030,-1,-0.5,-2\n');
    expect(ps.map((p) => [p.file, p.line, p.column, p.code])).toEqual([
      ['plan.csv', 5, 'so2_mt', 'input.negative'],
      ['plan.csv', 5, 'bc_mt', 'input.negative'],
      ['plan.csv', 5, 'oc_mt', 'input.negative'],
    ]);
    expect(ps[0].message).toBe('must not be negative: an SO2 emission rate cannot be below 0 Mt SO2 yr-1');
    expect(ps[0].expected).toBe('a value from 0 to 1000 Mt SO2 yr-1');
  });

  it('refuses CH4 emissions below minus the natural flux (220 Mt, the 1750 steady state) and accepts a removal above it', () => {
    expect(problems('year,ch4_mt\n2025,-100\n')).toEqual([]);
    const [p] = problems('year,ch4_mt\n2025,-300\n');
    expect(p.code).toBe('input.out-of-range');
    expect(p.expected).toBe('a value from -220 to 5000 Mt CH4 yr-1');
  });

  it('answers a halogen column naming no known gas with a "did you mean" from the AR6 species', () => {
    const ps = problems('year,hfc134_kt,pfc14_kt,sulfurhexafluoride_kt\n2025,1,1,1\n');
    expect(ps.map((p) => p.code)).toEqual(['input.unknown-gas', 'input.unknown-gas', 'input.unknown-gas']);
    expect(ps[0].message).toMatch(/did you mean "hfc134a_kt" \(HFC-134a/);
    expect(ps[1].message).toMatch(/did you mean "cf4_kt" \(CF4/);
    expect(ps[2].message).toMatch(/did you mean "sf6_kt"/);
    expect(ps[0].expected).toMatch(/^<gas>_kt with <gas> one of hfc23, /);
  });

  it('refuses a gas given both as emissions and as a concentration', () => {
    const [p] = problems('year,sf6_kt,sf6_ppt\n2025,9,11\n');
    expect(p.code).toBe('input.gas-twice');
    expect(p.column).toBe('sf6_ppt');
  });
});
