import { InputError, type InputProblem } from '../errors.js';
import { PATHWAY_COLUMNS, type PathwayColumn } from '../pathway.js';
import type { ParsedPathway } from './parse-pathway.js';
import { readNumber } from './parse-pathway.js';
import type { IamcSheet, SheetCell } from './iamc-sheets.js';
import { emissionUnitFactor } from './iamc-units.js';
import { iamcVariable, variableKey, type IamcVariable } from './iamc-variables.js';
import { outOfBounds } from './value-bounds.js';

/** The columns every IAMC table has, in the template's order (matched without regard to case). */
export const IAMC_ID_COLUMNS = ['model', 'scenario', 'region', 'variable', 'unit'] as const;

/** The region warmcast reads (global totals); rows of other regions are skipped with a note. */
export const IAMC_REGION = 'World';

/** One (model, scenario) of a table, read into the pathway reader's intermediate, or its problems. */
export interface IamcScenario {
  model: string;
  scenario: string;
  /** The scenario as a pathway file's rows would be (undefined when it has problems). */
  parsed?: ParsedPathway;
  /** What is wrong with this scenario (empty when `parsed` is set). */
  problems: InputProblem[];
  /** How the scenario was read: CO2 summed from sectors, years interpolated, rows skipped. */
  notes: string[];
  /** Each variable read, the column it became and its unit as written. */
  variables: { variable: string; column: string; unit: string }[];
}

/** A scenario table as read. */
export interface IamcTable {
  file: string;
  /** `wide` (one column per year) or `long` (Year and Value columns). */
  layout: 'wide' | 'long';
  /** Every (model, scenario), in the order of their first row. */
  scenarios: IamcScenario[];
  /** Notes on the whole table (sheets skipped, columns not used). */
  notes: string[];
}

/** Columns of our pathway files a scenario's variables may become (so2_mt and the rest once the pathway model takes them). */
function takesColumn(column: string): column is PathwayColumn {
  return (PATHWAY_COLUMNS as readonly string[]).includes(column);
}

/** One value of a variable, converted to our column's unit, and where it was written. */
interface Cell {
  value: number;
  line: number;
  column: string;
  /** The cell as written (for messages). */
  written: SheetCell;
}

/** The rows of one variable of one scenario. */
interface VariableRows {
  info: IamcVariable;
  /** The variable as written in the table. */
  written: string;
  /** The Unit cell as written, and the factor to our column's unit. */
  unit: string;
  factor: number;
  /** Row of its first value. */
  line: number;
  years: Map<number, Cell>;
}

interface ScenarioRows {
  model: string;
  scenario: string;
  firstLine: number;
  sheet?: string;
  problems: InputProblem[];
  /** Per variable key: the variable, its unit and its values by year. */
  variables: Map<string, VariableRows>;
  otherRegions: Set<string>;
  worldRows: number;
  unread: Set<string>;
  /** Variables whose unit was refused. */
  refused: Set<string>;
}

/**
 * Reads a scenario table in the IAMC layout (an open community standard): columns Model, Scenario,
 * Region, Variable, Unit and either one column per year (wide) or a Year and a Value column (long),
 * headers matched without regard to case. Only region World is read; rows of other regions, and
 * variables warmcast does not read, are skipped with a note. Each emission variable of
 * IAMC_VARIABLES becomes its column, converted from the unit in its Unit cell (an unknown unit is a
 * problem that lists the units known for it). Total CO2 is `Emissions|CO2` or, when a scenario gives
 * only its sectors, the sum of `Emissions|CO2|Energy and Industrial Processes` and
 * `Emissions|CO2|AFOLU` (a note says so). Each (model, scenario) becomes the intermediate that
 * pathway files are read into (ParsedPathway), so toAnnual and spliceOntoHistory treat it as they
 * treat a file: see assembleScenario for the years.
 *
 * Problems of the table as a whole (no header, missing columns, both layouts) throw; a problem of
 * one scenario (bad number, unknown unit, no CO2) is kept with that scenario, so a batch can assess
 * the others. Every problem names the file, sheet, row, column, model, scenario and variable.
 *
 * @param file the path, for messages and provenance
 * @param sheets the CSV file's rows, or a workbook's worksheets (csvSheet, xlsxSheets)
 * @throws InputError when no sheet is an IAMC table, or a sheet's header is unusable
 */
