import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonSyntaxError } from '../../src/io/json-syntax-error.js';

/** Whether the engine's own parser accepts the text: the reference the scanner must agree with. */
const engineAccepts = (text: string) => {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
};

describe('jsonSyntaxError', () => {
  it('jsonSyntaxError is undefined for valid JSON, nested and with every kind of value', () => {
    for (const text of ['{}', '[]', ' {"a": [1, -2.5e-3, "x\\u00e9\\n", true, false, null, {"b": {}}]} \n', '3', '"s"']) {
      expect(jsonSyntaxError(text)).toBeUndefined();
    }
  });

  it('jsonSyntaxError of a file that ends inside an object points at the end and at where the object opened', () => {
    expect(jsonSyntaxError('{"ecs_k": "3"\n')).toEqual({
      index: 14, line: 2, column: 1,
      message: 'the text ends inside the object opened at line 1, column 1: a } is missing',
    });
  });

  it('jsonSyntaxError gives the line and column of a missing comma, and names the key before it', () => {
    expect(jsonSyntaxError('{\n  "ecs_k": 3\n  "tcr_k": 1.8\n}\n')).toEqual({
      index: 17, line: 3, column: 3, message: 'expected , or } after the value of "ecs_k"',
    });
  });

  it('jsonSyntaxError says in plain words what common slips are', () => {
    const message = (text: string) => jsonSyntaxError(text)?.message;
    expect(message('{"ecs_k": 3,}')).toBe('a comma before } (JSON allows no comma after the last entry)');
    expect(message("{'ecs_k': 3}")).toBe('keys take double quotes, not single quotes');
    expect(message('{ecs_k: 3}')).toBe('expected a key in double quotes, such as "ecs_k"');
    expect(message('{"ecs_k" 3}')).toBe('expected : after the key "ecs_k"');
    expect(message('{"ecs_k": 3.}')).toBe('expected a digit after the decimal point (write 3.0 or 3, not 3.)');
    expect(message('{"ecs_k": NaN}')).toBe('NaN is not a JSON value: give a finite number');
    expect(message('{"a": 1} {"b": 2}')).toBe('unexpected text after the end of the JSON value (one object per file)');
    expect(message('')).toBe('the text is empty or only blank: a JSON object was expected');
  });

  it('jsonSyntaxError agrees with JSON.parse on which texts are valid (property, texts built from JSON\'s own characters)', () => {
    const pieces = ['{', '}', '[', ']', ',', ':', '"', '"a"', '"ecs_k"', ' ', '\n', '0', '1', '3.5', '-', '.', 'e', '+', 'true', 'null', 'x', "'", '\\', '\\u12', '01', '\t'];
    fc.assert(fc.property(fc.array(fc.constantFrom(...pieces), { maxLength: 14 }), (parts) => {
      const text = parts.join('');
      expect(jsonSyntaxError(text) === undefined).toBe(engineAccepts(text));
    }), { numRuns: 3000 });
  });

  it('jsonSyntaxError agrees with JSON.parse on valid JSON with one character deleted or inserted (property)', () => {
    fc.assert(fc.property(fc.json(), fc.nat(), fc.constantFrom('', ',', '}', ']', '"', ':', '0', ' ', '.', '-'), (json, at, inserted) => {
      const k = json.length === 0 ? 0 : at % json.length;
      const text = json.slice(0, k) + inserted + json.slice(k + (inserted === '' ? 1 : 0));
      const error = jsonSyntaxError(text);
      expect(error === undefined).toBe(engineAccepts(text));
      if (error) expect(error.index).toBeLessThanOrEqual(text.length);
    }), { numRuns: 3000 });
  });

  it('jsonSyntaxError handles nesting far deeper than the call stack allows (it does not recurse)', () => {
    const deep = '['.repeat(200_000);
    expect(jsonSyntaxError(deep)?.message).toBe('the text ends inside the array opened at line 1, column 200000: a ] is missing');
  });
});
