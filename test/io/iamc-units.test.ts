import { describe, expect, it } from 'vitest';
import { emissionUnitFactor } from '../../src/io/iamc-units.js';
import { iamcVariable } from '../../src/io/iamc-variables.js';
import { expectClose } from '../asserts.js';

const factor = (variable: string, unit: string) => {
  const v = iamcVariable(variable);
  if (!v) throw new Error(`${variable} not mapped`);
  const r = emissionUnitFactor(unit, v.target);
  if (!r.ok) throw new Error(`${unit} refused`);
  return r.factor;
};

describe('emissionUnitFactor', () => {
  it('1 Mt C/yr is 3.664 Mt CO2/yr (ratio of molar masses 44.009/12.011; AR6 and the Global Carbon Budget use 3.664)', () => {
    // In our column's unit (Gt CO2/yr): 3.664e-3.
    expectClose(factor('Emissions|CO2', 'Mt C/yr') * 1000, 3.664, 0.0005, 'Mt CO2 per Mt C');
    expectClose(factor('Emissions|CO2', 'Gt C/yr'), 3.664, 0.0005, 'Gt CO2 per Gt C');
  });

  it('Mt CO2/yr and Gt CO2/yr convert to Gt CO2/yr by the mass prefix alone', () => {
    expect(factor('Emissions|CO2', 'Mt CO2/yr')).toBe(1e-3);
    expect(factor('Emissions|CO2', 'Gt CO2/yr')).toBe(1);
    expect(factor('Emissions|CO2', 'Pg CO2/yr')).toBe(1);
  });

  it('kt N2O/yr is 1/1000 Mt N2O/yr; N2O-N converts by 44.013/28.014 = 1.571 (molar masses)', () => {
    expect(factor('Emissions|N2O', 'kt N2O/yr')).toBe(1e-3);
    expectClose(factor('Emissions|N2O', 'Mt N2O-N/yr'), 1.5711, 0.0005, 'N2O per N2O-N');
  });

  it('SO2 from S by 64.058/32.06 = 1.998; NOx as NO2 from N by 46.005/14.007 = 3.284 (molar masses)', () => {
    expect(factor('Emissions|Sulfur', 'Mt SO2/yr')).toBe(1);
    expectClose(factor('Emissions|Sulfur', 'Tg S/yr'), 1.998, 0.001, 'SO2 per S');
    expect(factor('Emissions|NOx', 'Mt NO2/yr')).toBe(1);
    expectClose(factor('Emissions|NOx', 'Mt N/yr'), 3.284, 0.001, 'NO2 per N');
  });

  it('CH4, BC, halogenated gases and CO2-equivalents keep their species', () => {
    expect(factor('Emissions|CH4', 'Mt CH4/yr')).toBe(1);
    expect(factor('Emissions|CH4', 'kt CH4/yr')).toBe(1e-3);
    expect(factor('Emissions|BC', 'Mt BC/yr')).toBe(1);
    expect(factor('Emissions|HFC|HFC134a', 'kt HFC134a/yr')).toBe(1);
    expect(factor('Emissions|HFC|HFC134a', 't HFC134a/yr')).toBe(1e-3);
    expect(factor('Emissions|F-Gases', 'Mt CO2-equiv/yr')).toBe(1);
    expect(factor('Emissions|F-Gases', 'kt CO2e/yr')).toBe(1e-3);
  });

  it('case and spacing do not matter: "mt co2 / yr", "Mt CO2 per year"', () => {
    expect(factor('emissions | co2', 'mt co2 / yr')).toBe(1e-3);
    expect(factor('Emissions|CO2', 'Mt CO2 per year')).toBe(1e-3);
  });

  it('refuses a unit without a rate, an unknown prefix or a species the variable does not take, listing the known units', () => {
    const co2 = iamcVariable('Emissions|CO2')!.target;
    for (const unit of ['Mt CO2', 'Mt CH4/yr', 'EJ/yr', 'lb CO2/yr', '']) {
      const r = emissionUnitFactor(unit, co2);
      expect(r.ok, unit).toBe(false);
      if (!r.ok) expect(r.known).toEqual(expect.arrayContaining(['Mt CO2/yr', 'Gt CO2/yr', 'Mt C/yr']));
    }
  });
});

describe('iamcVariable', () => {
  it('maps the template emission variables to our columns (names of DESIGN.md)', () => {
    const column = (v: string) => iamcVariable(v)?.column;
    expect(column('Emissions|CO2')).toBe('co2_gtco2');
    expect(column('Emissions|Sulfur')).toBe('so2_mt');
    expect(column('Emissions|VOC')).toBe('nmvoc_mt');
    expect(column('Emissions|NOx')).toBe('nox_mt');
    expect(column('Emissions|HFC|HFC134a')).toBe('hfc134a_kt');
    expect(column('Emissions|PFC|CF4')).toBe('cf4_kt');
    expect(column('Emissions|SF6')).toBe('sf6_kt');
    expect(column('Emissions|HFC|HFC43-10')).toBe('hfc4310mee_kt');
    expect(column('Emissions|Montreal Gases|CFC|CFC12')).toBe('cfc12_kt');
    expect(column('Emissions|F-Gases')).toBe('fgas_mtco2e');
  });

  it('does not read sectors other than the two CO2 parts, aggregates of halogenated gases, or non-emission variables', () => {
    for (const v of ['Emissions|CO2|Energy', 'Emissions|HFC', 'Emissions|CH4|AFOLU', 'Primary Energy', 'Emissions|CO2|Energy|SF6']) expect(iamcVariable(v), v).toBeUndefined();
    expect(iamcVariable('Emissions|CO2|AFOLU')?.co2Sector).toBe('afolu');
  });
});
