import { InputError, type InputProblem } from '../errors.js';
import type { EnsembleConfig, EnsembleMembers, EnsembleOrigin } from './ensemble-members.js';
import { shardRange } from './run-ensemble.js';
import { emptyMemberParameters } from './member-parameters.js';

/** One shard as read from a file. */
export interface ShardInput {
  /** File name, for messages. */
  file: string;
  /** Its members (from shardFromJson). */
  members: EnsembleMembers;
}

/** Collects shards one at a time (so a caller can drop each file's data once added). */
export interface ShardMerger {
  /** Checks a shard against the first one and copies its members into place. */
  add(shard: ShardInput): void;
  /**
   * The whole ensemble's members.
   * @throws InputError listing every problem found by `add` and any missing shards
   */
  finish(): EnsembleMembers;
}

/**
 * Combines the shards of one ensemble into the whole ensemble's members, in member order, so that
 * summarizeEnsemble of the result equals, bit for bit, what one run of all members gives. Shards may
 * come in any order; every shard 1..N of the same ensemble must be there exactly once.
 *
 * @param shards the shard files' members
 * @returns the members of the whole ensemble (no `shard`), with the pathway `origin` the shards
 *   record (none when no shard records it, as in files from before it was recorded)
 * @throws InputError when a file holds a whole ensemble rather than a shard, comes from a different
 *   ensemble (seed, pathway, years, baseline, thresholds, sampling or member count differ), records
 *   a different pathway origin (name, file SHA-256 or notes) than another shard, repeats a shard, or
 *   shards are missing
 * @example summarizeEnsemble(mergeShards(files.map((file) => ({ file, members: shardFromJson(read(file), file) }))))
 */
export function mergeShards(shards: ShardInput[]): EnsembleMembers {
  const merger = shardMerger();
  for (const s of shards) merger.add(s);
  return merger.finish();
}

/**
 * The incremental form of {@link mergeShards}. Memory: the merged warming takes 8 bytes per
 * member-year (4.4 GB for a million members over 1750-2300), allocated at the first shard; each
 * shard's own data can be released once added.
 *
 * @example
 * const merger = shardMerger();
 * for (const file of files) merger.add({ file, members: shardFromJson(readFileSync(file, 'utf8'), file) });
 * const members = merger.finish();
 */
export function shardMerger(): ShardMerger {
  const problems: InputProblem[] = [];
  const byIndex = new Map<number, string>();
  let first: ShardInput | undefined;
  let reference = '';
  let merged: EnsembleMembers | undefined;
  // The first recorded origin (older shard files have none) and the file it came from.
  let origin: { file: string; origin: EnsembleOrigin } | undefined;

  return {
    add(s: ShardInput): void {
      const m = s.members;
      if (!m.shard) {
        problems.push({ file: s.file, code: 'input.not-a-shard', message: 'must be a shard (written with --shard K/N); it holds a whole ensemble' });
        return;
      }
      if (!first) {
        first = s;
        reference = JSON.stringify(m.config);
        const n = m.config.yearCount;
        merged = {
          config: m.config,
          memberStart: 0,
          memberCount: m.config.membersTotal,
          warmingK: new Float64Array(m.config.membersTotal * n),
          parameters: emptyMemberParameters(m.config.membersTotal, Object.keys(m.parameters.values)),
          redraws: 0,
        };
      }
      const base = first.members;
      if (JSON.stringify(m.config) !== reference) {
        problems.push({
          file: s.file,
          code: 'input.shard-mismatch',
          message: `must come from the same ensemble as ${first.file}; it differs in ${joinWords(configDifferences(m.config, base.config))}`,
        });
        return;
      }
      if (m.shard.count !== base.shard!.count) {
        problems.push({ file: s.file, code: 'input.shard-mismatch', message: `must be one of ${base.shard!.count} shards like ${first.file}, but is shard ${m.shard.index}/${m.shard.count}` });
        return;
      }
      const expected = shardRange(m.config.membersTotal, m.shard);
      if (m.memberStart !== expected.from || m.memberCount !== expected.to - expected.from) {
        problems.push({
          file: s.file,
          code: 'input.bad-shard',
          message: `must hold members ${expected.from}-${expected.to - 1} as shard ${m.shard.index}/${m.shard.count}; it holds ${m.memberStart}-${m.memberStart + m.memberCount - 1}`,
        });
        return;
      }
      if (m.origin && origin) {
        const differs = originDifference(m.origin, origin.origin);
        if (differs) {
          problems.push({ file: s.file, code: 'input.shard-mismatch', message: `must come from the same pathway as ${origin.file}; ${differs}` });
          return;
        }
      }
      if (m.origin && !origin) origin = { file: s.file, origin: m.origin };
      const seen = byIndex.get(m.shard.index);
      if (seen !== undefined) {
        problems.push({ file: s.file, code: 'input.shard-repeated', message: `must not repeat shard ${m.shard.index}/${m.shard.count}, already given by ${seen}` });
        return;
      }
      byIndex.set(m.shard.index, s.file);
      const out = merged!;
      // Year-major: each year's row of this shard goes to its members' columns of the whole row.
      const total = m.config.membersTotal;
      for (let k = 0; k < m.config.yearCount; k++) {
        out.warmingK.set(m.warmingK.subarray(k * m.memberCount, (k + 1) * m.memberCount), k * total + m.memberStart);
      }
      const keys = Object.keys(m.parameters.values);
      if (keys.join() !== Object.keys(out.parameters.values).join()) {
        problems.push({ file: s.file, code: 'input.shard-mismatch', message: `must hold the same member parameters as ${first.file} (${Object.keys(out.parameters.values).join(', ')}), got ${keys.join(', ')}` });
        return;
      }
      for (const key of keys) out.parameters.values[key]!.set(m.parameters.values[key]!, m.memberStart);
      out.redraws += m.redraws;
    },

    finish(): EnsembleMembers {
      if (!first && problems.length === 0) {
        problems.push({ file: '(none)', code: 'input.shard-missing', message: 'at least one shard file must be given' });
      }
      if (first && problems.length === 0) {
        const count = first.members.shard!.count;
        const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !byIndex.has(i));
        if (missing.length > 0) {
          problems.push({ file: first.file, code: 'input.shard-missing', message: `shards ${missing.join(', ')} of ${count} must also be given to merge the whole ensemble` });
        }
      }
      if (problems.length > 0) throw new InputError(problems);
      return origin ? { ...merged!, origin: origin.origin } : merged!;
    },
  };
}

