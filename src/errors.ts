/**
 * warmcast's one error hierarchy. Each error carries a stable `code` and the process exit code the
 * CLI uses for it (0 ok, 1 internal or numerical failure, 2 bad input or options). Only `cli/`
 * catches errors and turns them into exit codes.
 */
export class WarmcastError extends Error {
  /** Stable machine-readable code, e.g. `input.bad-number`. */
  readonly code: string;
  /** Exit code the CLI returns for this error. */
  readonly exitCode: number;

  constructor(message: string, code: string, exitCode: number) {
    super(message);
    this.name = new.target.name;
    this.code = code;
    this.exitCode = exitCode;
  }
}

/** Where in an input file a problem sits. Lines are 1-based and count comment lines. */
export interface InputLocation {
  /** File path as the user gave it (or a bundled pathway's name). */
  file: string;
  /** 1-based physical line number in the file, comment and blank lines included. */
  line?: number;
  /** Column name as written in the header (or a 1-based column number when there is no name). */
  column?: string;
  /** Key of a JSON object (a parameters file), as written. */
  key?: string;
  /** Worksheet of a spreadsheet (an .xlsx scenario table); `line` is then its row number. */
  sheet?: string;
  /** Model, scenario and variable of a scenario table's row (IAMC layout), as written. */
  model?: string;
  scenario?: string;
  variable?: string;
}

/** One problem found in an input file. */
export interface InputProblem extends InputLocation {
  /** Stable code such as `input.bad-number` or `input.unknown-column`. */
  code: string;
  /** What is wrong, in words, without the location (the location is formatted separately). */
  message: string;
  /** The offending text, when there is one (shown in double quotes). */
  value?: string;
  /**
   * The offending value in the file's own notation, shown as written instead of `value`: JSON
   * `"3.0"`, `null` or `[1, 2]`, where added quotes would hide whether it was text.
   */
  literal?: string;
  /** The expected form, e.g. "a number such as 415.2". */
  expected?: string;
}

/**
 * Formats one problem as `file:line: column "x": message (got "v"; expected ...)`; a JSON problem
 * names its `key "x"` instead, and a `literal` is shown as written (`got "3.0"`, `got null`). A
 * scenario table's problem adds its sheet (`file [sheet "data"] row 12:`) and the row's model,
 * scenario and variable.
 */
export function formatInputProblem(p: InputProblem): string {
  let where = p.file;
  if (p.sheet !== undefined) where += ` [sheet "${p.sheet}"]${p.line !== undefined ? ` row ${p.line}` : ''}`;
  else if (p.line !== undefined) where += `:${p.line}`;
  let text = `${where}: `;
  if (p.column !== undefined) text += `column "${p.column}": `;
  if (p.key !== undefined) text += `key "${p.key}": `;
  const row = [p.model !== undefined ? `model "${p.model}"` : '', p.scenario !== undefined ? `scenario "${p.scenario}"` : '', p.variable !== undefined ? `variable "${p.variable}"` : ''].filter(Boolean);
  if (row.length > 0) text += `${row.join(', ')}: `;
  text += p.message;
  const extras: string[] = [];
  if (p.literal !== undefined) extras.push(`got ${shorten(p.literal)}`);
  else if (p.value !== undefined) extras.push(`got "${shorten(p.value)}"`);
  if (p.expected !== undefined) extras.push(`expected ${p.expected}`);
  if (extras.length > 0) text += ` (${extras.join('; ')})`;
  return text;
}

function shorten(text: string): string {
  return text.length > 60 ? text.slice(0, 57) + '...' : text;
}

/** Bad input file or bad values in it. Holds every problem found, not only the first. Exit code 2. */
export class InputError extends WarmcastError {
  readonly problems: InputProblem[];

  constructor(problems: InputProblem[]) {
    const first = problems[0];
    const more = problems.length > 1 ? `\n${problems.slice(1).map(formatInputProblem).join('\n')}` : '';
    super(formatInputProblem(first) + more, first.code, 2);
    this.problems = problems;
  }
}

/** Bad options or parameters (unknown key, wrong type, unphysical value). Exit code 2. */
export class ConfigError extends WarmcastError {
  /** The option or parameter at fault, e.g. `deep_heat_capacity`. */
  readonly parameter?: string;

  constructor(message: string, parameter?: string, code = 'config.invalid') {
    super(message, code, 2);
    this.parameter = parameter;
  }
}

/** A numerical method failed (no convergence, step limit, non-finite state). Exit code 1. */
export class NumericalError extends WarmcastError {
  constructor(message: string, code = 'numerical.failure') {
    super(message, code, 1);
  }
}

/**
 * A batch finished and wrote what it could, but some of its items (scenarios of a table) failed; the
 * message says how many and where they are listed. Exit code 3, so that a scheduler can tell a
 * partial result from a complete one (0) and from a run that produced nothing (1, 2).
 */
export class PartialFailureError extends WarmcastError {
  constructor(message: string, code = 'batch.some-failed') {
    super(message, code, 3);
  }
}
