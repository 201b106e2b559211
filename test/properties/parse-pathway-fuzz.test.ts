/**
 * Property: the pathway reader never fails in any way but an InputError, and never hangs. Random
 * input of four kinds goes through parsePathway (and, when that succeeds, toAnnual):
 *
 * - arbitrary Unicode strings (any code point, control characters included);
 * - raw bytes, written to a file and read the way the CLI does (readPathway: readTextFile, which
 *   decodes UTF-8 strictly, then parsePathway, toAnnual and the history splice);
 * - CSV-like text assembled from the reader's own vocabulary (column names, numbers, dates, NaN,
 *   quotes, delimiters, comment marks, line endings), which reaches far deeper than random text;
 * - valid files with random characters inserted, deleted or replaced.
 *
 * On success the result must satisfy the reader's documented contract (times strictly increasing
 * within 1000-3000, every value finite and within VALUE_BOUNDS, one line number per row); on failure
 * the error must be an InputError with at least one problem naming the file, and exit code 2
 * (src/errors.ts). Each call must finish within 2 s (common practice, no source: the inputs are at
 * most a few kilobytes, read in well under a millisecond).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { parsePathway, readPathway, toAnnual, VALUE_BOUNDS, type ParsedPathway } from '../../src/io/index.js';
import type { PathwayColumn } from '../../src/pathway.js';
import { pathwayCsv, pathwayRows } from './pathway-arbitraries.js';

const CALL_LIMIT_MS = 2000;
const FILE = 'fuzz.csv';

/** Checks what parsePathway promises about a successful read. */
function expectValidParse(p: ParsedPathway): void {
  const n = p.times.length;
  expect(n).toBeGreaterThan(0);
  expect(p.rowLines.length).toBe(n);
  for (let i = 0; i < n; i++) {
    expect(p.times[i] >= 1000 && p.times[i] <= 3000, `time ${p.times[i]}`).toBe(true);
    if (i > 0) expect(p.times[i] > p.times[i - 1], `times ascending at row ${i}`).toBe(true);
    if (i > 0) expect(p.rowLines[i] > p.rowLines[i - 1], 'row lines ascending').toBe(true);
  }
  expect(p.rowLines[0]).toBeGreaterThan(p.headerLine);
  const columns = Object.keys(p.columns) as PathwayColumn[];
  expect(columns.length).toBeGreaterThan(0);
  for (const c of columns) {
    const { min, max } = VALUE_BOUNDS[c];
    expect(p.columns[c]!.length).toBe(n);
    for (const v of p.columns[c]!) expect(v >= min && v <= max, `${c} value ${v}`).toBe(true);
  }
}

/** An InputError with problems that each name the file, or a rethrow of anything else. */
function expectInputError(e: unknown, file: string): void {
  if (!(e instanceof InputError)) throw e;
  expect(e.exitCode).toBe(2);
  expect(e.problems.length).toBeGreaterThan(0);
  for (const p of e.problems) {
    expect(p.file).toBe(file);
    expect(p.message.length).toBeGreaterThan(0);
  }
}

/** Runs parsePathway + toAnnual on text: success meets the contract, failure is an InputError; both are quick. */
function readOrInputError(text: string): void {
  const start = performance.now();
  try {
    const parsed = parsePathway(text, FILE);
    expectValidParse(parsed);
    const annual = toAnnual(parsed);
    expect(annual.years.length).toBeGreaterThan(0);
  } catch (e) {
    expectInputError(e, FILE);
  }
  expect(performance.now() - start, 'milliseconds for one read').toBeLessThan(CALL_LIMIT_MS);
}

/** Pieces of pathway files, from which CSV-like text is assembled. */
const TOKENS = [
  'year', 'date', 'Year', ' YEAR ', 'co2_ppm', 'CO2_PPM', 'ch4_ppb', 'n2o_ppb', 'co2_gtco2', 'ch4_mt', 'n2o_mt',
  'aerosol_wm2', 'other_wm2', 'solar_wm2', 'volcanic_wm2', 'co2_gtc', 'co2ppm', 'x',
  '2030', '2030.5', '1000', '3000', '999', '3001', '20300', '-1', '0', '-0', '420', '4.2e2', '1e308', '1e-320', '.5', '5.',
  '420,5', 'NaN', 'Infinity', '-inf', '1,000', '2030-07-02', '2032-02-29', '2030-02-30', '2025-07', '2030-W01-1', '+2030',
  ',', ',', ',', ';', '\t', '"', '""', '"420"', ' ', '#', '# name: x', '# note:', '\n', '\n', '\n', '\r\n', '\r', '\uFEFF', '\u00A0', '\u2212',
];
const tokenSoup = fc.array(fc.constantFrom(...TOKENS), { maxLength: 120, size: 'max' }).map((t) => t.join(''));

