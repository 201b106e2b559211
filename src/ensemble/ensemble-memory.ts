import { streamRows } from './member-stream.js';
import { MEMBER_PARAMETERS } from './sample-members.js';
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

/** Per member: the parameters kept for the summary, and one scratch value of each percentile selection. */
const PARAMETER_BYTES = MEMBER_PARAMETERS.length * 8;
const SELECTOR_BYTES = 8;
/** Per member of a streamed run: the propagator, forcing scales and state (14 Float64 and 2 Int32 values; member-stream.ts). */
const STREAM_STATE_BYTES = 14 * 8 + 2 * 4;
/**
 * Copies of a shard file's text alive at once while it is written or read: the base64 strings, the
 * JSON text (built with room to grow) and its UTF-8 bytes; 5 covers the measured 4.2 (a 20,000-member
 * shard over 1750-2150: 434 MB peak above a 10,000-member one, for 87 MB of text per 20,000 members).
 */
const SHARD_TEXT_COPIES = 5;

/**
 * Estimates the memory of an ensemble run of `members` members over `years` years, as
 * runEnsemble allocates it: a streamed concentration run holds a ring of 36 year-rows of all members
 * plus about 120 bytes of state per member (about 480 bytes per member: 0.48 GB for a million, of
 * which 0.46 GB measured for `warmcast ensemble swift`, 1 or 2 million members); a run that keeps
 * every member-year (a shard, or an emission pathway) holds 8 bytes per member-year, and a shard
 * also builds its file's text (about 5 copies of shardFileBytes).
 *
 * @param members members this run computes (a shard's own, not the whole ensemble's)
 * @param years years of the run
 * @param options `keep`: every member-year is kept (a shard or keepMembers); `emissionDriven`
 *   (always kept); `shard`: the members are written as a shard file; `threads` that compute
 *   percentiles (each has its own scratch, default 1)
 * @example ensembleMemory(1_000_000, 401, {}).bytes // 480,000,000 (0.48 GB)
 */
export function ensembleMemory(
  members: number,
  years: number,
  options: { keep?: boolean; emissionDriven?: boolean; shard?: boolean; threads?: number },
): MemoryEstimate {
  const kept = options.keep === true || options.shard === true || options.emissionDriven === true;
  const rows = streamRows(years, kept);
  const stream = options.emissionDriven ? 0 : STREAM_STATE_BYTES;
  const text = options.shard ? shardFileBytes(members, years) : 0;
  const perMember = rows * 8 + PARAMETER_BYTES + stream + SELECTOR_BYTES * ((options.threads ?? 1) + 1);
  return { bytes: members * perMember + SHARD_TEXT_COPIES * text, largestArray: rows * members, largestText: text };
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
  const perMember = years * 8 + PARAMETER_BYTES + 2 * SELECTOR_BYTES;
  const shard = MERGE_TEXT_COPIES * text + shardMembers * (years * 8 + PARAMETER_BYTES);
  return { bytes: membersTotal * perMember + shard, largestArray: membersTotal * years, largestText: text };
}
