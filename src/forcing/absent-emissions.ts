import { ConfigError } from '../errors.js';

/**
 * What an emission pathway assumes for the short-lived precursors and halogenated gases it does
 * not give, from the first year of the file on. Each absent species starts at its present-day level
 * (the join) and then:
 * - `hold`: stays at that level;
 * - `follow-co2`: scales with the file's CO2 emissions relative to the first year (never below 0),
 *   as emissions from the same combustion would;
 * - `zero-by`: falls linearly to zero at `year` and stays there.
 */
export type AbsentEmissionsRule =
  | { kind: 'hold' }
  | { kind: 'follow-co2' }
  | { kind: 'zero-by'; year: number };

/** The choices, as written on the command line, for messages. */
export const ABSENT_EMISSIONS_CHOICES = ['hold', 'follow-co2', 'zero-by-YEAR'] as const;

/**
 * Reads a rule as written on the command line: `hold`, `follow-co2` or `zero-by-YEAR` (`zero-by-2050`).
 * @throws ConfigError naming the choices for anything else
 * @example parseAbsentEmissionsRule('zero-by-2050') // { kind: 'zero-by', year: 2050 }
 */
export function parseAbsentEmissionsRule(text: string): AbsentEmissionsRule {
  const t = text.trim().toLowerCase();
  if (t === 'hold') return { kind: 'hold' };
  if (t === 'follow-co2') return { kind: 'follow-co2' };
  const m = /^zero-by-(\d{4})$/.exec(t);
  if (m) return { kind: 'zero-by', year: Number(m[1]) };
  throw new ConfigError(
    `--absent-emissions must be one of ${ABSENT_EMISSIONS_CHOICES.join(', ')} (for example zero-by-2060), got "${text}"`,
    'absent-emissions',
  );
}

/**
 * A rule in words, for the headline block and the files' provenance.
 * @example describeAbsentEmissionsRule({ kind: 'zero-by', year: 2060 }) // 'fall linearly from the join to zero in 2060'
 */
export function describeAbsentEmissionsRule(rule: AbsentEmissionsRule): string {
  switch (rule.kind) {
    case 'hold':
      return 'held at present-day levels';
    case 'follow-co2':
      return "follow the file's CO2 emissions relative to its first year";
    case 'zero-by':
      return `fall linearly from the join to zero in ${rule.year}`;
  }
}

/**
 * The factor r(t) applied to a species' present-day emissions under a rule, one per year.
 *
 * @param rule the assumption
 * @param years the file's years (consecutive)
 * @param co2Gtco2 the file's CO2 emissions, needed by `follow-co2`
 * @throws ConfigError when `follow-co2` has no CO2 emissions to follow, or they are not positive in
 *   the first year; when `zero-by` names a year before the first
 */
export function absentEmissionsFactor(rule: AbsentEmissionsRule, years: Float64Array, co2Gtco2?: Float64Array): Float64Array {
  const n = years.length;
  const r = new Float64Array(n);
  switch (rule.kind) {
    case 'hold':
      return r.fill(1);
    case 'follow-co2': {
      if (!co2Gtco2) throw new ConfigError('--absent-emissions follow-co2 needs a co2_gtco2 column to follow; choose hold or zero-by-YEAR', 'absent-emissions');
      const first = co2Gtco2[0];
      if (!(first > 0)) {
        throw new ConfigError(`--absent-emissions follow-co2 needs positive CO2 emissions in the first year (${years[0]}: ${first} Gt CO2); choose hold or zero-by-YEAR`, 'absent-emissions');
      }
      for (let k = 0; k < n; k++) r[k] = Math.max(0, co2Gtco2[k]) / first;
      return r;
    }
    case 'zero-by': {
      const y0 = years[0];
      if (!(rule.year > y0)) throw new ConfigError(`--absent-emissions zero-by-${rule.year} must name a year after the file's first year, ${y0}`, 'absent-emissions');
      for (let k = 0; k < n; k++) r[k] = Math.max(0, 1 - (years[k] - y0) / (rule.year - y0));
      return r;
    }
  }
}