/** Cells of data rows: times (some repeated or out of order), numbers good and bad, quoting, padding. */
const CELLS = [
  '1990', '2000', '2010', '2020', '2030', '2030.5', '2031', '2040', '2100', '2300', '1750', '999', '3001',
  '2030-07-02', '2031-01-01', '2032-02-29', '2030-02-30', '2031-13-01', '2030-07', '2030-07-02T12:00',
  '420', '280.5', '1900', '330', '0', '-0.5', '1.2e3', '5e1', '50', '-50', '50.0001', '1361', '4.2E+2',
  '420,5', '0,5', 'NaN', 'nan', 'Infinity', '', ' ', ' 420 ', '"420"', '"2030"', '"42""0"', '"420', 'about 420', '1,000', '420ppm',
];
const HEADER_CELLS = ['year', 'date', 'Year', ' year ', '"year"', 'co2_ppm', 'ch4_ppb', 'n2o_ppb', 'aerosol_wm2', 'solar_wm2', 'co2_gtco2', 'ch4_mt', 'CO2_ppm', 'co2_gtc', 'co2ppm', ''];
/** Text shaped like a pathway file: a header and rows joined by one delimiter, with comments and blank lines. */
const csvLike = fc
  .array(fc.constantFrom(...HEADER_CELLS), { minLength: 1, maxLength: 4 })
  .chain((header) =>
    fc.record({
      delimiter: fc.constantFrom(',', ',', ';', '\t'),
      eol: fc.constantFrom('\n', '\r\n', '\r'),
      before: fc.array(fc.constantFrom('# name: fuzz', '# note: x', '#', '', '  '), { maxLength: 3 }),
      header: fc.constant(header),
      rows: fc.array(
        fc.oneof(
          // Mostly as many cells as the header has, so that the cells themselves get read.
          { arbitrary: fc.array(fc.constantFrom(...CELLS), { minLength: header.length, maxLength: header.length }), weight: 6 },
          { arbitrary: fc.array(fc.constantFrom(...CELLS), { minLength: 1, maxLength: 5 }), weight: 1 },
          { arbitrary: fc.constantFrom('# comment', '', ',,,', ';;'), weight: 1 },
        ),
        { maxLength: 10 },
      ),
    }),
  )
  .map(({ delimiter, eol, before, header, rows }) =>
    [...before, header.join(delimiter), ...rows.map((r) => (typeof r === 'string' ? r : r.join(delimiter)))].join(eol));

/** A valid file with up to 8 edits: insert, delete or replace one character. */
const mutated = fc
  .tuple(
    pathwayRows().map((rows) => pathwayCsv(rows)),
    fc.array(
      fc.tuple(fc.constantFrom('insert', 'delete', 'replace'), fc.nat(), fc.string({ unit: 'binary-ascii', minLength: 1, maxLength: 1 })),
      { minLength: 1, maxLength: 8 },
    ),
  )
  .map(([text, edits]) => {
    let s = text;
    for (const [kind, at, ch] of edits) {
      const i = at % (s.length + 1);
      if (kind === 'insert') s = s.slice(0, i) + ch + s.slice(i);
      else if (kind === 'delete') s = s.slice(0, i) + s.slice(i + 1);
      else s = s.slice(0, i) + ch + s.slice(i + 1);
    }
    return s;
  });

const dir = mkdtempSync(join(tmpdir(), 'warmcast-fuzz-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('parsePathway on random input (fast-check, seed 42): a valid pathway or an InputError, quickly', () => {
  it('parsePathway(any Unicode string) returns a valid pathway or throws InputError', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 400 }), readOrInputError), { seed: 42, numRuns: 1500 });
  });

  it('parsePathway(a soup of the reader\'s tokens) returns a valid pathway or throws InputError', () => {
    fc.assert(fc.property(tokenSoup, readOrInputError), { seed: 42, numRuns: 1000 });
  });

  it('parsePathway(CSV-shaped text: header, rows, comments, any delimiter and line ending) returns a valid pathway or throws InputError', () => {
    fc.assert(fc.property(csvLike, readOrInputError), { seed: 42, numRuns: 2000 });
  });

  it('parsePathway(valid file with random edits) returns a valid pathway or throws InputError', () => {
    fc.assert(fc.property(mutated, readOrInputError), { seed: 42, numRuns: 1000 });
  });

  it('readPathway(file of random bytes) returns a pathway or throws InputError', () => {
    const path = join(dir, FILE);
    const bytes = fc.oneof(
      fc.uint8Array({ maxLength: 600 }),
      // Mostly ASCII digits and delimiters after a valid header, so that decoding and parsing both get exercised.
      fc.uint8Array({ maxLength: 400, min: 0x09, max: 0x3b }).map((b) => new Uint8Array([...Buffer.from('year,co2_ppm\n'), ...b])),
    );
    fc.assert(
      fc.property(bytes, (b) => {
        writeFileSync(path, b);
        const start = performance.now();
        try {
          const { parsed, pathway } = readPathway(path);
          expectValidParse(parsed);
          expect(pathway.years.length).toBeGreaterThan(0);
        } catch (e) {
          expectInputError(e, path);
        }
        expect(performance.now() - start).toBeLessThan(CALL_LIMIT_MS);
      }),
      { seed: 42, numRuns: 800 },
    );
  });
});
