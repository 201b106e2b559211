import { diagnoseEmissions } from '../carbon/diagnose-emissions.js';
import { calibrate } from '../climate/calibrate.js';
import type { InputProblem } from '../errors.js';
import type { Pathway } from '../pathway.js';
import type { ParsedPathway } from './parse-pathway.js';

/** Gt CO2 per Gt C: the molar masses 44.01 / 12.011 (rounded to 44/12 = 3.667 in common use). */
const GTCO2_PER_GTC = 44.01 / 12.011;

/**
 * How far the ratio (rate diagnosed from the record) / (first given rate) may stray from 44/12 and
 * still be read as Gt C: within a factor of 1.5 either way (2.4 to 5.5). Common practice, no source:
 * the record's last diagnosed year is itself uncertain by tens of per cent (one year's growth rate),
 * while a real pathway does not fall to a third of today's emissions from one year to the next.
 */
const RATIO_TOLERANCE = 1.5;

/**
 * Beyond the Gt C band, how far the first given rate may stray from the record's before it is taken
 * for another unit or another scope (common practice, no source): a global pathway that starts within
 * JUMP_CHECK_YEARS of the record does not start at more than 3 times today's global CO2 (Mt typed in a
 * Gt column; a country's Mt) nor at less than 1/5.5 of it (a country's or a sector's emissions,
 * which warmcast, a global model, would read as the world's). A first value of zero or below (an
 * immediate stop, net removals) is not checked.
 */
const JUMP_UP_LIMIT = 3;
const JUMP_CHECK_YEARS = 5;

/** The metadata line that says a CO2 jump at the join is meant (`# co2-jump: intended`). */
export const CO2_JUMP_METADATA = 'co2-jump';

/**
 * Catches CO2 emissions typed in Gt C under the `co2_gtco2` column (Gt CO2 per year), and, for a
 * file that starts within JUMP_CHECK_YEARS of the record, a first value more than JUMP_UP_LIMIT
 * times the record's (Mt typed as Gt) or below 1/5.5 of it (a country's or a sector's emissions). The first
 * value the file gives after the history is compared with the CO2 emission rate diagnosed from the
 * history's concentrations for the year before (the carbon cycle run backwards over the record, at
 * warmcast's default ECS 3 K and TCR 1.8 K: the diagnosed rate depends only weakly on them through
 * the carbon-climate feedback). When the diagnosed rate is larger by a factor near 44/12 (between
 * 44/12 / 1.5 and 44/12 x 1.5), the file is almost certainly in Gt C, and the run would start
 * with an emission cut of about 70 % in one year without saying so.
 *
 * Nothing is checked when the file gives no `co2_gtco2`, was not spliced onto the history, or says
 * the jump is meant (`# co2-jump: intended` in the file, or `intended: true` from the command line).
 *
 * @param parsed - the file as read (for its name and line numbers)
 * @param pathway - the spliced pathway a run uses (history, then the file's annual values)
 * @param history - the bundled history it was spliced onto
 * @param intended - the user said the jump is meant
 * @returns the problem to report (file, line of the row behind the first future value, column), or undefined
 * @example
 * const problem = co2UnitProblem(parsed, spliced, loadHistory(), false);
 * problem?.message // 'must be in Gt CO2 per year, but the first value after the history (11.35 for 2025) is 1/4.09 of ...'
 */
export function co2UnitProblem(parsed: ParsedPathway, pathway: Pathway, history: Pathway, intended: boolean): InputProblem | undefined {
  const given = pathway.series.co2_gtco2;
  const joinYear = pathway.provenance.spliceYear;
  if (intended || given === undefined || parsed.columns.co2_gtco2 === undefined || joinYear === undefined) return undefined;
  if (/^intended$/i.test(parsed.metadata[CO2_JUMP_METADATA] ?? '')) return undefined;
  const lastHistoryYear = pathway.provenance.historyLastYear ?? joinYear - 1;
  const upTo = history.years.findIndex((y) => y > lastHistoryYear);
  const count = upTo < 0 ? history.years.length : upTo;
  if (count < 2 || history.series.co2_ppm === undefined) return undefined;

  const record: Pathway = {
    ...history,
    years: history.years.subarray(0, count),
    series: Object.fromEntries(Object.entries(history.series).map(([k, v]) => [k, v.subarray(0, count)])),
  };
  const params = calibrate();
  const { emissions } = diagnoseEmissions(record, params, { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 } });
  const diagnosedYear = record.years[count - 1];
  const diagnosed = emissions.series.co2_gtco2![count - 1];

  const at = pathway.years.indexOf(joinYear);
  const first = at < 0 ? NaN : given[at];
  if (!(first > 0 && diagnosed > 0)) return undefined;
  const ratio = diagnosed / first;
  // The row behind the first future value: the first row at or after the join year (rows may be 5-yearly).
  let row = parsed.times.findIndex((t) => t >= joinYear - 0.5);
  if (row < 0) row = 0;
  const f = (x: number) => x.toFixed(2);
  const intendedHint = 'if the jump is meant, add the line "# co2-jump: intended" to the file or give --co2-jump-intended';
  const gtc = ratio >= GTCO2_PER_GTC / RATIO_TOLERANCE && ratio <= GTCO2_PER_GTC * RATIO_TOLERANCE;
  if (!gtc) {
    if (joinYear - diagnosedYear > JUMP_CHECK_YEARS) return undefined;
    const up = first > JUMP_UP_LIMIT * diagnosed;
    const down = ratio > GTCO2_PER_GTC * RATIO_TOLERANCE;
    if (!up && !down) return undefined;
    const times = up ? `${(first / diagnosed).toFixed(1)} times` : `1/${ratio.toFixed(1)} of`;
    return {
      file: parsed.file,
      line: parsed.rowLines[row],
      column: 'co2_gtco2',
      code: up ? 'input.co2-jump-up' : 'input.co2-jump-down',
      message: `must be the world's net CO2 in Gt CO2 per year, but the first value after the history (${f(first)} for ${joinYear}) is ${times} `
        + `the ${f(diagnosed)} Gt CO2 the record implies for ${diagnosedYear}: `
        + (up
          ? 'the column looks like Mt CO2 (divide by 1000) or another quantity'
          : "the column looks like a country's or a sector's emissions, or kt/Mt typed as Gt; warmcast projects global-mean warming from global emissions"),
      value: String(parsed.columns.co2_gtco2[row]),
      expected: `global net CO2 in Gt CO2 per year, near ${f(diagnosed)} in ${diagnosedYear}; ${intendedHint}`,
    };
  }

  return {
    file: parsed.file,
    line: parsed.rowLines[row],
    column: 'co2_gtco2',
    code: 'input.co2-in-gtc',
    message: `must be in Gt CO2 per year, but the first value after the history (${f(first)} for ${joinYear}) is 1/${ratio.toFixed(2)} `
      + `of the ${f(diagnosed)} Gt CO2 the record implies for ${diagnosedYear}, near 12/44: the column looks like Gt C. `
      + `Multiply it by 44/12 = 3.664 (${f(first)} Gt C is ${f(first * GTCO2_PER_GTC)} Gt CO2)`,
    value: String(parsed.columns.co2_gtco2[row]),
    expected: `Gt CO2 per year; ${intendedHint}`,
  };
}
