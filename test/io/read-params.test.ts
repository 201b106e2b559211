import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { parseParams } from '../../src/io/read-params.js';

/** The message parseParams throws for `text`, or a failure when it accepts it. */
function messageOf(text: string): string {
  try {
    parseParams(text, 'p.json');
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).message;
  }
  return expect.fail(`accepted ${text}`);
}

describe('parseParams', () => {
  it('parseParams reads any subset of the DESIGN.md keys into calibration inputs', () => {
    expect(parseParams('{"ecs_k": 3.5, "co2_formula": "log"}', 'p.json')).toEqual({ ecsK: 3.5, co2Formula: 'log' });
  });

  it('parseParams names a JSON key as key "x" (not column "x"), with its line', () => {
    expect(messageOf('{\n  "ecs_k": 3,\n  "ecs": 4\n}\n')).toBe(
      'p.json:3: key "ecs": is not a parameter; did you mean "ecs_k"? (expected one of ecs_k, tcr_k, upper_heat_capacity, deep_heat_capacity, feedback_wm2k, exchange_wm2k, deep_efficacy, forcing_2x_wm2, co2_formula)',
    );
  });

  it('parseParams says where invalid JSON breaks (line and column) and what is wrong in plain words, not the engine\'s message', () => {
    expect(messageOf('{"ecs_k": "3"\n')).toBe('p.json:2: is not valid JSON at column 1: the text ends inside the object opened at line 1, column 1: a } is missing');
    expect(messageOf('\uFEFF{\n  "ecs_k": 3\n  "tcr_k": 1.8\n}\n')).toBe('p.json:3: is not valid JSON at column 3: expected , or } after the value of "ecs_k"');
    expect(messageOf('{"ecs_k": 3,}')).not.toMatch(/position|Expected/);
  });

  it('parseParams shows a wrong value as the JSON it is: got "3.0" for text, got null, got true, never doubled quotes', () => {
    expect(messageOf('{"ecs_k": "3.0"}')).toBe('p.json:1: key "ecs_k": must be a number (got "3.0"; expected a number such as 3.0)');
    expect(messageOf('{"deep_efficacy": null}')).toContain('key "deep_efficacy": must be a number (got null;');
    expect(messageOf('{"tcr_k": true}')).toContain('(got true;');
    expect(messageOf('{"co2_formula": "linear"}')).toContain('key "co2_formula": must be "ar6" or "log" (got "linear";');
    expect(messageOf('{"ecs_k": "x", "co2_formula": 5}')).not.toContain('""');
  });
});
