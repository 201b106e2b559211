import { existsSync } from 'node:fs';
import { extname, join, resolve } from 'node:path';
import { Option, type Command } from 'commander';
import { ConfigError } from '../errors.js';
import { bundledPathwaysDir, loadObservedRecord, writeFilesAtomic, type ReadPathwayResult } from '../io/index.js';
import { rebase, reportYears } from '../metrics/index.js';
import { formatsOf, isOutputFormat, OUTPUT_FORMATS, renderDocument, terminalText, type OutputDocument, type OutputFormat, type RowChoice } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { numberListOption, wholeNumberOption, yearOption } from './options.js';
import { buildProvenance, type ProvenanceInput } from './provenance.js';

/** The options every command that projects shares: where to write, which years, what to print. */
export interface ReportOptions {
  out?: string;
  from?: number;
  to?: number;
  years?: number[];
  every?: number;
  notes?: boolean;
  chart: boolean;
}

/** `--out` help: the formats of the output registry. */
const OUT_HELP = `write the results; the extension picks the format: ${Object.keys(OUTPUT_FORMATS).join(', ')} (a CSV gets a .meta.json beside it); - writes the CSV to stdout`;

/**
 * Adds the output options every command that projects shares, with one meaning everywhere:
 * `--out`, `--from`/`--to` (the years of every table, chart and file; the model still starts from
 * pre-industrial and the headline describes the whole run), `--years`/`--every` (the rows of the
 * Markdown, HTML and terminal tables; CSV, JSON and xlsx keep every year), `--notes`, `--no-chart`.
 */
export function addReportOptions(cmd: Command): Command {
  return cmd
    .option('-o, --out <file>', OUT_HELP)
    .option('--from <year>', 'first year of the tables, charts and files (the model still starts from pre-industrial)', yearOption)
    .option('--to <year>', 'last year of the tables, charts and files', yearOption)
    .option('--years <list>', 'rows of the Markdown, HTML and terminal tables, e.g. 2030,2050,2100 (CSV, JSON and xlsx keep every year)', numberListOption('--years'))
    .addOption(new Option('--every <step>', 'rows of the Markdown, HTML and terminal tables every 5 or 10 years (default: every 10 to 2100, every 25 after)').argParser(everyOption))
    .option('--notes', 'print every note on how the inputs were read and run (files always keep them)')
    .option('--no-chart', 'omit the terminal chart');
}

function everyOption(text: string): number {
  const v = wholeNumberOption('--every', 1)(text);
  if (v !== 5 && v !== 10) throw new ConfigError(`--every must be 5 or 10, got ${text}`, 'every');
  return v;
}

/**
 * The years a document shows, from the shared options, for data covering first..last whose future
 * starts in `firstFuture`.
 *
 * @throws ConfigError for --from after --to, years outside the data, or --years with fractions
 */
export function rowChoice(opts: ReportOptions, first: number, last: number, firstFuture: number): RowChoice {
  const { from, to } = opts;
  if (from !== undefined && to !== undefined && from > to) throw new ConfigError(`--from (${from}) must not be after --to (${to})`, 'from');
  const lo = from ?? first;
  const hi = to ?? last;
  if (lo < first || hi > last || hi < first || lo > last) throw new ConfigError(`--from/--to (${lo}-${hi}) must lie within the years of the run, ${first}-${last}`, 'from');
  if (opts.years) {
    const fractional = opts.years.filter((y) => !Number.isInteger(y));
    if (fractional.length > 0) throw new ConfigError(`--years must be whole years, such as 2030,2050,2100; got ${fractional.join(', ')}`, 'years');
    const outside = opts.years.filter((y) => y < lo || y > hi);
    if (outside.length > 0) throw new ConfigError(`--years ${outside.join(', ')} must lie within the years shown, ${lo}-${hi}`, 'years');
  }
  const start = from ?? firstFuture;
  return { ...(from !== undefined ? { from } : {}), ...(to !== undefined ? { to } : {}), years: reportYears(lo, hi, start, { years: opts.years, every: opts.every }) };
}

/**
 * The bundled observed record (HadCRUT5) rebased to `baseline`, with its legend text; undefined when
 * it is not bundled or does not cover the baseline (a note then says so in `notes`).
 */
