// Why not a package such as `parse-json` (8.3.0): it passes on the engine's message, whose wording
// changes between Node versions, with a position and a code frame; the plain-word diagnoses below
// (a comma before }, single quotes, the line where an unclosed object opened) are what a params file's
// author needs, and it would add three dependencies for less.

/** Where a text stops being JSON and why, in plain words. */
export interface JsonSyntaxError {
  /** 0-based index of the offending character in the text (its length when the text ends too soon). */
  index: number;
  /** 1-based line of that character (lines end at LF). */
  line: number;
  /** 1-based column of that character on its line, in characters. */
  column: number;
  /** What is wrong, e.g. `expected , or } after the value of "ecs_k"`. */
  message: string;
}

/**
 * Finds the first syntax error of a JSON text (RFC 8259), for messages that say where and what is
 * wrong in plain words: the engine's own (`Expected ',' or '}' after property value in JSON at
 * position 13`) gives only a character offset, and some of its messages give none. The scan is
 * iterative, so deep nesting cannot overflow the stack.
 *
 * @param text - the JSON text (without a byte-order mark)
 * @returns the first error, or undefined when the text is valid JSON
 * @example
 * jsonSyntaxError('{"ecs_k": 3\n') // { index: 12, line: 2, column: 1, message: 'the text ends inside the object opened at line 1, column 1: a } is missing' }
 * jsonSyntaxError('{"ecs_k": 3}') // undefined
 */
