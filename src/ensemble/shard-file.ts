import { InputError, type InputProblem } from '../errors.js';
import type { EnsembleConfig, EnsembleMembers, EnsembleOrigin } from './ensemble-members.js';
import { TWO_BOX_KEYS, type MemberParameters } from './member-parameters.js';

/** The `format` field of a shard file. */
export const SHARD_FORMAT = 'warmcast-ensemble-shard';
/** Version of the shard layout. */
export const SHARD_VERSION = 3;

/** Member parameters a shard file is sized for (the two-box ones, a scale per agent and a few more). */
const PARAMETERS_PER_MEMBER = 24;

/**
 * Bytes of a shard file: every member's yearly warming and its parameters (up to about 24) as
 * little-endian Float64 in base64 (4/3 of 8 bytes per value), plus under 8 kB of description (the
 * pathway's name, files and notes, where the members come from).
 * @example shardFileBytes(10_000, 551) // ≈ 60 MB
 */
export function shardFileBytes(members: number, years: number): number {
  return Math.ceil(((members * (years + PARAMETERS_PER_MEMBER) * 8) / 3) * 4) + 8000;
}

/**
 * Writes members (a shard, or a whole ensemble) as the JSON text of a shard file. The values are
 * stored exactly (Float64 bit patterns in base64), so merging shard files gives bit for bit what one
 * run gives; the size is given by {@link shardFileBytes} (about 5.9 kB per member for 1750-2300).
 * `members.origin`, when given, is stored as `pathway` (name, input files with SHA-256, notes), so
 * that a merge can report what the ensemble was made from; files without it still read and merge.
 *
 * @param members from runEnsemble(...).members, with the origin set by the caller that read the pathway
 * @returns JSON text
 * @example writeFile('shard-3.json', shardToJson(result.members)) // in src/cli
 */
export function shardToJson(members: EnsembleMembers): string {
  const c = members.config;
  return JSON.stringify({
    format: SHARD_FORMAT,
    version: SHARD_VERSION,
    note: 'Raw members of a warmcast ensemble; combine all shards of one ensemble with `warmcast merge`.',
    config: {
      scheme: c.scheme,
      seed: c.seed,
      members_total: c.membersTotal,
      first_year: c.firstYear,
      year_count: c.yearCount,
      baseline: c.baseline,
      thresholds: c.thresholds,
      milestones: c.milestones,
      co2_formula: c.co2Formula,
      source_notes: c.sourceNotes,
      emission_driven: c.emissionDriven,
      input_checksum: c.inputChecksum,
    },
    ...(members.origin ? { pathway: { name: members.origin.pathway, inputs: members.origin.inputs, notes: members.origin.notes } } : {}),
    shard: members.shard ?? null,
    member_start: members.memberStart,
    member_count: members.memberCount,
    redraws: members.redraws,
    encoding: 'float64 little-endian, base64; warming_k year-major (year k of member member_start + r at k * member_count + r)',
    warming_k: float64ToBase64(members.warmingK),
    parameters: Object.fromEntries(Object.entries(members.parameters.values).map(([key, values]) => [key, float64ToBase64(values!)])),
  });
}

/**
 * Reads the JSON text of a shard file back into members, checking its structure.
 *
 * @param text file content
 * @param file the file's name, for messages
 * @throws InputError (exit 2) listing what is wrong: not JSON, not a shard file, a missing or
 *   malformed field, or data of the wrong length
 */
