import { shardFileBytes } from './shard-file.js';

/** What an ensemble run or a merge would allocate, estimated before it starts. */
export interface MemoryEstimate {
  /** Bytes allocated for the members, their statistics and any shard text (Node itself, about 40 MB, not included). */
  bytes: number;
  /** Values in the largest single typed array (engines cap a typed array's length). */
  largestArray: number;
  /** Characters of the largest text built at once: a shard file's, written or read (engines cap a string's length). */
  largestText: number;
}

/**
 * Per member: its parameters (up to about 24 values: the two-box ones, a scale per forcing agent and
 * a few more) and the run's per-member scratch (state, step coefficients, forcing at both ends of
 * the year, 14 values), Float64 each.
 */
const PARAMETER_BYTES = 24 * 8;
const SCRATCH_BYTES = 14 * 8;
/** Per member of an emission-driven run: its carbon-cycle state (four boxes and a few sums). */
const CARBON_STATE_BYTES = 200;
/**
 * Copies of a shard file's text alive at once while it is written or read: the base64 strings, the
 * JSON text (built with room to grow) and its UTF-8 bytes; 5 covers the measured 4.2 (a 20,000-member
 * shard over 1750-2150: 434 MB peak above a 10,000-member one, for 87 MB of text per 20,000 members).
 */
const SHARD_TEXT_COPIES = 5;

/**
 * Estimates the memory of an ensemble run of `members` members over `years` years, as runEnsemble
 * allocates it: every member-year of warming (8 bytes each: 44 MB for 10,000 members over
 * 1750-2300), the members' parameters and scratch, and for a shard its file's text (about 5 copies
 * of shardFileBytes).
 *
 * @param members members this run computes (a shard's own, not the whole ensemble's)
 * @param years years of the run
 * @param options `emissionDriven`: members carry a carbon cycle; `shard`: the members are written as a shard file
 * @example ensembleMemory(10_000, 551, {}).bytes // ≈ 47 MB
 */
export function ensembleMemory(members: number, years: number, options: { emissionDriven?: boolean; shard?: boolean }): MemoryEstimate {
  const text = options.shard ? shardFileBytes(members, years) : 0;
  const perMember = years * 8 + PARAMETER_BYTES + SCRATCH_BYTES + (options.emissionDriven ? CARBON_STATE_BYTES : 0);
  return { bytes: members * perMember + SHARD_TEXT_COPIES * text, largestArray: years * members, largestText: text };
}

/**
 * Shard texts' worth of memory a merge holds beyond the merged members: the file's bytes and text,
 * the parsed base64 strings, the decoded bytes, and the garbage of shards already merged, which the
 * engine collects lazily. Measured peaks (`warmcast merge` over 1750-2150, shards of 20,000 members,
 * 87 MB each): 0.90 GB for 80,000 members in 4 shards, 1.24 GB for 160,000 in 8, Node's own 40 MB
 * taken off; 8 texts reproduce both to within 15 %, erring high.
 */
const MERGE_TEXT_COPIES = 8;

/**
 * Estimates the memory of merging shards into an ensemble of `membersTotal` members over `years`
 * years: every member-year of the whole ensemble (8 bytes each: 4.4 GB for a million members over
 * 1750-2300), its parameters and percentile scratch, and the largest shard while it is read (its
 * file's text in several copies and its decoded values; see MERGE_TEXT_COPIES).
 *
 * @param membersTotal members of the whole ensemble
 * @param years years of the run
 * @param shardMembers members of the largest shard
 * @example mergeMemory(1_000_000, 551, 10_000).bytes // ≈ 5.0e9 (5.0 GB)
 */
export function mergeMemory(membersTotal: number, years: number, shardMembers: number): MemoryEstimate {
  const text = shardFileBytes(shardMembers, years);
  const perMember = years * 8 + PARAMETER_BYTES;
  const shard = MERGE_TEXT_COPIES * text + shardMembers * (years * 8 + PARAMETER_BYTES);
  return { bytes: membersTotal * perMember + shard, largestArray: membersTotal * years, largestText: text };
}
