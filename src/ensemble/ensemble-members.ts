import type { Co2Formula } from '../forcing/co2.js';
import type { MemberParameters } from './member-parameters.js';
import type { MemberPeaks } from './member-peaks.js';

/**
 * What defines an ensemble, apart from which members a piece of it holds. Two pieces merge only
 * when their configurations are identical.
 */
export interface EnsembleConfig {
  /** Where the members come from and how they are drawn (MemberSource.scheme). */
  scheme: string;
  /** How the members were made, one sentence each (MemberSource.notes). */
  sourceNotes: string[];
  /** Random seed, integer in [0, 2^32). */
  seed: number;
  /** Members of the whole ensemble (all shards together). */
  membersTotal: number;
  /** First year of the annual grid. */
  firstYear: number;
  /** Number of years. */
  yearCount: number;
  /** Baseline of the warming values, inclusive years. */
  baseline: [number, number];
  /** Warming levels for exceedance probabilities, K. */
  thresholds: number[];
  /** Years at which crossing probabilities are reported. */
  milestones: number[];
  /** CO2 formula of the input forcing. */
  co2Formula: Co2Formula;
  /**
   * True when members run the carbon cycle on the pathway's CO2 emissions (and draw the carbon-cycle
   * multiplier); false for concentration-driven ensembles.
   */
  emissionDriven: boolean;
  /** Checksum of the input forcing series (FNV-1a over their bytes), to refuse merging different pathways. */
  inputChecksum: string;
}

/**
 * What an ensemble was made from, as its shard files record it for `warmcast merge` (which does not
 * read the pathway again): the pathway's name, its input files with their SHA-256, and the notes on
 * how it was read (interpolation, history splice, emission handling).
 */
export interface EnsembleOrigin {
  /** The pathway's display name (its `# name:` metadata or file name). */
  pathway: string;
  /** The files it was read from, as paths when the shard was written, with their SHA-256 (hex). */
  inputs: { path: string; sha256: string }[];
  /** Notes on the pathway and the ensemble input, for provenance. */
  notes: string[];
}

/**
 * The raw members of an ensemble or of one shard of it: every member's yearly warming and
 * parameters. Everything an ensemble reports is computed from this, so shards holding it merge into
 * exactly what one run gives.
 */
export interface EnsembleMembers {
  config: EnsembleConfig;
  /** Which shard this is (1-based index of `count`); undefined for a whole ensemble. */
  shard?: { index: number; count: number };
  /** Global index of the first member held. */
  memberStart: number;
  /** Members held. */
  memberCount: number;
  /** Warming relative to the baseline mean, K, year-major: year k of member memberStart + r at k * memberCount + r. */
  warmingK: Float64Array;
  /** Each member's parameters. */
  parameters: MemberParameters;
  /**
   * Each member's peak (highest annual warming and its year index), as the run found it; absent for
   * merged shards (shard files do not hold it), whose summary finds it in `warmingK`, bit for bit the same.
   */
  peaks?: MemberPeaks;
  /** Unphysical draws discarded while drawing these members. */
  redraws: number;
  /** What the ensemble was made from, when known (recorded in shard files; absent in older ones). */
  origin?: EnsembleOrigin;
}

/**
 * An ensemble's members without their yearly warming: what a run that streamed its members (without
 * keepMembers) holds, its statistics having been computed on the way.
 */
export type EnsembleMemberParameters = Omit<EnsembleMembers, 'warmingK'>;