export function shardFromJson(text: string, file: string): EnsembleMembers {
  const problems: InputProblem[] = [];
  const problem = (field: string, message: string, expected?: string) =>
    problems.push({ file, key: field, code: 'input.bad-shard', message, ...(expected ? { expected } : {}) });
  let doc: Record<string, unknown>;
  try {
    doc = JSON.parse(text) as Record<string, unknown>;
  } catch (e) {
    throw new InputError([{ file, code: 'input.bad-shard', message: `must be a JSON shard file (${(e as Error).message})` }]);
  }
  if (doc === null || typeof doc !== 'object' || doc.format !== SHARD_FORMAT) {
    throw new InputError([{ file, code: 'input.bad-shard', message: `must be a warmcast ensemble shard file (format "${SHARD_FORMAT}")` }]);
  }
  if (doc.version !== SHARD_VERSION) {
    throw new InputError([{ file, code: 'input.bad-shard', message: `must be shard format version ${SHARD_VERSION}, got ${JSON.stringify(doc.version)}` }]);
  }
  const cfg = (isObject(doc.config) ? doc.config : {}) as Record<string, unknown>;
  if (!isObject(doc.config)) problem('config', 'must be an object');
  const int = (value: unknown, field: string, min = 0): number => {
    if (typeof value === 'number' && Number.isInteger(value) && value >= min) return value;
    problem(field, `must be a whole number of at least ${min}`);
    return NaN;
  };
  const numbers = (value: unknown, field: string): number[] => {
    if (Array.isArray(value) && value.every((v) => typeof v === 'number' && Number.isFinite(v))) return value as number[];
    problem(field, 'must be a list of numbers');
    return [];
  };
  const seed = int(cfg.seed, 'config.seed');
  const membersTotal = int(cfg.members_total, 'config.members_total', 1);
  const firstYear = int(cfg.first_year, 'config.first_year');
  const yearCount = int(cfg.year_count, 'config.year_count', 1);
  const baseline = numbers(cfg.baseline, 'config.baseline');
  if (baseline.length !== 2) problem('config.baseline', 'must be two years [from, to]');
  const thresholds = numbers(cfg.thresholds, 'config.thresholds');
  const milestones = numbers(cfg.milestones, 'config.milestones');
  if (cfg.co2_formula !== 'ar6' && cfg.co2_formula !== 'log') problem('config.co2_formula', 'must be "ar6" or "log"');
  if (typeof cfg.scheme !== 'string') problem('config.scheme', 'must be a string');
  if (typeof cfg.emission_driven !== 'boolean') problem('config.emission_driven', 'must be true or false');
  if (typeof cfg.input_checksum !== 'string') problem('config.input_checksum', 'must be a string');
  const sourceNotes = Array.isArray(cfg.source_notes) && cfg.source_notes.every((x) => typeof x === 'string') ? (cfg.source_notes as string[]) : [];
  if (sourceNotes !== cfg.source_notes) problem('config.source_notes', 'must be a list of strings');

  let shard: { index: number; count: number } | undefined;
  if (doc.shard !== null) {
    const s = (isObject(doc.shard) ? doc.shard : {}) as Record<string, unknown>;
    shard = { index: int(s.index, 'shard.index', 1), count: int(s.count, 'shard.count', 1) };
  }
  const origin = doc.pathway === undefined ? undefined : readOrigin(doc.pathway, problem);
  const memberStart = int(doc.member_start, 'member_start');
  const memberCount = int(doc.member_count, 'member_count', 1);
  const redraws = int(doc.redraws, 'redraws');
  const warmingK = base64ToFloat64(doc.warming_k, memberCount * yearCount, 'warming_k', problem);
  const stored = (isObject(doc.parameters) ? doc.parameters : {}) as Record<string, unknown>;
  for (const key of TWO_BOX_KEYS) if (!(key in stored)) problem(`parameters.${key}`, 'must be given (base64 Float64 values, one per member)');
  const values = Object.fromEntries(Object.entries(stored).map(([key, text]) => [key, base64ToFloat64(text, memberCount, `parameters.${key}`, problem)]));
  const parameters: MemberParameters = { count: memberCount, values: values as MemberParameters['values'] };
  if (problems.length > 0) throw new InputError(problems);

  const config: EnsembleConfig = {
    scheme: cfg.scheme as string,
    seed,
    membersTotal,
    firstYear,
    yearCount,
    baseline: [baseline[0], baseline[1]],
    thresholds,
    milestones,
    co2Formula: cfg.co2_formula as EnsembleConfig['co2Formula'],
    sourceNotes,
    emissionDriven: cfg.emission_driven as boolean,
    inputChecksum: cfg.input_checksum as string,
  };
  return { config, shard, memberStart, memberCount, warmingK, parameters, redraws, ...(origin ? { origin } : {}) };
}

/** The optional `pathway` record: { name, inputs: [{ path, sha256 }], notes }. */
function readOrigin(value: unknown, problem: (field: string, message: string) => void): EnsembleOrigin | undefined {
  const v = (isObject(value) ? value : {}) as Record<string, unknown>;
  const inputs = Array.isArray(v.inputs) ? v.inputs : [];
  const goodInputs = Array.isArray(v.inputs) && inputs.every((i) => isObject(i) && typeof (i as Record<string, unknown>).path === 'string' && /^[0-9a-f]{64}$/.test(String((i as Record<string, unknown>).sha256)));
  const goodNotes = Array.isArray(v.notes) && v.notes.every((n) => typeof n === 'string');
  if (!isObject(value) || typeof v.name !== 'string' || !goodInputs || !goodNotes) {
    problem('pathway', 'must be { "name": text, "inputs": [{ "path": text, "sha256": 64 hex digits }], "notes": [text] }');
    return undefined;
  }
  return {
    pathway: v.name as string,
    inputs: (inputs as { path: string; sha256: string }[]).map(({ path, sha256 }) => ({ path, sha256 })),
    notes: [...(v.notes as string[])],
  };
}

function isObject(value: unknown): value is object {
  return value !== null && typeof value === 'object' && !Array.isArray(value);
}

const LITTLE_ENDIAN = new Uint8Array(Float64Array.of(1).buffer)[7] === 0x3f;

function float64ToBase64(values: Float64Array): string {
  if (LITTLE_ENDIAN) return Buffer.from(values.buffer, values.byteOffset, values.byteLength).toString('base64');
  const bytes = new DataView(new ArrayBuffer(values.length * 8));
  for (let i = 0; i < values.length; i++) bytes.setFloat64(i * 8, values[i], true);
  return Buffer.from(bytes.buffer).toString('base64');
}

function base64ToFloat64(value: unknown, length: number, field: string, problem: (field: string, message: string, expected?: string) => void): Float64Array {
  const out = new Float64Array(Number.isInteger(length) ? length : 0);
  if (typeof value !== 'string' || !/^[A-Za-z0-9+/]*={0,2}$/.test(value)) {
    problem(field, 'must be base64 text');
    return out;
  }
  const bytes = Buffer.from(value, 'base64');
  if (bytes.length !== out.length * 8) {
    problem(field, `must hold ${out.length} Float64 values (${out.length * 8} bytes), got ${bytes.length} bytes`);
    return out;
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let i = 0; i < out.length; i++) out[i] = view.getFloat64(i * 8, true);
  return out;
}