export function readIamcTable(file: string, sheets: IamcSheet[]): IamcTable {
  const notes: string[] = [];
  const tableProblems: InputProblem[] = [];
  const scenarios = new Map<string, ScenarioRows>();
  let layout: IamcTable['layout'] | undefined;
  let used = 0;

  for (const sheet of sheets) {
    const header = sheet.rows[0];
    const at = { file, ...(sheet.sheet !== undefined ? { sheet: sheet.sheet } : {}) };
    if (!header) {
      if (sheet.sheet !== undefined) notes.push(`sheet "${sheet.sheet}" skipped: it is empty`);
      continue;
    }
    const names = header.cells.map((c) => (c === null ? '' : String(c).trim()));
    const lower = names.map((n) => n.toLowerCase());
    const missing = IAMC_ID_COLUMNS.filter((c) => !lower.includes(c));
    if (missing.length > 0) {
      // A workbook may hold other sheets (a meta sheet, notes): skipped when any sheet is a table.
      if (sheet.sheet !== undefined && missing.length === IAMC_ID_COLUMNS.length) {
        notes.push(`sheet "${sheet.sheet}" skipped: its first row has none of the columns Model, Scenario, Region, Variable, Unit`);
        continue;
      }
      tableProblems.push({
        ...at,
        line: header.line,
        code: 'input.iamc-header',
        message: `must have the IAMC columns Model, Scenario, Region, Variable and Unit; missing ${missing.map(title).join(', ')}`,
        expected: 'a header row such as "Model,Scenario,Region,Variable,Unit,2020,2030,..." (wide) or "Model,Scenario,Region,Variable,Unit,Year,Value" (long)',
      });
      continue;
    }
    const index = Object.fromEntries(IAMC_ID_COLUMNS.map((c) => [c, lower.indexOf(c)])) as Record<(typeof IAMC_ID_COLUMNS)[number], number>;
    const yearColumns: { j: number; year: number }[] = [];
    const unused: string[] = [];
    names.forEach((name, j) => {
      if ((IAMC_ID_COLUMNS as readonly string[]).includes(lower[j]) || lower[j] === 'year' || lower[j] === 'value') return;
      const year = headerYear(header.cells[j]);
      if (year !== undefined) yearColumns.push({ j, year });
      else if (name !== '') unused.push(name);
    });
    const yearIndex = lower.indexOf('year');
    const valueIndex = lower.indexOf('value');
    const long = yearIndex >= 0 && valueIndex >= 0;
    if (long && yearColumns.length > 0) {
      tableProblems.push({ ...at, line: header.line, code: 'input.iamc-layout', message: 'must be either wide (one column per year) or long (Year and Value columns), not both', expected: 'year columns such as 2020, 2030 or the two columns Year and Value' });
      continue;
    }
    if (!long && yearColumns.length === 0) {
      tableProblems.push({
        ...at,
        line: header.line,
        code: 'input.iamc-no-years',
        message: yearIndex >= 0 || valueIndex >= 0 ? `has a ${yearIndex >= 0 ? 'Year' : 'Value'} column but no ${yearIndex >= 0 ? 'Value' : 'Year'} column` : 'must have year columns (wide layout) or Year and Value columns (long layout)',
        expected: 'year columns such as 2020, 2030 or the two columns Year and Value',
      });
      continue;
    }
    const sheetLayout = long ? 'long' : 'wide';
    if (layout !== undefined && layout !== sheetLayout) notes.push(`sheet "${sheet.sheet}" is in the ${sheetLayout} layout, the sheets before it in the ${layout} layout; both are read`);
    layout ??= sheetLayout;
    used++;
    if (unused.length > 0) notes.push(`${sheet.sheet !== undefined ? `sheet "${sheet.sheet}": ` : ''}column${unused.length > 1 ? 's' : ''} not used: ${unused.join(', ')}`);

    for (const row of sheet.rows.slice(1)) {
      const text = (j: number) => cellText(row.cells[j]);
      const model = text(index.model);
      const scenario = text(index.scenario);
      const region = text(index.region);
      const variable = text(index.variable);
      const unit = text(index.unit);
      const where = { ...at, line: row.line };
      const blank = IAMC_ID_COLUMNS.find((c) => text(index[c]) === '');
      if (blank !== undefined) {
        const problem: InputProblem = { ...where, column: names[index[blank]], code: 'input.iamc-empty-id', message: `must not be empty (every row names its model, scenario, region, variable and unit)`, ...idsOf(model, scenario, variable) };
        if (model !== '' && scenario !== '') rowsOf(scenarios, model, scenario, row.line, sheet.sheet).problems.push(problem);
        else tableProblems.push(problem);
        continue;
      }
      const s = rowsOf(scenarios, model, scenario, row.line, sheet.sheet);
      if (region.toLowerCase() !== IAMC_REGION.toLowerCase()) {
        s.otherRegions.add(region);
        continue;
      }
      s.worldRows++;
      const info = iamcVariable(variable);
      if (!info) {
        if (variable.toLowerCase().startsWith('emissions')) s.unread.add(variable);
        continue;
      }
      const ids = { ...where, ...idsOf(model, scenario, variable) };
      const key = variableKey(variable);
      let entry = s.variables.get(key);
      if (entry && !long) {
        s.problems.push({ ...ids, code: 'input.iamc-duplicate', message: `must give each variable once per scenario: it is also on row ${entry.line}`, expected: 'one World row per variable' });
        continue;
      }
      if (entry && entry.unit.toLowerCase() !== unit.toLowerCase()) {
        s.problems.push({ ...ids, column: names[index.unit], code: 'input.iamc-unit-changes', message: `must keep one unit per variable: row ${entry.line} gives "${entry.unit}"`, value: unit, expected: entry.unit });
        continue;
      }
      // In the long layout a variable has a row per year: a refused unit is reported at its first row only.
      if (s.refused.has(key)) continue;
      if (!entry) {
        const read = emissionUnitFactor(unit, info.target);
        if (!read.ok) {
          s.refused.add(key);
          s.problems.push({ ...ids, column: names[index.unit], code: 'input.iamc-unit', message: `must be a unit known for ${info.variable}`, value: unit, expected: `one of ${read.known.join(', ')}` });
          continue;
        }
        entry = { info, written: variable, unit, factor: read.factor, line: row.line, years: new Map<number, Cell>() };
        s.variables.set(key, entry);
      }
      const cells: { cell: SheetCell; year: number; j: number }[] = [];
      if (long) {
        const year = headerYear(row.cells[yearIndex]);
        if (year === undefined) {
          s.problems.push({ ...ids, column: names[yearIndex], code: 'input.bad-year', message: 'must be a whole year from 1000 to 3000', value: text(yearIndex), expected: 'a year such as 2030' });
          continue;
        }
        if (entry.years.has(year)) {
          s.problems.push({ ...ids, column: names[yearIndex], code: 'input.duplicate-time', message: `must not repeat a year for one variable: ${year} is also on row ${entry.years.get(year)!.line}`, value: String(year), expected: 'each year once per variable' });
          continue;
        }
        cells.push({ cell: row.cells[valueIndex] ?? null, year, j: valueIndex });
      } else {
        for (const { j, year } of yearColumns) cells.push({ cell: row.cells[j] ?? null, year, j });
      }
      for (const { cell, year, j } of cells) {
        // An empty cell gives no value for that year.
        if (cell === null || (typeof cell === 'string' && cell.trim() === '')) continue;
        const read = typeof cell === 'number' ? { ok: true as const, value: cell } : readNumber(cell.trim(), sheet.delimiter);
        if (!read.ok || !Number.isFinite(read.value)) {
          const bad = read.ok ? { code: 'input.not-finite', message: 'must be a finite number', expected: 'a number such as 415.2' } : read;
          s.problems.push({ ...ids, column: names[j], code: bad.code, message: bad.message, value: String(cell), expected: bad.expected });
          continue;
        }
        entry.years.set(year, { value: read.value * entry.factor, line: row.line, column: names[j], written: cell });
      }
    }
  }

  if (used === 0 && tableProblems.length === 0) {
    tableProblems.push({ file, code: 'input.iamc-no-table', message: 'must hold a scenario table in the IAMC layout (no sheet has the columns Model, Scenario, Region, Variable, Unit)', expected: 'a header row such as "Model,Scenario,Region,Variable,Unit,2020,2030,..."' });
  }
  if (tableProblems.length > 0) throw new InputError(tableProblems);
  if (scenarios.size === 0) throw new InputError([{ file, code: 'input.no-rows', message: 'must have at least one data row after the header', expected: 'one row per model, scenario, region and variable' }]);

  const names = new Map<string, number>();
  for (const s of scenarios.values()) names.set(s.scenario, (names.get(s.scenario) ?? 0) + 1);
  return {
    file,
    layout: layout!,
    scenarios: [...scenarios.values()].map((s) => assembleScenario(file, s, names.get(s.scenario)! > 1)),
    notes,
  };
}

