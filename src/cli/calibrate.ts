import { Command } from 'commander';
import { paramsToJson } from '../climate/params.js';
import { twoBoxModes } from '../climate/two-box.js';
import type { CliIo } from './cli-io.js';
import { addModelOptions, numberOption, resolveModelParams, type ModelOptions } from './options.js';

interface CalibrateOptions extends ModelOptions {
  upperHeatCapacity?: number;
  deepHeatCapacity?: number;
  deepEfficacy?: number;
  forcing2x?: number;
}

/** `warmcast calibrate`: derive the two-box parameters from ECS and TCR; JSON on stdout, notes on stderr. */
export function calibrateCommand(io: CliIo): Command {
  const cmd = new Command('calibrate')
    .description('derive model parameters from ECS and TCR; prints the JSON that --params reads')
    .option('--upper-heat-capacity <value>', 'upper-box heat capacity, W yr m-2 K-1 (default 8)', numberOption('--upper-heat-capacity'))
    .option('--deep-heat-capacity <value>', 'deep-ocean heat capacity, W yr m-2 K-1 (default 100)', numberOption('--deep-heat-capacity'))
    .option('--deep-efficacy <value>', 'deep-ocean heat-uptake efficacy (default 1)', numberOption('--deep-efficacy'))
    .option('--forcing-2x <wm2>', 'ERF of doubled CO2, W m-2 (default: the formula\'s own, 3.93 for ar6)', numberOption('--forcing-2x'));
  addModelOptions(cmd)
    .addHelpText('after', '\nExample:\n  warmcast calibrate --ecs 3 --tcr 1.8 > params.json\n  warmcast run delayed --params params.json\n')
    .action((opts: CalibrateOptions) => {
      const { params, notes } = resolveModelParams(
        { ...opts },
        io,
        {
          upperHeatCapacity: opts.upperHeatCapacity,
          deepHeatCapacity: opts.deepHeatCapacity,
          deepEfficacy: opts.deepEfficacy,
          forcing2xWm2: opts.forcing2x,
        },
      );
      io.stdout(JSON.stringify(paramsToJson(params), null, 2) + '\n');
      const m = twoBoxModes(params);
      io.stderr(
        `calibrated: lambda = ${params.feedbackWm2K.toFixed(4)} W m-2 K-1 (F2x ${params.forcing2xWm2.toFixed(3)} / ECS ${params.ecsK}), ` +
          `gamma = ${params.exchangeWm2K.toFixed(4)} W m-2 K-1 gives TCR ${params.tcrK.toFixed(4)} K (mean of years 61-80, 1 %/yr CO2); ` +
          `time scales ${m.tauFast.toFixed(1)} yr and ${m.tauSlow.toFixed(0)} yr\n`,
      );
      for (const note of notes) io.stderr(`note: ${note}\n`);
    });
  return cmd;
}
