import type { PathwayColumn } from '../pathway.js';

/** The plausible range of one pathway column, with the reason for each end. */
export interface ValueBounds {
  /** Smallest accepted value, in the column's unit. */
  min: number;
  /** Largest accepted value, in the column's unit. */
  max: number;
  /** What the column holds, used in "must be" messages ("a CO2 concentration"). */
  quantity: string;
  /** Unit as printed in messages. */
  unit: string;
  /** Where the bounds come from, marked "from memory" or "common practice, no source". */
  source: string;
}

/**
 * Physically plausible bounds for every pathway column. They are wide on purpose: they exist to catch
 * unit and typing mistakes (CH4 in ppm instead of ppb, a total solar irradiance of 1361 W m-2 in a
 * forcing column, emissions in Mt instead of Gt), not to judge a scenario. A value outside its range
 * is an input error; the bounds are inclusive.
 *
 * @example
 * VALUE_BOUNDS.co2_ppm // { min: 100, max: 5000, quantity: 'a CO2 concentration', unit: 'ppm', ... }
 */
export const VALUE_BOUNDS: Readonly<Record<PathwayColumn, ValueBounds>> = {
  co2_ppm: {
    min: 100,
    max: 5000,
    quantity: 'a CO2 concentration',
    unit: 'ppm',
    source:
      'low end: glacial ice-core minima are about 172-180 ppm (Luthi et al. 2008, EPICA Dome C; from memory), '
      + 'so 100 ppm leaves margin; high end: about 4.5 doublings above 278 ppm, beyond any assessed scenario '
      + '(common practice, no source)',
  },
  ch4_ppb: {
    min: 100,
    max: 20_000,
    quantity: 'a CH4 concentration',
    unit: 'ppb',
    source:
      'low end: glacial values are about 350 ppb (ice cores; from memory); high end: about 10 times the '
      + 'highest 2100 scenario value of roughly 3500-4000 ppb (from memory); a value in ppm (1.9) fails the '
      + 'low end (common practice, no source)',
  },
  n2o_ppb: {
    min: 100,
    max: 3000,
    quantity: 'an N2O concentration',
    unit: 'ppb',
    source:
      'low end: glacial values are about 200 ppb (ice cores; from memory); high end: about 7 times the '
      + 'highest 2100 scenario value of roughly 430 ppb (from memory)',
  },
  co2_gtco2: {
    min: -100,
    max: 500,
    quantity: 'a CO2 emission rate',
    unit: 'Gt CO2 yr-1',
    source:
      'present total emissions are about 40 Gt CO2 yr-1 (Global Carbon Budget; from memory); negative values '
      + 'are net removals, and the deepest assessed net removals are a few tens of Gt CO2 yr-1 (from memory); '
      + 'a value in Mt CO2 (40000) fails the high end (common practice, no source)',
  },
  ch4_mt: {
    min: 0,
    max: 5000,
    quantity: 'a CH4 emission rate',
    unit: 'Mt CH4 yr-1',
    source:
      'present anthropogenic emissions are about 350-400 Mt CH4 yr-1 (Global Methane Budget; from memory); '
      + 'an emission rate cannot be negative; 5000 is about 10 times any scenario (common practice, no source)',
  },
  n2o_mt: {
    min: 0,
    max: 200,
    quantity: 'an N2O emission rate',
    unit: 'Mt N2O yr-1',
    source:
      'present total emissions are about 27 Mt N2O yr-1 (17 Tg N yr-1, Global N2O Budget; from memory); '
      + 'an emission rate cannot be negative; 200 is about 7 times present (common practice, no source)',
  },
  aerosol_wm2: forcingBounds('an aerosol effective radiative forcing'),
  other_wm2: forcingBounds('an effective radiative forcing'),
  solar_wm2: forcingBounds('a solar effective radiative forcing anomaly (not an irradiance)'),
  volcanic_wm2: forcingBounds('a volcanic effective radiative forcing'),
};

function forcingBounds(quantity: string): ValueBounds {
  return {
    min: -50,
    max: 50,
    quantity,
    unit: 'W m-2',
    source:
      'the largest annual-mean volcanic forcings of the last millennia are of order -10 to -30 W m-2 and the '
      + 'ERF of 4 x CO2 is about 8 W m-2 (from memory); 50 W m-2 rejects an irradiance (1361 W m-2) or '
      + 'mW m-2 entered by mistake (common practice, no source)',
  };
}