function rowsOf(map: Map<string, ScenarioRows>, model: string, scenario: string, line: number, sheet?: string): ScenarioRows {
  const key = `${model}\u0000${scenario}`;
  let s = map.get(key);
  if (!s) {
    s = { model, scenario, firstLine: line, sheet, problems: [], variables: new Map(), otherRegions: new Set(), worldRows: 0, unread: new Set(), refused: new Set() };
    map.set(key, s);
  }
  return s;
}

function idsOf(model: string, scenario: string, variable: string) {
  return { ...(model !== '' ? { model } : {}), ...(scenario !== '' ? { scenario } : {}), ...(variable !== '' ? { variable } : {}) };
}

function title(name: string): string {
  return name[0].toUpperCase() + name.slice(1);
}

function cellText(cell: SheetCell | undefined): string {
  return cell === null || cell === undefined ? '' : String(cell).trim();
}

/** A header cell that names a year (`2030`, `2030.0` or the number 2030), else undefined. */
function headerYear(cell: SheetCell | undefined): number | undefined {
  const text = cellText(cell);
  if (!/^\d{4}(?:\.0*)?$/.test(text)) return undefined;
  const year = Number(text);
  return year >= 1000 && year <= 3000 ? year : undefined;
}

/**
 * Present global totals, in our columns' units, against which a scenario's values up to
 * PRESENT_CHECK_LAST_YEAR are checked for a unit mistake.
 */
