import { PREINDUSTRIAL } from '../forcing/constants.js';
import { EMISSION_COLUMNS, GASES, type Gas, type Pathway } from '../pathway.js';

/**
 * The year of the pre-industrial state every run starts from: the reference year of the AR6
 * concentrations in PREINDUSTRIAL and of all forcing (IPCC AR6 WG1 chapter 7 takes ERF relative to 1750).
 */
const PREINDUSTRIAL_YEAR = 1750;

/** Each gas's pre-industrial concentration as said in the note. */
const PREINDUSTRIAL_TEXT: Record<Gas, string> = {
  co2: `CO2 ${PREINDUSTRIAL.co2Ppm} ppm`,
  ch4: `CH4 ${PREINDUSTRIAL.ch4Ppb} ppb`,
  n2o: `N2O ${PREINDUSTRIAL.n2oPpb} ppb`,
};

/**
 * The note for a run whose first year Y is after 1750 (a pathway run without the history splice):
 * the two-box model starts from rest in Y (zero warming at the surface and in the deep ocean, the
 * pre-industrial equilibrium) whatever that year's forcing, so the warming reached by Y is missing.
 * In a run with emissions, a gas given as emissions in Y starts from its pre-industrial concentration
 * (the carbon cycle and the gas cycles start in their 1750 steady state), and CO2 given as a
 * concentration in Y starts there with the carbon cycle at rest, taking up nothing emitted before.
 *
 * @param pathway - the annual pathway that is run
 * @param options - `subject`: who starts from rest (`the run`, or `each member` for an ensemble);
 *   `forcingWm2`: the total ERF in Y, W m-2, when one value applies to the whole run
 * @returns the note, or undefined when the run starts in 1750 or earlier
 * @example
 * startFromRestNote(mixed2030, { subject: 'the run', forcingWm2: 0.56 })
 * // 'the run starts from rest in 2030: zero warming at the surface and in the deep ocean, as in 1750, whatever
 * //  that year's forcing (0.56 W m-2), so any warming reached before 2030 is missing; ...'
 */
export function startFromRestNote(
  pathway: Pathway,
  options: { subject: string; forcingWm2?: number },
): string | undefined {
  const y = pathway.years[0];
  if (!(y > PREINDUSTRIAL_YEAR)) return undefined;
  const s = pathway.series;
  const forcing = options.forcingWm2 === undefined ? '' : ` (${options.forcingWm2.toFixed(2)} W m-2)`;
  const parts = [
    `${options.subject} starts from rest in ${y}: zero warming at the surface and in the deep ocean, as in ${PREINDUSTRIAL_YEAR}, `
      + `whatever that year's forcing${forcing}, so any warming reached before ${y} is missing`,
  ];
  if (EMISSION_COLUMNS.some((c) => s[c] !== undefined)) {
    const fromEmissions = (Object.keys(GASES) as Gas[]).filter((gas) => Number.isFinite(s[GASES[gas].emission]?.[0]));
    if (fromEmissions.length > 0) {
      const names = fromEmissions.map((g) => g.toUpperCase());
      parts.push(`${joinAnd(names)}, given as emissions, ${fromEmissions.length === 1 ? 'starts' : 'start'} from `
        + `${PREINDUSTRIAL_YEAR} concentrations (${fromEmissions.map((g) => PREINDUSTRIAL_TEXT[g]).join(', ')}), as if nothing had been emitted before ${y}`);
    }
    if (Number.isFinite(s[GASES.co2.concentration]?.[0])) {
      parts.push(`CO2 starts at the file's ${y} concentration with the carbon cycle at rest, taking up nothing emitted before ${y}`);
    }
  }
  parts.push(`spliced onto the history, the run would start from the record in ${PREINDUSTRIAL_YEAR} instead`);
  return parts.join('; ');
}

function joinAnd(words: readonly string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
