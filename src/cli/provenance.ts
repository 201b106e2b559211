import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { DateTime } from 'luxon';
import { paramsToJson, type ClimateParams } from '../climate/params.js';
import type { EnsembleConfig } from '../ensemble/index.js';
import { standardCautions } from '../report/standard-cautions.js';
import { packageVersion } from './version.js';

/** Where an output came from; every file warmcast writes carries one. */
export interface Provenance {
  tool: 'warmcast';
  version: string;
  /** UTC time the output was made, ISO 8601. */
  created_utc: string;
  /** Each input file with its SHA-256. */
  inputs: { path: string; sha256: string }[];
  /** Model parameters as `--params` reads them. */
  parameters: Record<string, number | string>;
  /** Baseline of the warming columns. */
  baseline: string;
  /** The pathway's name, for ensembles and merged shards. */
  pathway?: string;
  /**
   * A merge's pathway files as its shards recorded them (path when the shard was written, SHA-256
   * then); `inputs` lists the shard files the merge read.
   */
  pathway_inputs?: { path: string; sha256: string }[];
  /** Random seed, for ensembles. */
  seed?: number;
  /** Notes on the pathways: history splice, interpolation, gases held at 1750 values. */
  notes: string[];
  /** The caution that goes with every output. */
  caution: string;
}

/** The cautions every file carries, for a single central run (ensembles pass their own uncertainty text). */
export const CAUTION = standardCautions().join(' ');

/** SHA-256 of a file's bytes, hex. */
export function sha256File(path: string): string {
  return createHash('sha256').update(readFileSync(path)).digest('hex');
}

/** What a provenance record is built from. */
export interface ProvenanceInput {
  /** Absolute paths of every input file (hashed; never overwritten by outputs). */
  inputs: string[];
  /** The parameters of a run with one parameter set (recorded as `--params` reads them). */
  params?: ClimateParams;
  /**
   * The parameters to record instead of `params`, when no single set was used: an ensemble records
   * only what it holds fixed for every member (its notes describe what it samples).
   */
  parameters?: Record<string, number | string>;
  baseline: readonly [number, number];
  /** Notes (default: the document's). */
  notes?: string[];
  seed?: number;
  /** See Provenance.pathway. */
  pathway?: string;
  /** See Provenance.pathway_inputs. */
  pathwayInputs?: { path: string; sha256: string }[];
  /** Caution text (default: the single-run cautions). */
  caution?: string;
}

/** Builds the provenance record for files read (`inputs`, absolute paths) and the parameters used (`parameters`, else `params`). */
export function buildProvenance(args: ProvenanceInput): Provenance {
  return {
    tool: 'warmcast',
    version: packageVersion(),
    created_utc: DateTime.utc().toISO() ?? new Date().toISOString(),
    inputs: [...new Set(args.inputs)].map((path) => ({ path, sha256: sha256File(path) })),
    parameters: args.parameters ?? (args.params ? paramsToJson(args.params) : {}),
    baseline: `${args.baseline[0]}-${args.baseline[1]}`,
    ...(args.pathway !== undefined ? { pathway: args.pathway } : {}),
    ...(args.pathwayInputs !== undefined ? { pathway_inputs: args.pathwayInputs } : {}),
    ...(args.seed !== undefined ? { seed: args.seed } : {}),
    notes: args.notes ?? [],
    caution: args.caution ?? CAUTION,
  };
}

/**
 * The parameters an ensemble's provenance records: only what every member shares, as `--params`
 * keys (the CO2 formula); the notes describe where the members' own parameters come from.
 */
export function ensembleParameters(c: EnsembleConfig): Record<string, number | string> {
  return { co2_formula: c.co2Formula };
}