/**
 * How two ensemble configurations differ, in the words of the options that set them (`--seed (8,
 * not 7)`), this shard's value first. The input checksum is named only when nothing else about the
 * pathway differs (a different CO2 formula, kind or span of years changes the forcing too).
 */
function configDifferences(c: EnsembleConfig, ref: EnsembleConfig): string[] {
  const out: string[] = [];
  const differ = (k: keyof EnsembleConfig) => JSON.stringify(c[k]) !== JSON.stringify(ref[k]);
  const option = (k: keyof EnsembleConfig, words: string, show: (x: EnsembleConfig) => string) => {
    if (differ(k)) out.push(`${words} (${show(c)}, not ${show(ref)})`);
  };
  const span = (x: EnsembleConfig) => `${x.firstYear}-${x.firstYear + x.yearCount - 1}`;
  const kind = (x: EnsembleConfig) => (x.emissionDriven ? 'emission-driven' : 'concentration-driven');
  option('seed', '--seed', (x) => String(x.seed));
  option('membersTotal', '--members', (x) => String(x.membersTotal));
  option('thresholds', '--thresholds', (x) => x.thresholds.join(','));
  option('baseline', '--baseline', (x) => x.baseline.join('-'));
  option('co2Formula', '--co2-formula', (x) => x.co2Formula);
  if (differ('firstYear') || differ('yearCount')) out.push(`the pathway's years (${span(c)}, not ${span(ref)})`);
  option('emissionDriven', 'the kind of pathway', kind);
  if (differ('inputChecksum') && !['co2Formula', 'emissionDriven', 'firstYear', 'yearCount'].some((k) => differ(k as keyof EnsembleConfig))) {
    out.push('the pathway (another file, or its contents differ)');
  }
  option('milestones', 'the milestone years of the crossing probabilities', (x) => x.milestones.join(','));
  // An emission-driven ensemble also samples the carbon cycle: that is the kind of pathway, said above.
  if (differ('scheme') || differ('sourceNotes')) out.push('where the members come from (the shards come from different warmcast versions, parameter sets or sampling settings)');
  return out;
}

/**
 * How a shard's recorded pathway differs from the reference one, in words, or undefined when they
 * agree (same name, same files by SHA-256, same notes; paths may differ between machines).
 */
function originDifference(o: EnsembleOrigin, ref: EnsembleOrigin): string | undefined {
  const hashes = (x: EnsembleOrigin) => x.inputs.map((i) => i.sha256).join(',');
  if (o.pathway !== ref.pathway || hashes(o) !== hashes(ref)) return `it was made from ${describeOrigin(o)}, not ${describeOrigin(ref)}`;
  if (JSON.stringify(o.notes) !== JSON.stringify(ref.notes)) return 'its notes on how the pathway was read differ (read with other settings or another warmcast version)';
  return undefined;
}

/** `"Swift transition" (swift.csv sha256 f0e6870b0bd9…, history.csv sha256 59fb814be3d0…)`. */
function describeOrigin(o: EnsembleOrigin): string {
  const files = o.inputs.map((i) => `${i.path.split(/[\\/]/).pop()} sha256 ${i.sha256.slice(0, 12)}…`);
  return `"${o.pathway}" (${files.join(', ')})`;
}

/** `a`, `a and b`, `a, b and c`. */
function joinWords(words: string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
