import { CALIBRATED_SET_CAUTION } from './standard-cautions.js';
import type { Comparison } from '../metrics/compare-pathways.js';

/**
 * The sentence on uncertainty a comparison's reports carry: which pathways have ensemble ranges
 * and what those ranges cover; undefined when none has one (standardCautions then says that no
 * range is shown).
 *
 * @param c the comparison
 * @param where `with-charts` (default) for a report whose charts shade the ranges (HTML), `text` for
 *   one without charts (the terminal, Markdown, the provenance of every file)
 * @example
 * comparisonUncertainty(c) // 'Ranges (shaded; 5-95 % in brackets) are shown for delayed: ...'
 */
export function comparisonUncertainty(c: Comparison, where: 'with-charts' | 'text' = 'with-charts'): string | undefined {
  const withRange = c.pathways.filter((p) => p.range).map((p) => p.label);
  if (withRange.length === 0) return undefined;
  const without = c.pathways.filter((p) => !p.range).map((p) => p.label);
  return (
    `Ranges are shown for ${withRange.join(', ')}: ` +
    'the 5-95 % (very likely) range in brackets' +
    (where === 'text' ? ', ' : ', shaded in the charts with the 17-83 % (likely) range darker, ') +
    'across the sampled model parameters. They cover parameter uncertainty only; uncertainty in the pathway ' +
    'itself and in the model structure comes on top. The members come from the calibrated parameter set: a broad prior over the ' +
    'two-box physics, forcing multipliers and carbon cycle, weighted by how well each member reproduces the observed warming, ocean heat uptake, carbon sinks and AR6 aerosol forcing. ' +
    CALIBRATED_SET_CAUTION +
    (c.pathways.some((p) => p.range && p.co2Gtco2)
      ? ' Each member of an emission-driven pathway also runs its own CO2 cycle, responding to its own warming, with its own multipliers on the ' +
        'pre-industrial iIRF100 of the carbon-cycle feedback and on its warming sensitivity; CH4 and N2O follow one central run.'
      : '') +
    (without.length > 0 ? ` ${without.join(', ')}: single central estimates, no range.` : '')
  );
}
