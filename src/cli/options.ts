import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { InvalidArgumentError, Option, type Command } from 'commander';
import { calibrate, type CalibrationTargets } from '../climate/calibrate.js';
import { CALIBRATION_DEFAULTS, PARAM_KEYS, type ClimateParams } from '../climate/params.js';
import { ConfigError, InputError } from '../errors.js';
import { parseAbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { AR6_REFERENCE_PERIOD, wrap } from '../report/index.js';
import { parseParams } from '../io/read-params.js';
import { readCalibratedSet } from '../io/read-calibrated-set.js';
import { representativeParams } from '../ensemble/calibrated-set.js';
import type { CliIo } from './cli-io.js';
import { unreadableReason } from './unreadable-reason.js';

/**
 * A number written in decimal: optional sign, digits with an optional point, optional exponent
 * (`2.5`, `-1`, `.5`, `1e6`). JavaScript's Number() also reads hexadecimal, binary and octal
 * (`0x10` is 16), `Infinity`, and an empty or blank text as 0; none of these is what a user means.
 */
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/** The value of decimal text (surrounding spaces allowed), or NaN for anything else. */
function decimalValue(text: string): number {
  const t = text.trim();
  return DECIMAL.test(t) ? Number(t) : NaN;
}

/**
 * Coerces a finite decimal number option (`2.5`, `-1`, `1e-10`); hexadecimal, `Infinity`, empty
 * and blank text are refused.
 * @example numberOption('--ecs')('4.5') // 4.5
 */
export function numberOption(name: string) {
  return (text: string): number => {
    const v = decimalValue(text);
    if (!Number.isFinite(v)) throw new InvalidArgumentError(`${name} must be a decimal number such as 2.5, got "${text}"`);
    return v;
  };
}

/**
 * Coerces a whole number of at least `min`, written in decimal digits; exponent notation that is
 * an exact whole number (`1e6`) is accepted, hexadecimal (`0x10`), fractions, empty and blank text
 * are not.
 * @example wholeNumberOption('--members', 1)('1e6') // 1000000
 */
export function wholeNumberOption(name: string, min: number) {
  return (text: string): number => {
    const v = decimalValue(text);
    if (!Number.isSafeInteger(v) || v < min) {
      throw new InvalidArgumentError(`${name} must be a whole number of at least ${min} in decimal digits (exponent form such as 1e6 allowed); got "${text}"`);
    }
    return v;
  };
}

/** Coerces a whole-number year option, written in decimal digits. */
export function yearOption(text: string): number {
  const v = decimalValue(text);
  if (!Number.isInteger(v) || v < 1000 || v > 3000) throw new InvalidArgumentError(`must be a year such as 2100, got "${text}"`);
  return v;
}

/** Coerces `1850-1900` into an inclusive year range. */
export function yearRangeOption(text: string): [number, number] {
  const m = /^\s*(\d{4})\s*[-:]\s*(\d{4})\s*$/.exec(text);
  if (!m || Number(m[1]) > Number(m[2])) throw new InvalidArgumentError(`must be a year range such as 1850-1900, got "${text}"`);
  return [Number(m[1]), Number(m[2])];
}

/** Coerces a comma-separated list of decimal numbers (`1.5,2,3`); empty items are refused. */
export function numberListOption(name: string) {
  return (text: string): number[] => {
    const values = text.split(',').map(decimalValue);
    if (values.some((v) => !Number.isFinite(v))) {
      throw new InvalidArgumentError(`${name} must be decimal numbers separated by commas, such as 1.5,2,3; got "${text}"`);
    }
    return values;
  };
}

/** The default baseline period, inclusive years: the reference of the IPCC AR6 global warming levels. */
const DEFAULT_BASELINE = AR6_REFERENCE_PERIOD;

/** `--baseline <years>`, its default shown in help as it is typed (`1850-1900`). */
export function baselineOption(): Option {
  return new Option('--baseline <years>', 'baseline period for warming and for the thresholds read against it')
    .argParser(yearRangeOption)
    .default([...DEFAULT_BASELINE], DEFAULT_BASELINE.join('-'));
}

/**
 * `--co2-jump-intended`: a CO2 emission column whose first value after the history is near 12/44 of
 * the rate diagnosed from the record is refused as Gt C unless this says the fall is meant.
 */
export function co2JumpOption(): Option {
  return new Option('--co2-jump-intended', 'accept a first CO2 emission value near 12/44 of the rate the record implies (otherwise refused as Gt C typed under co2_gtco2)');
}

/**
 * `--absent-emissions <rule>`: what fills aerosol precursors, ozone precursors or halogenated gases
 * that an emission file does not give (`hold`, `follow-co2`, `zero-by-YEAR`); without it such a file
 * is refused with the choices listed.
 */
export function absentEmissionsOption(): Option {
  return new Option(
    '--absent-emissions <rule>',
    'emission files without aerosol or ozone precursors or halogenated gases: hold (present-day emissions), follow-co2 (scaled with the CO2 emissions), zero-by-YEAR (linearly to zero by then); without it such files are refused',
  ).argParser((text: string) => {
    try {
      return parseAbsentEmissionsRule(text);
    } catch (e) {
      if (e instanceof ConfigError) throw new InvalidArgumentError(e.message.replace(/^--absent-emissions /, ''));
      throw e;
    }
  });
}

/** `--thresholds <list>` (warming levels above 0 K) with `defaults`, shown in help as they are typed (`1.5,2`). */
export function thresholdsOption(description: string, defaults: number[]): Option {
  return new Option('--thresholds <list>', description).argParser(warmingLevelsOption('--thresholds')).default(defaults, defaults.join(','));
}

/**
 * Coerces a comma-separated list of warming levels (`1.5,2,3`), K above the baseline: decimal
 * numbers above 0 (a level of 0 K or below would be "reached" by the baseline itself).
 * @example warmingLevelsOption('--thresholds')('1.5,2') // [1.5, 2]
 */
export function warmingLevelsOption(name: string) {
  const list = numberListOption(name);
  return (text: string): number[] => {
    const values = list(text);
    const bad = values.filter((v) => !(v > 0));
    if (bad.length > 0) {
      throw new InvalidArgumentError(`${name} must be warming levels above 0 K (levels of warming above the baseline), such as 1.5,2,3; got ${bad.join(', ')}`);
    }
    return values;
  };
}

/** The model options shared by run, compare and calibrate (ensemble takes only --co2-formula). */
export interface ModelOptions {
  params?: string;
  ecs?: number;
  tcr?: number;
  co2Formula?: 'ar6' | 'log';
}

/**
 * Adds `--params`, `--ecs`, `--tcr` and `--co2-formula` to a command. `--co2-formula` shows its
 * default (ar6) in help, but the option is left unset when the flag is not given, so that a
 * `co2_formula` in the `--params` file still applies (`calibrate` falls back to ar6 itself).
 */
export function addModelOptions(cmd: Command): Command {
  return cmd
    .option('--params <file>', 'model parameters JSON (any subset of the keys `warmcast calibrate` prints)')
    .option('--ecs <kelvin>', 'equilibrium climate sensitivity target, K (default: the calibrated set\'s posterior median model)', numberOption('--ecs'))
    .option('--tcr <kelvin>', 'transient climate response target, K (default: the calibrated set\'s posterior median model)', numberOption('--tcr'))
    .addOption(
      new Option('--co2-formula <name>', 'CO2 forcing: ar6 (Meinshausen et al. 2020 + AR6 adjustment) or log (Myhre et al. 1998)')
        .choices(['ar6', 'log'])
        .default(CALIBRATION_DEFAULTS.co2Formula, CALIBRATION_DEFAULTS.co2Formula),
    )
    .hook('preAction', (command) => {
      if (command.getOptionValueSource('co2Formula') === 'default') command.setOptionValue('co2Formula', undefined);
    });
}

/** An option a command refuses, and why. */
export interface RefusedOption {
  /** Commander flags, e.g. `--ecs <kelvin>`. */
  flags: string;
  /** Why the command does not use it (the rest of the message names the command and the option). */
  why: string;
}

/**
 * Adds options that `cmd` does not use but that a user may well try (they exist on sister commands):
 * hidden from the help, and refused with a ConfigError (exit 2) that says why, so that a value is
 * never accepted and silently ignored.
 *
 * @example refuseOptions(cmd, [{ flags: '--ecs <kelvin>', why: 'each member draws its own ECS' }])
 * // warmcast ensemble swift --ecs 4.5 -> "ensemble does not take --ecs: each member draws its own ECS" (exit 2)
 */
export function refuseOptions(cmd: Command, refused: RefusedOption[]): Command {
  for (const { flags, why } of refused) {
    const option = new Option(flags).hideHelp();
    option.argParser(() => {
      throw new ConfigError(`${cmd.name()} does not take ${option.long}: ${why}`, option.attributeName());
    });
    cmd.addOption(option);
  }
  return cmd;
}

/**
 * Resolves the model parameters from a `--params` file, flags and `overrides` through `calibrate`.
 * Flags win over the file, and an explicit physical parameter wins over the ECS/TCR targets
 * (DESIGN.md). A target flag (`--ecs`, `--tcr`) also re-derives the physical parameters the file's
 * own calibration derived from its targets: `feedback_wm2k` (from ECS) and `exchange_wm2k` (from TCR
 * given the feedback), so `--params calibrated.json --ecs 4` keeps the file's TCR rather than its
 * gamma. Parameters chosen independently of the targets (heat capacities, efficacy, F2x, formula)
 * stay as the file gives them, and one given in `overrides` wins over everything.
 *
 * @param overrides explicit physical parameters from other flags (calibrate's heat capacities, ...)
 * @returns the parameters, the params file read, if any (for provenance), and notes saying which
 *   parameters were re-derived
 */
export function resolveModelParams(
  opts: ModelOptions,
  io: CliIo,
  overrides: CalibrationTargets = {},
): { params: ClimateParams; paramsFile?: string; notes: string[]; forcingScale: Record<string, number>; forcingNote?: string } {
  let fromFile: CalibrationTargets = {};
  let paramsFile: string | undefined;
  if (opts.params !== undefined) {
    paramsFile = resolve(io.cwd, opts.params);
    let text: string;
    try {
      text = readFileSync(paramsFile, 'utf8');
    } catch (e) {
      throw new InputError([{ file: opts.params, code: 'input.unreadable', message: `parameters file ${unreadableReason(e)}`, expected: 'a JSON file of model parameters' }]);
    }
    fromFile = parseParams(text, opts.params);
  }
  const explicit = Object.fromEntries(Object.entries(overrides).filter(([, v]) => v !== undefined)) as CalibrationTargets;
  const targets: CalibrationTargets = { ...fromFile, ...explicit };
  if (opts.ecs !== undefined) targets.ecsK = opts.ecs;
  if (opts.tcr !== undefined) targets.tcrK = opts.tcr;
  if (opts.co2Formula !== undefined) targets.co2Formula = opts.co2Formula;

  // Lambda follows from ECS, gamma from TCR given lambda: a new ECS moves both, a new TCR only gamma.
  const derived: (keyof CalibrationTargets)[] = opts.ecs !== undefined ? ['feedbackWm2K', 'exchangeWm2K'] : opts.tcr !== undefined ? ['exchangeWm2K'] : [];
  const rederived = derived.filter((k) => fromFile[k] !== undefined && explicit[k] === undefined);
  // A file that fixes gamma without stating tcr_k still implies a TCR: keep that one.
  if (rederived.includes('exchangeWm2K') && targets.tcrK === undefined) targets.tcrK = calibrate(fromFile).tcrK;
  for (const k of rederived) delete targets[k];
  // Whatever the user leaves open comes from the calibrated set's representative member (posterior
  // medians): its heat capacities, efficacy and CO2 forcing always, its lambda and gamma unless an
  // ECS or TCR target (flag or file) asks for them to be solved.
  const representative = representativeParams(readCalibratedSet());
  const fromSet: CalibrationTargets = { ...representative.targets };
  if (targets.ecsK !== undefined || targets.feedbackWm2K !== undefined) delete fromSet.feedbackWm2K;
  if (targets.ecsK !== undefined || targets.tcrK !== undefined || targets.exchangeWm2K !== undefined) delete fromSet.exchangeWm2K;
  if (targets.ecsK !== undefined && targets.feedbackWm2K === undefined && targets.tcrK === undefined) {
    // A new ECS alone keeps the set's TCR (gamma re-solved for it), as --ecs did with the old defaults.
    fromSet.tcrK = calibrate({ ...representative.targets, ...fromFile, co2Formula: targets.co2Formula }).tcrK;
  }
  const params = calibrate({ ...fromSet, ...targets });

  const notes: string[] = [];
  if (rederived.length > 0) {
    const flags = [opts.ecs !== undefined ? `--ecs ${opts.ecs}` : '', opts.tcr !== undefined ? `--tcr ${opts.tcr}` : ''].filter(Boolean).join(' and ');
    const which = opts.ecs !== undefined && opts.tcr !== undefined ? 'ECS and TCR targets' : opts.ecs !== undefined ? 'ECS target' : 'TCR target';
    notes.push(
      `${flags} overrides the ${which} of ${opts.params}, so the ${rederived.map((k) => JSON_KEY[k]).join(' and ')} it gives ` +
        `(derived from its own targets) ${rederived.length > 1 ? 'were' : 'was'} re-derived for ECS ${+params.ecsK.toFixed(4)} K and ` +
        `TCR ${+params.tcrK.toFixed(4)} K; the file's other parameters are kept`,
    );
  }
  const scaled = Object.entries(representative.forcingScale).filter(([, v]) => v !== 1);
  const forcingNote = scaled.length > 0
    ? `forcing multipliers of the calibrated set's posterior medians: ${scaled.map(([a, v]) => `${a} x${+v.toFixed(3)}`).join(', ')} (CO2 through forcing_2x_wm2)`
    : undefined;
  return { params, paramsFile, notes, forcingScale: representative.forcingScale, forcingNote };
}

/** JSON key of each calibration input, for notes. */
const JSON_KEY = Object.fromEntries(Object.entries(PARAM_KEYS).map(([json, field]) => [field, json])) as Record<keyof ClimateParams, string>;

/**
 * A pathway argument as the io layer should look it up: a path relative to the command's working
 * directory when that differs from the process's (in-process callers), else as given, so messages
 * name the file the way the user typed it. Bundled names pass through unchanged.
 */
export function pathwayArg(arg: string, io: CliIo): string {
  if (io.cwd === process.cwd()) return arg;
  const candidate = resolve(io.cwd, arg);
  return existsSync(candidate) ? candidate : arg;
}

/**
 * The full cautions as a `--help` section (the terminal output prints only a line pointing here).
 * @example cautionsHelp(['Global mean only.']) // '\nCautions:\n  - Global mean only.\n'
 */
export function cautionsHelp(cautions: readonly string[]): string {
  return `\nCautions:\n${cautions.flatMap((c) => wrap(c, HELP_WIDTH, '  - ')).join('\n')}\n`;
}

/** Width the cautions of `--help` are wrapped to (commander's own help wraps at the terminal's width, 80 by default). */
const HELP_WIDTH = 80;