export function jsonSyntaxError(text: string): JsonSyntaxError | undefined {
  const n = text.length;
  let i = 0;
  /** Open objects and arrays, innermost last, with where each opened and the key being read. */
  const open: { kind: '{' | '['; at: number; key?: string }[] = [];
  const fail = (index: number, message: string): JsonSyntaxError => ({ index, ...lineAndColumn(text, index), message });
  const skipSpace = () => {
    while (i < n && (text[i] === ' ' || text[i] === '\t' || text[i] === '\n' || text[i] === '\r')) i++;
  };
  const where = (at: number) => {
    const { line, column } = lineAndColumn(text, at);
    return `line ${line}, column ${column}`;
  };
  const endInside = () => {
    const top = open[open.length - 1];
    const name = top.kind === '{' ? 'object' : 'array';
    return fail(n, `the text ends inside the ${name} opened at ${where(top.at)}: a ${top.kind === '{' ? '}' : ']'} is missing`);
  };
  const after = () => {
    const top = open[open.length - 1];
    return top.kind === '{' ? `the value of "${top.key}"` : 'an array element';
  };

  skipSpace();
  if (i === n) return fail(0, 'the text is empty or only blank: a JSON object was expected');
  let state: 'value' | 'key' | 'after' = 'value';
  for (;;) {
    if (state === 'value') {
      skipSpace();
      if (i === n) return open.length > 0 ? endInside() : fail(n, 'the text ends where a value was expected');
      const c = text[i];
      if (c === '{' || c === '[') {
        open.push({ kind: c, at: i });
        i++;
        skipSpace();
        if (i < n && text[i] === (c === '{' ? '}' : ']')) {
          open.pop();
          i++;
          state = 'after';
        } else {
          state = c === '{' ? 'key' : 'value';
        }
        continue;
      }
      const problem = c === '"' ? readString() : c === '-' || isDigit(c) ? readNumber() : readWord();
      if (problem) return problem;
      state = 'after';
    } else if (state === 'key') {
      skipSpace();
      if (i === n) return endInside();
      const c = text[i];
      if (c === '}') return fail(i, 'a comma before } (JSON allows no comma after the last entry)');
      if (c !== '"') {
        return fail(i, c === "'" ? 'keys take double quotes, not single quotes' : 'expected a key in double quotes, such as "ecs_k"');
      }
      const start = i;
      const problem = readString();
      if (problem) return problem;
      open[open.length - 1].key = text.slice(start + 1, i - 1);
      skipSpace();
      if (i === n) return endInside();
      if (text[i] !== ':') return fail(i, `expected : after the key "${open[open.length - 1].key}"`);
      i++;
      state = 'value';
    } else {
      skipSpace();
      if (open.length === 0) return i === n ? undefined : fail(i, 'unexpected text after the end of the JSON value (one object per file)');
      if (i === n) return endInside();
      const top = open[open.length - 1];
      const close = top.kind === '{' ? '}' : ']';
      const c = text[i];
      if (c === close) {
        open.pop();
        i++;
        continue;
      }
      if (c !== ',') return fail(i, `expected , or ${close} after ${after()}`);
      i++;
      if (top.kind === '{') {
        state = 'key';
      } else {
        skipSpace();
        if (i < n && text[i] === ']') return fail(i, 'a comma before ] (JSON allows no comma after the last element)');
        state = 'value';
      }
    }
  }

  /** Reads a string starting at its opening quote; leaves i after the closing quote. */
  function readString(): JsonSyntaxError | undefined {
    const start = i;
    i++;
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c === 0x22) {
        i++;
        return undefined;
      }
      if (c < 0x20) {
        return fail(i, `the string opened at ${where(start)} is not closed on its line (a " is missing, or a tab or line break needs writing as \\t or \\n)`);
      }
      if (c === 0x5c) {
        const e = text[i + 1];
        if (e === 'u') {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) return fail(i, '\\u must be followed by four hexadecimal digits');
          i += 6;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) {
          i += 2;
        } else {
          return fail(i, `\\${e ?? ''} is not a JSON escape (a backslash is written \\\\)`);
        }
        continue;
      }
      i++;
    }
    return fail(n, `the text ends inside the string opened at ${where(start)}: a closing " is missing`);
  }

  /** Reads a number (-?(0|[1-9]d*)(.d+)?([eE][+-]?d+)?); leaves i after it. */
  function readNumber(): JsonSyntaxError | undefined {
    if (text[i] === '-') {
      i++;
      if (!isDigit(text[i])) return fail(i, 'expected a digit after the minus sign');
    }
    if (text[i] === '0') {
      i++;
      if (isDigit(text[i])) return fail(i - 1, 'a number must not start with 0 followed by more digits (write 3, not 03)');
    } else {
      while (isDigit(text[i])) i++;
    }
    if (text[i] === '.') {
      i++;
      if (!isDigit(text[i])) return fail(i, 'expected a digit after the decimal point (write 3.0 or 3, not 3.)');
      while (isDigit(text[i])) i++;
    }
    if (text[i] === 'e' || text[i] === 'E') {
      i++;
      if (text[i] === '+' || text[i] === '-') i++;
      if (!isDigit(text[i])) return fail(i, 'expected a digit in the exponent (such as 1e3)');
      while (isDigit(text[i])) i++;
    }
    return undefined;
  }

  /** Reads true, false or null; anything else is not a value. */
  function readWord(): JsonSyntaxError | undefined {
    const word = /^[A-Za-z_][A-Za-z0-9_]*/.exec(text.slice(i, i + 64))?.[0];
    if (word === 'true' || word === 'false' || word === 'null') {
      i += word.length;
      return undefined;
    }
    if (text[i] === "'") return fail(i, 'text takes double quotes, not single quotes');
    if (text[i] === '.') return fail(i, 'a number must start with a digit (write 0.5, not .5)');
    if (text[i] === '+') return fail(i, 'a number must not start with + (write 5, not +5)');
    if (word === 'NaN' || word === 'Infinity') return fail(i, `${word} is not a JSON value: give a finite number`);
    if (word !== undefined) return fail(i, `${word} is not a JSON value (text takes double quotes; the words JSON knows are true, false and null)`);
    return fail(i, `expected a value (a number, "text", true, false, null, an object or an array), found ${describeChar(text[i])}`);
  }
}

function isDigit(c: string | undefined): boolean {
  return c !== undefined && c >= '0' && c <= '9';
}

function describeChar(c: string): string {
  return /\s/.test(c) ? `the character U+${c.charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}` : c;
}

function lineAndColumn(text: string, index: number): { line: number; column: number } {
  let line = 1;
  let lineStart = 0;
  for (let k = 0; k < index && k < text.length; k++) {
    if (text.charCodeAt(k) === 10) {
      line++;
      lineStart = k + 1;
    }
  }
  return { line, column: index - lineStart + 1 };
}
