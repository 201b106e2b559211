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
      ? 'reduced-complexity global-mean estimates; ranges cover sampled model parameters only, not the pathway or the model structure'
      : 'a reduced-complexity global-mean estimate from one set of parameters, with no range') +
    `; read the full cautions (warmcast ${command} --help, or any output file) before using these numbers`
  );
}