const PRESENT_GLOBAL: Readonly<Record<string, { value: number; unit: string; source: string }>> = {
  co2_gtco2: { value: 40, unit: 'Gt CO2/yr', source: 'Global Carbon Budget, about 2020; from memory' },
  ch4_mt: { value: 380, unit: 'Mt CH4/yr', source: 'anthropogenic, Global Methane Budget, about 2020; from memory' },
  n2o_mt: { value: 10, unit: 'Mt N2O/yr', source: 'anthropogenic, Global N2O Budget, about 2020; from memory' },
  so2_mt: { value: 80, unit: 'Mt SO2/yr', source: 'anthropogenic, CEDS inventory, about 2020; from memory' },
};
/** Values this many times above or below the present total are refused (common practice, no source: a unit slip is a factor 1000). */
const PRESENT_FACTOR = 30;
/** Only years up to this one are compared with the present totals (later ones may fall far in a deep-cut scenario). */
const PRESENT_CHECK_LAST_YEAR = 2030;

/** At most this many names in a note's list, then "and N more". */
const LISTED = 5;

function listOf(names: Iterable<string>): string {
  const all = [...names];
  return all.length <= LISTED ? all.join(', ') : `${all.slice(0, LISTED).join(', ')} and ${all.length - LISTED} more`;
}

/**
 * Turns one scenario's World rows into a ParsedPathway, or collects its problems. Total CO2 is
 * `Emissions|CO2`, else the sum of its two sectors in the years both give. The years are those that
 * every variable read covers: from the latest first year to the earliest last year of the
 * variables (years outside are dropped, with a note); a variable without a value in a year another
 * variable gives is interpolated linearly between its own neighbouring years (with a note), so each
 * year of the result has a value in every column, as a row of a pathway file has. Values are checked
 * against VALUE_BOUNDS in our units; variables whose column this version's pathways do not take are
 * named in a note and not used.
 */
