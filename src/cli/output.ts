import { existsSync } from 'node:fs';
import { extname, join, resolve } from 'node:path';
import { ConfigError } from '../errors.js';
import { bundledPathwaysDir, formatCsv, formatJson, formatMarkdown, writeFilesAtomic, type ReadPathwayResult, type Table } from '../io/index.js';
import type { Projection } from '../projection/index.js';
import type { CliIo } from './cli-io.js';
import { buildProvenance, type Provenance, type ProvenanceInput } from './provenance.js';

/**
 * A projection restricted to years from..to (inclusive); the run itself is unchanged.
 *
 * @throws ConfigError when `from` is after `to`, or the years lie outside the run's
 */
export function clipProjection(p: Projection, from?: number, to?: number): Projection {
  if (from !== undefined && to !== undefined && from > to) {
    throw new ConfigError(`--from (${from}) must not be after --to (${to})`, 'from');
  }
  const first = p.years[0];
  const last = p.years[p.years.length - 1];
  const lo = from ?? first;
  const hi = to ?? last;
  if (lo < first || hi > last || lo > hi) {
    throw new ConfigError(`--from/--to (${lo}-${hi}) must lie within the years of ${p.name}, ${first}-${last}`, 'from');
  }
  const a = lo - first;
  const b = hi - first + 1;
  const columns = Object.fromEntries(Object.entries(p.columns).map(([k, v]) => [k, v.slice(a, b)]));
  return { ...p, years: p.years.slice(a, b), columns };
}

/** The yearly table of a projection: `year` then the output columns in DESIGN.md order. */
export function projectionTable(p: Projection): Table {
  const names = Object.keys(p.columns);
  return { columns: ['year', ...names], data: [p.years, ...names.map((n) => p.columns[n])] };
}

/** Output formats by extension; each renders the whole file from the provenance record. */
export type Renderers = Partial<Record<'.csv' | '.json' | '.md' | '.svg' | '.html', (provenance: Provenance) => string>>;

/** What {@link writeOutput} needs: the provenance inputs and where to write stdout. */
export interface OutputContext extends ProvenanceInput {
  io: CliIo;
  /**
   * More members of a CSV's `.meta.json` sidecar, after the provenance (an ensemble's `headlines`),
   * so that what the JSON and Markdown forms carry beside the table is not lost with CSV.
   */
  sidecar?: Record<string, unknown>;
}

/**
 * Writes `path` in the format its extension names, atomically, with provenance: inside the file for
 * JSON, Markdown, SVG and HTML, in a `.meta.json` sidecar for CSV (so spreadsheets get a clean
 * table). A CSV and its sidecar are written all-or-nothing (writeFilesAtomic): if either cannot be
 * written, neither is, and existing files are left as they were. `out` is resolved against the
 * command's working directory; `-` writes the CSV form to stdout.
 *
 * @returns the files written, each with whether it replaced an existing file (see announceWritten)
 * @throws ConfigError for an extension the command does not write, or a target that cannot be
 *   written (see writeFilesAtomic)
 */
export function writeOutput(out: string, renderers: Renderers, ctx: OutputContext): WrittenFile[] {
  const provenance = buildProvenance(ctx);
  const path = out === '-' ? out : resolve(ctx.io.cwd, out);
  if (path === '-') {
    ctx.io.stdout(renderers['.csv']!(provenance));
    return [];
  }
  const ext = extname(path).toLowerCase() as keyof Renderers;
  const render = renderers[ext];
  if (!render) {
    throw new ConfigError(`--out ${path}: the extension must be one of ${Object.keys(renderers).join(', ')} (it picks the format)`, 'out');
  }
  const files = [{ path, content: render(provenance) }];
  if (ext === '.csv') files.push({ path: path.slice(0, -ext.length) + '.meta.json', content: JSON.stringify({ ...provenance, ...ctx.sidecar }, null, 2) + '\n' });
  const existed = files.map((f) => existsSync(f.path));
  // The table and its sidecar land together or not at all: a CSV without its provenance is not written.
  writeFilesAtomic(files, { inputs: ctx.inputs });
  return files.map((f, i) => ({ path: f.path, replaced: existed[i] }));
}

/** A file {@link writeOutput} wrote, and whether it took the place of an existing one. */
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

/** What a yearly table's files carry besides the table (an ensemble's headlines). */
export interface TableExtras {
  /** Members of the JSON form's top-level object, after the provenance. */
  json?: Record<string, unknown>;
  /** Markdown placed above the table. */
  markdownBefore?: string;
}

/**
 * The formats of a plain yearly table: CSV, JSON with provenance, Markdown with provenance below
 * (and `extras` in the JSON and above the Markdown table).
 */
export function tableRenderers(table: Table, extras: TableExtras = {}): Renderers {
  return {
    '.csv': () => formatCsv(table),
    '.json': (p) => formatJson(table, p, extras.json),
    '.md': (p) => (extras.markdownBefore ? `${extras.markdownBefore}\n` : '') + markdownWithProvenance(table, p),
  };
}

function markdownWithProvenance(table: Table, provenance: Provenance): string {
  const files = (list: { path: string; sha256: string }[]) => list.map((i) => `${i.path} (sha256 ${i.sha256.slice(0, 12)}…)`).join('; ');
  const pathway = provenance.pathway !== undefined ? `pathway: ${provenance.pathway}; ` : '';
  const recorded = provenance.pathway_inputs ? `; pathway files (as recorded in the shards): ${files(provenance.pathway_inputs)}` : '';
  return (
    formatMarkdown(table, 4) +
    `\nwarmcast ${provenance.version}, ${provenance.created_utc}; ${pathway}warming relative to ${provenance.baseline}; inputs: ${files(provenance.inputs)}${recorded}.\n` +
    `Parameters: ${Object.entries(provenance.parameters).map(([k, v]) => `${k} ${typeof v === 'number' ? +v.toPrecision(6) : v}`).join(', ')}.\n` +
    (provenance.notes.length ? `\nNotes:\n\n${provenance.notes.map((n) => `- ${markdownText(n)}`).join('\n')}\n` : '') +
    `\n${provenance.caution}\n`
  );
}

/**
 * A note as the text of one Markdown list item: line breaks become spaces, and backslashes and `<`
 * are escaped so that `prob_above_<t>` is not read as an HTML tag.
 */
function markdownText(text: string): string {
  return text.replace(/\r\n|\r|\n/g, ' ').replace(/\\/g, '\\\\').replace(/</g, '\\<');
}

/**
 * The files a read pathway came from, for provenance and overwrite protection: the pathway file and,
 * when it was spliced, the bundled history.
 */
export function pathwayInputs(read: ReadPathwayResult): string[] {
  return read.pathway.provenance.spliceYear !== undefined ? [read.parsed.file, join(bundledPathwaysDir(), 'history.csv')] : [read.parsed.file];
}
