/**
 * The cautions every report shows, in order: what kind of estimate this is, what uncertainty is
 * shown, and where decisions should look instead.
 *
 * @param uncertainty one or two sentences on the uncertainty shown (e.g. which ensemble ranges);
 *   when omitted, the text says that no range is shown
 * @example
 * standardCautions().length // 3
 */
export function standardCautions(uncertainty?: string): string[] {
  return [
    'These are reduced-complexity, global-mean estimates: one global surface temperature from a two-box energy balance model ' +
      'driven by published forcing formulas. They say nothing about regional change, extremes, sea level or abrupt changes.',
    uncertainty ??
      'No uncertainty range is shown: each line is a single central estimate from one set of model parameters, and the real ' +
        'outcome could be notably warmer or cooler. An ensemble run shows the spread from parameter uncertainty; uncertainty in ' +
        'the pathway itself and in the model structure comes on top.',
    'For decisions, defer to the official assessments (the IPCC reports) and to the guidance that applies in your own jurisdiction.',
  ];
}

/**
 * What every range drawn from the calibrated set carries (src/ensemble/CALIBRATION.md): the set is
 * narrower than IPCC AR6's assessed ranges and probably leans low in sensitivity, since its
 * likelihood has no pattern-effect or model-error term. `--prior` gives the unconstrained spread.
 */
export const CALIBRATED_SET_CAUTION =
  "The calibrated set's ranges are narrower than the IPCC AR6 assessed ranges (its TCR and ECS sit in the lower part of AR6's likely ranges) " +
  'and probably lean low in sensitivity: its fit to the observed record has no pattern-effect or model-error term. Read its probabilities as ' +
  'narrower than the real uncertainty; --prior shows the spread before the record is used.';

/**
 * The one caution line a terminal prints under the results, pointing to the full cautions, which
 * every file and `--help` carry.
 *
 * @param command the command, for its `--help`
 * @param ranged whether ranges across members are shown
 * @example shortCaution('run', false) // 'a reduced-complexity global-mean estimate from one set of parameters, no range; ...'
 */
export function shortCaution(command: string, ranged: boolean): string {
  return (
    (ranged
      ? 'reduced-complexity global-mean estimates; ranges cover model parameters only, not the pathway or the model structure, and are narrower than AR6\'s'
      : 'a reduced-complexity global-mean estimate from one set of parameters, with no range') +
    `; read the full cautions (warmcast ${command} --help, or any output file) before using these numbers`
  );
}
