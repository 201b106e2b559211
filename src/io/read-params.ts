import type { CalibrationTargets } from '../climate/calibrate.js';
import { PARAM_KEYS, type ClimateParamsJson } from '../climate/params.js';
import { InputError, type InputProblem } from '../errors.js';
import { jsonSyntaxError } from './json-syntax-error.js';
import { nearestName } from './nearest-name.js';

const NUMBER_KEYS = Object.keys(PARAM_KEYS).filter((k) => k !== 'co2_formula') as Exclude<keyof ClimateParamsJson, 'co2_formula'>[];
const FORMULAS = ['ar6', 'log'] as const;

/**
 * Reads a parameters JSON file (the keys of DESIGN.md, any subset; the rest take their defaults).
 * Every problem is collected: invalid JSON (its line and column and what is wrong, in plain words:
 * see jsonSyntaxError), a top level that is not an
 * object, unknown keys (with the nearest known key suggested), values of the wrong type.
 * Physical plausibility (positive heat capacities, TCR below ECS) is checked by `calibrate`.
 *
 * @param text file contents
 * @param file path, for messages
 * @returns the given parameters as calibration inputs
 * @throws InputError listing every problem, each with file, line and key
 * @example parseParams('{"ecs_k": 3.5}', 'p.json') // { ecsK: 3.5 }
 */
export function parseParams(text: string, file: string): CalibrationTargets {
  let data: unknown;
  const json = text.replace(/^\uFEFF/, '');
  try {
    data = JSON.parse(json);
  } catch (e) {
    const expected = 'a JSON object such as {"ecs_k": 3.0, "tcr_k": 1.8}';
    const syntax = jsonSyntaxError(json);
    if (syntax) {
      // The message says what was expected there; the whole-file example would only repeat it.
      throw new InputError([{ file, line: syntax.line, code: 'input.bad-json', message: `is not valid JSON at column ${syntax.column}: ${syntax.message}` }]);
    }
    // Not expected: the engine refused what the scanner accepts. Its own words are the best there are.
    const message = (e as Error).message;
    const pos = /position (\d+)/.exec(message);
    const line = pos ? lineOf(json, Number(pos[1])) : undefined;
    throw new InputError([{ file, line, code: 'input.bad-json', message: 'is not valid JSON', value: message, expected }]);
  }
  if (typeof data !== 'object' || data === null || Array.isArray(data)) {
    throw new InputError([{ file, line: 1, code: 'input.bad-json', message: 'must hold one JSON object', expected: 'an object such as {"ecs_k": 3.0}' }]);
  }
  const problems: InputProblem[] = [];
  const out: CalibrationTargets = {};
  for (const [key, value] of Object.entries(data)) {
    const line = lineOfKey(text, key);
    if (!(key in PARAM_KEYS)) {
      const near = nearestName(key, Object.keys(PARAM_KEYS));
      problems.push({
        file, line, key, code: 'input.unknown-key',
        message: `is not a parameter${near ? `; did you mean "${near}"?` : ''}`,
        expected: `one of ${Object.keys(PARAM_KEYS).join(', ')}`,
      });
      continue;
    }
    const field = PARAM_KEYS[key as keyof ClimateParamsJson];
    if (key === 'co2_formula') {
      if (typeof value === 'string' && (FORMULAS as readonly string[]).includes(value)) out.co2Formula = value as (typeof FORMULAS)[number];
      else problems.push({ file, line, key, code: 'input.bad-value', message: 'must be "ar6" or "log"', literal: JSON.stringify(value), expected: '"ar6" (Meinshausen et al. 2020 with AR6 adjustment) or "log" (Myhre et al. 1998)' });
    } else if (typeof value === 'number' && Number.isFinite(value)) {
      (out as Record<string, number>)[field] = value;
    } else {
      problems.push({ file, line, key, code: 'input.bad-type', message: 'must be a number', literal: JSON.stringify(value), expected: 'a number such as 3.0' });
    }
  }
  if (problems.length > 0) throw new InputError(problems);
  return out;
}

/** The JSON keys `parseParams` accepts, numeric ones first. */
export const PARAMS_FILE_KEYS = [...NUMBER_KEYS, 'co2_formula'] as const;

function lineOf(text: string, index: number): number {
  let line = 1;
  for (let i = 0; i < index && i < text.length; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
}

function lineOfKey(text: string, key: string): number | undefined {
  const i = text.indexOf(JSON.stringify(key));
  return i < 0 ? undefined : lineOf(text, i);
}