export function observedRecord(baseline: readonly [number, number], notes: string[]): { years: Float64Array; values: Float64Array; label: string } | undefined {
  const rec = loadObservedRecord();
  if (!rec) return undefined;
  if (baseline[0] < rec.years[0] || baseline[1] > rec.years[rec.years.length - 1]) {
    notes.push(`the observed record (${rec.citation}) covers ${rec.years[0]}-${rec.years[rec.years.length - 1]}, not the ${baseline[0]}-${baseline[1]} baseline, so the charts leave it out`);
    return undefined;
  }
  notes.push(`charts show the observed record as a thin line: ${rec.citation}, annual means rebased to the ${baseline[0]}-${baseline[1]} mean`);
  return { years: rec.years, values: rebase(rec.years, rec.anomalyK, baseline, 'the observed record'), label: `observed (HadCRUT5, Morice et al. 2021)` };
}

/**
 * Writes a document in the format `out`'s extension names, through the output registry, with
 * provenance (inside the file, or in a `.meta.json` sidecar for CSV). The files of one output land
 * together or not at all (writeFilesAtomic), never over an input file. `-` writes the CSV to stdout.
 *
 * @returns the files written, each with whether it replaced an existing file
 * @throws ConfigError for an extension outside the registry, or a target that cannot be written
 */
export async function writeDocument(out: string, doc: OutputDocument, ctx: ProvenanceInput & { io: CliIo }): Promise<WrittenFile[]> {
  const provenance = buildProvenance({ ...ctx, notes: ctx.notes ?? doc.notes, caution: ctx.caution ?? doc.cautions.join(' ') });
  if (out === '-') {
    const [csv] = await renderDocument(doc, provenance, '.csv');
    ctx.io.stdout(csv.content as string);
    return [];
  }
  const path = resolve(ctx.io.cwd, out);
  const ext = checkOutExtension(out, doc, path);
  const stem = path.slice(0, -ext.length);
  const files = (await renderDocument(doc, provenance, ext)).map((f) => ({ path: f.suffix === ext ? path : stem + f.suffix, content: f.content }));
  const existed = files.map((f) => existsSync(f.path));
  writeFilesAtomic(files, { inputs: ctx.inputs });
  return files.map((f, i) => ({ path: f.path, replaced: existed[i] }));
}

/**
 * The format `out` names, checked against the formats that fit the document (see formatsOf), so
 * that a command can refuse a wrong extension before any work.
 *
 * @param out the --out argument
 * @param doc the document, or what is known of it beforehand (whether it has charts)
 * @param shown how to name the file in the message (default `out` as given)
 * @throws ConfigError naming the formats that fit
 */
export function checkOutExtension(out: string, doc: Pick<OutputDocument, 'charts'>, shown = out): OutputFormat {
  const ext = extname(out).toLowerCase();
  const fits = formatsOf(doc);
  if (!isOutputFormat(ext) || !fits.includes(ext)) {
    throw new ConfigError(`--out ${shown}: the extension must be one of ${fits.join(', ')} (it picks the format)`, 'out');
  }
  return ext;
}

/** Prints a document on the terminal (or on stderr when the CSV goes to stdout), fitted to its width. */
export function printDocument(doc: OutputDocument, opts: ReportOptions, io: CliIo): void {
  const toStderr = opts.out === '-';
  const write = toStderr ? io.stderr : io.stdout;
  write(terminalText(doc, { width: toStderr ? io.stderrColumns ?? 100 : io.stdoutColumns ?? 100, color: toStderr ? io.stderrIsTTY : io.stdoutIsTTY, chart: opts.chart, notes: opts.notes }));
}

/** A file {@link writeDocument} wrote, and whether it took the place of an existing one. */
export interface WrittenFile {
  path: string;
  replaced: boolean;
}

/**
 * Says on stderr what was written, one line per file, naming a file that replaced an existing one
 * so that an overwrite is never silent.
 * @example announceWritten([{ path: '/w/out.csv', replaced: true }], io) // stderr: 'wrote /w/out.csv (replaced the existing file)'
 */
export function announceWritten(written: readonly WrittenFile[], io: CliIo): void {
  for (const w of written) io.stderr(`wrote ${w.path}${w.replaced ? ' (replaced the existing file)' : ''}\n`);
}

/**
 * The files a read pathway came from, for provenance and overwrite protection: the pathway file and,
 * when it was spliced, the bundled history.
 */
export function pathwayInputs(read: ReadPathwayResult): string[] {
  return read.pathway.provenance.spliceYear !== undefined ? [read.parsed.file, join(bundledPathwaysDir(), 'history.csv')] : [read.parsed.file];
}
