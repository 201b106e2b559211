import type { PathwayColumn } from '../pathway.js';
import { SPECIES_BOUNDS } from './species-bounds.js';

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
    min: -220,
    max: 5000,
    quantity: 'a CH4 emission rate',
    unit: 'Mt CH4 yr-1',
    source:
      'present anthropogenic emissions are about 350-400 Mt CH4 yr-1 (Global Methane Budget; from memory); '
      + 'anthropogenic emissions may be negative (removal) but not below minus the natural flux, 220 Mt CH4 yr-1 '
      + '(the 1750 steady state: 729.2 ppb x 2.75 Mt ppb-1 / 9.1 yr; src/carbon/README.md), or total emissions '
      + 'would be negative; 5000 is about 10 times any scenario (common practice, no source)',
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
  // The forcing bounds below are ours (common practice, no source): several times the widest value of
  // each agent in pathways/history.csv (the IPCC AR6 ERF record; pathways/README.md gives the ranges),
  // wide enough for any scenario we know of, narrow enough that a value in the wrong unit or with a
  // slipped sign or decimal point fails.
  other_ghg_wm2: agentBounds(-1, 5, 'an effective radiative forcing of halogenated and other minor greenhouse gases', 'at most 0.41 W m-2 in the history (2024); 5 W m-2 is over 10 times that'),
  ozone_wm2: agentBounds(-2, 3, 'an ozone effective radiative forcing', 'at most 0.47 W m-2 in the history; 3 W m-2 is over 6 times that'),
  strat_h2o_wm2: agentBounds(-0.5, 1, 'a stratospheric water-vapour effective radiative forcing', 'at most 0.05 W m-2 in the history'),
  contrails_wm2: agentBounds(-0.5, 1, 'a contrail effective radiative forcing', 'at most 0.06 W m-2 in the history'),
  aerosol_ari_wm2: agentBounds(-3, 1, 'an aerosol-radiation effective radiative forcing', 'as low as -0.41 W m-2 in the history; aerosols cool on balance'),
  aerosol_aci_wm2: agentBounds(-4, 1, 'an aerosol-cloud effective radiative forcing', 'as low as -1.13 W m-2 in the history; aerosols cool on balance'),
  bc_snow_wm2: agentBounds(-0.5, 1, 'a black-carbon-on-snow effective radiative forcing', 'at most 0.09 W m-2 in the history'),
  land_use_wm2: agentBounds(-2, 1, 'a land-use effective radiative forcing', 'as low as -0.2 W m-2 in the history'),
  aerosol_wm2: {
    min: -5,
    max: 1,
    quantity: 'an aerosol effective radiative forcing',
    unit: 'W m-2',
    source:
      'low end: about 4 times the strongest aerosol forcing in pathways/history.csv (-1.5 W m-2, ari + aci); high end: '
      + 'aerosols cool on balance, and 1 W m-2 leaves room for a scenario dominated by absorbing aerosol '
      + '(common practice, no source)',
  },
  other_wm2: {
    min: -5,
    max: 10,
    quantity: 'an effective radiative forcing',
    unit: 'W m-2',
    source:
      'the column collects every other agent (ozone, halocarbons, land use, contrails, ...), about 0.95 W m-2 at '
      + 'the end of pathways/history.csv; 10 W m-2 is more than 10 times that and above the ERF of 4 x CO2, '
      + 'and -5 W m-2 leaves room for a deliberate cooling scenario (common practice, no source)',
  },
  solar_wm2: {
    min: -3,
    max: 3,
    quantity: 'a solar effective radiative forcing anomaly (not an irradiance)',
    unit: 'W m-2',
    source:
      'the solar column of pathways/history.csv spans -0.07 to 0.15 W m-2 (IPCC AR6); 3 W m-2 is over 20 times that, '
      + 'room for any grand-minimum or -maximum scenario, and rejects a total irradiance (about 1361 W m-2) '
      + '(common practice, no source)',
  },
  volcanic_wm2: {
    min: -15,
    max: 1,
    quantity: 'a volcanic effective radiative forcing',
    unit: 'W m-2',
    source:
      'low end: the strongest eruption year in pathways/history.csv (Tambora, 1816, in the IPCC AR6 record) '
      + 'is -4.8 W m-2; -15 W m-2 is 3 times that, room for eruptions larger than any in that record; '
      + 'high end: volcanic forcing is measured from the long pre-industrial mean (IPCC AR6), which makes quiet '
      + 'years about +0.2 W m-2 (common practice, no source)',
  },
  ...SPECIES_BOUNDS,
};

/**
 * Says why `value` is not plausible for `column` (outside VALUE_BOUNDS), as an input problem's code,
 * message and expected form; undefined when it is. A negative value where the bound is 0 is "must not
 * be negative". One check for pathway files and scenario tables.
 *
 * @param value in the column's unit
 * @example outOfBounds('co2_gtco2', 40000) // { code: 'input.out-of-range', message: 'must be a plausible value for a CO2 emission rate', expected: 'a value from -100 to 500 Gt CO2 yr-1' }
 */
export function outOfBounds(column: PathwayColumn, value: number): { code: string; message: string; expected: string } | undefined {
  const b = VALUE_BOUNDS[column];
  if (value < 0 && b.min === 0) return { code: 'input.negative', message: `must not be negative: ${b.quantity} cannot be below 0 ${b.unit}`, expected: `a value from 0 to ${b.max} ${b.unit}` };
  if (value >= b.min && value <= b.max) return undefined;
  // An emission a thousand times too large is almost always in the next smaller unit (Mt in a Gt column, kt in a Mt column).
  const massUnit = /^(Gt|Mt|kt)\b/.test(b.unit);
  const thousandth = massUnit && value > b.max && value / 1000 >= b.min && value / 1000 <= b.max;
  const unitHint = thousandth ? `; it looks 1000 times too large: is it in thousandths of ${b.unit} (Mt for Gt, kt for Mt)? Then divide the column by 1000` : '';
  return { code: 'input.out-of-range', message: `must be a plausible value for ${b.quantity}${unitHint}`, expected: `a value from ${b.min} to ${b.max} ${b.unit}` };
}

/** Bounds of a per-agent forcing column (common practice, no source; `why` names the history's extreme). */
function agentBounds(min: number, max: number, quantity: string, why: string): ValueBounds {
  return { min, max, quantity, unit: 'W m-2', source: `${why} (IPCC AR6 record in pathways/history.csv); the bounds leave room for any scenario we know of (common practice, no source)` };
}