function assembleScenario(file: string, s: ScenarioRows, ambiguousName: boolean): IamcScenario {
  const problems = [...s.problems];
  const notes: string[] = [];
  const at = { file, ...(s.sheet !== undefined ? { sheet: s.sheet } : {}), model: s.model, scenario: s.scenario };
  const variables = [...s.variables.values()].map((v) => ({ variable: v.written, column: v.info.column, unit: v.unit }));
  const result = (parsed?: ParsedPathway): IamcScenario => ({ model: s.model, scenario: s.scenario, ...(parsed && problems.length === 0 ? { parsed } : {}), problems, notes, variables });

  if (s.otherRegions.size > 0) notes.push(`rows of other regions skipped (${listOf(s.otherRegions)}): only region ${IAMC_REGION} is read`);
  if (s.worldRows === 0) {
    problems.push({ ...at, line: s.firstLine, code: 'input.iamc-no-world', message: `must have rows for region ${IAMC_REGION} (global totals are read, other regions skipped)`, expected: `rows whose Region is ${IAMC_REGION}` });
    return result();
  }
  if (s.unread.size > 0) notes.push(`emission variables not read: ${listOf(s.unread)}`);

  // CO2: the total, or the sum of its two sectors.
  const co2Rows = [...s.variables.values()].filter((v) => v.info.column === 'co2_gtco2');
  const total = co2Rows.find((v) => v.info.co2Sector === undefined);
  const energy = co2Rows.find((v) => v.info.co2Sector === 'energy-industry');
  const afolu = co2Rows.find((v) => v.info.co2Sector === 'afolu');
  const series = new Map<string, { variable: string; years: Map<number, Cell> }>();
  if (total) {
    series.set('co2_gtco2', { variable: total.written, years: total.years });
    if (energy || afolu) notes.push(`total CO2 is ${total.written}; its sectors (${[energy, afolu].filter(Boolean).map((v) => v!.written).join(', ')}) are not added to it`);
  } else if (energy && afolu) {
    const years = new Map<number, Cell>();
    for (const [year, cell] of energy.years) {
      const other = afolu.years.get(year);
      if (other) years.set(year, { ...cell, value: cell.value + other.value });
    }
    series.set('co2_gtco2', { variable: `${energy.written} + ${afolu.written}`, years });
    notes.push(`total CO2 is the sum of ${energy.written} and ${afolu.written} (the scenario gives no Emissions|CO2), in the years both give`);
  } else if (energy || afolu) {
    const given = (energy ?? afolu)!;
    const lacking = energy ? 'Emissions|CO2|AFOLU' : 'Emissions|CO2|Energy and Industrial Processes';
    problems.push({ ...at, line: given.line, variable: given.written, code: 'input.iamc-co2-sector', message: `gives one sector of CO2 but neither Emissions|CO2 nor ${lacking}: total CO2 needs both sectors`, expected: `Emissions|CO2, or both Emissions|CO2|Energy and Industrial Processes and Emissions|CO2|AFOLU` });
  } else {
    problems.push({ ...at, line: s.firstLine, code: 'input.iamc-no-co2', message: 'must give total CO2 emissions', expected: 'a World row for Emissions|CO2, or for both Emissions|CO2|Energy and Industrial Processes and Emissions|CO2|AFOLU' });
  }

  const notTaken: string[] = [];
  for (const v of s.variables.values()) {
    const column = v.info.column;
    if (column === 'co2_gtco2') continue;
    const earlier = series.get(column);
    if (earlier) {
      problems.push({ ...at, line: v.line, variable: v.written, code: 'input.iamc-same-column', message: `must not give ${column} twice: ${earlier.variable} gives it too`, expected: `one of ${earlier.variable} or ${v.written}` });
      continue;
    }
    series.set(column, { variable: v.written, years: v.years });
  }
  for (const [column, { variable }] of series) {
    if (!takesColumn(column)) {
      notTaken.push(`${variable} (${column})`);
      series.delete(column);
    }
  }
  if (notTaken.length > 0) notes.push(`read but not used (this version's pathways take no such column): ${notTaken.join(', ')}`);

  for (const [column, { variable, years }] of series) {
    if (years.size === 0) {
      if (column === 'co2_gtco2') problems.push({ ...at, line: s.firstLine, variable, code: 'input.iamc-no-values', message: 'must give at least one value', expected: 'numbers in the year columns' });
      else notes.push(`${variable} has no values: not used`);
      if (column !== 'co2_gtco2') series.delete(column);
      continue;
    }
    for (const cell of years.values()) {
      const outside = outOfBounds(column as PathwayColumn, cell.value);
      if (outside) {
        problems.push({ ...at, line: cell.line, column: cell.column, variable, code: outside.code, value: String(cell.written), message: `${outside.message} once converted to ${column}`, expected: `${outside.expected} (${cell.value.toPrecision(4)} after conversion)` });
      }
    }
  }
  // A global total far from today's in a near-present year is almost always a unit mistake (kt for Mt, Mt for Gt).
  for (const [column, { variable, years }] of series) {
    const present = PRESENT_GLOBAL[column];
    if (!present) continue;
    const early = [...years.entries()].filter(([y]) => y <= PRESENT_CHECK_LAST_YEAR).sort((a, b) => a[0] - b[0])[0];
    if (!early) continue;
    const [year, cell] = early;
    const ratio = Math.abs(cell.value) / present.value;
    if (ratio < 1 / PRESENT_FACTOR || ratio > PRESENT_FACTOR) {
      problems.push({
        ...at,
        line: cell.line,
        column: cell.column,
        variable,
        code: 'input.iamc-implausible-total',
        value: String(cell.written),
        message: `is ${+cell.value.toPrecision(3)} ${present.unit} in ${year} once converted from "${s.variables.get(variableKey(variable.split(' + ')[0]))?.unit ?? ''}": the world's total is about ${present.value} ${present.unit} (${present.source}), so the unit is probably wrong`,
        expected: `a World total within a factor ${PRESENT_FACTOR} of ${present.value} ${present.unit} in years up to ${PRESENT_CHECK_LAST_YEAR}, in the unit the Unit column names`,
      });
    }
  }
  if (problems.length > 0) return result();

  // The years every variable covers; gaps inside a variable's own span interpolated.
  let first = -Infinity;
  let last = Infinity;
  const spans: string[] = [];
  for (const { variable, years } of series.values()) {
    const ys = [...years.keys()];
    const lo = Math.min(...ys);
    const hi = Math.max(...ys);
    first = Math.max(first, lo);
    last = Math.min(last, hi);
    spans.push(`${variable} ${lo}-${hi}`);
  }
  if (first > last) {
    problems.push({ ...at, line: s.firstLine, code: 'input.iamc-no-common-years', message: `must have years that every variable covers: ${spans.join(', ')}`, expected: 'variables given over the same span of years' });
    return result();
  }
  const all = new Set<number>();
  for (const { years } of series.values()) for (const y of years.keys()) all.add(y);
  const grid = [...all].filter((y) => y >= first && y <= last).sort((a, b) => a - b);
  const dropped = [...all].filter((y) => y < first || y > last).sort((a, b) => a - b);
  if (dropped.length > 0) notes.push(`years ${listOf(dropped.map(String))} dropped: not every variable gives them (the scenario is read from ${first} to ${last})`);

  const columns: Partial<Record<PathwayColumn, Float64Array>> = {};
  const filled: string[] = [];
  for (const [column, { variable, years }] of series) {
    const known = [...years.keys()].sort((a, b) => a - b);
    const values = new Float64Array(grid.length);
    const missing: number[] = [];
    grid.forEach((y, i) => {
      const cell = years.get(y);
      if (cell) {
        values[i] = cell.value;
        return;
      }
      missing.push(y);
      const k = known.findIndex((x) => x > y);
      const y0 = known[k - 1];
      const y1 = known[k];
      values[i] = years.get(y0)!.value + ((years.get(y1)!.value - years.get(y0)!.value) * (y - y0)) / (y1 - y0);
    });
    if (missing.length > 0) filled.push(`${variable} in ${listOf(missing.map(String))}`);
    columns[column as PathwayColumn] = values;
  }
  if (filled.length > 0) notes.push(`interpolated linearly between the variable's own years where another variable gives a year it lacks: ${filled.join('; ')}`);

  const co2 = series.get('co2_gtco2')!.years;
  const name = ambiguousName ? `${s.scenario} (${s.model})` : s.scenario;
  return result({
    file,
    name,
    metadata: { name, model: s.model, scenario: s.scenario, region: IAMC_REGION, ...(s.sheet !== undefined ? { sheet: s.sheet } : {}) },
    timeColumn: 'year',
    times: Float64Array.from(grid),
    columns,
    rowLines: Int32Array.from(grid, (y) => co2.get(y)?.line ?? s.firstLine),
    headerLine: s.firstLine,
  });
}
