import { extname } from 'node:path';
import type { ClimateParams } from '../climate/params.js';
import { ConfigError } from '../errors.js';
import { formatCsv, formatJson, formatMarkdown, writeFileAtomic, type Table } from '../io/index.js';
import type { Projection } from '../projection/index.js';
import type { CliIo } from './cli-io.js';
import { buildProvenance } from './provenance.js';

/** A projection restricted to years from..to (inclusive); the run itself is unchanged. */
export function clipProjection(p: Projection, from?: number, to?: number): Projection {
  const first = p.years[0];
  const last = p.years[p.years.length - 1];
  const lo = from ?? first;
  const hi = to ?? last;
  if (lo < first || hi > last || lo > hi) {
    throw new ConfigError(`--from/--to (${lo}-${hi}) must lie within ${p.name}'s years ${first}-${last}`, 'from');
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

/** What {@link writeTableOutput} needs for provenance and safety. */
export interface OutputContext {
  /** Absolute paths of every input file (hashed into provenance; never overwritten). */
  inputs: string[];
  params: ClimateParams;
  baseline: readonly [number, number];
  notes: string[];
  seed?: number;
  io: CliIo;
  /** Extensions this command writes. */
  allowed: string[];
  /** Extra formats (`.svg`, `.html`) the command renders itself. */
  render?: Record<string, () => string>;
}

/**
 * Writes a table to `path` in the format its extension names, atomically, with provenance: inside
 * the file for JSON and Markdown, in a `.meta.json` sidecar for CSV (so spreadsheets get a clean
 * table). `-` writes CSV to stdout.
 *
 * @returns the paths written
 * @throws ConfigError for an extension the command does not write
 */
export function writeTableOutput(path: string, table: Table, ctx: OutputContext): string[] {
  const provenance = buildProvenance({ inputs: ctx.inputs, params: ctx.params, baseline: ctx.baseline, notes: ctx.notes, seed: ctx.seed });
  if (path === '-') {
    ctx.io.stdout(formatCsv(table));
    return [];
  }
  const ext = extname(path).toLowerCase();
  if (!ctx.allowed.includes(ext)) {
    throw new ConfigError(`--out ${path}: the extension must be one of ${ctx.allowed.join(', ')} (it picks the format)`, 'out');
  }
  const write = (target: string, content: string) => writeFileAtomic(target, content, { inputs: ctx.inputs });
  if (ext === '.csv') {
    const sidecar = path.slice(0, -ext.length) + '.meta.json';
    write(path, formatCsv(table));
    write(sidecar, JSON.stringify(provenance, null, 2) + '\n');
    return [path, sidecar];
  }
  if (ext === '.json') write(path, formatJson(table, provenance));
  else if (ext === '.md') write(path, markdownWithProvenance(table, provenance));
  else write(path, ctx.render![ext]());
  return [path];
}

function markdownWithProvenance(table: Table, provenance: ReturnType<typeof buildProvenance>): string {
  const inputs = provenance.inputs.map((i) => `${i.path} (sha256 ${i.sha256.slice(0, 12)}…)`).join('; ');
  return (
    formatMarkdown(table, 4) +
    `\nwarmcast ${provenance.version}, ${provenance.created_utc}; warming relative to ${provenance.baseline}; inputs: ${inputs}.\n` +
    `Parameters: ${Object.entries(provenance.parameters).map(([k, v]) => `${k} ${typeof v === 'number' ? +v.toPrecision(6) : v}`).join(', ')}.\n` +
    (provenance.notes.length ? `Notes: ${provenance.notes.join(' ')}\n` : '') +
    `\n${provenance.caution}\n`
  );
}
