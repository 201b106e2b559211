import { energyBalance } from '../climate/energy-balance.js';
import { abruptResponse, type TwoBoxParams } from '../climate/two-box.js';
import { propagateTwoBoxInto } from '../climate/two-box-step.js';
import { forcingByAgent } from '../forcing/agents.js';
import { loadHistory } from '../io/bundled-pathways.js';
import type { PublishedCheck, VerificationRow } from './published-check.js';

/**
 * CMIP5-mean-like two-layer parameters (Geoffroy et al. 2013b, Table 3, from memory; used as a
 * plausible case, not a target): C 7.3, C_d 106 W yr m-2 K-1, lambda 1.13, gamma 0.73 W m-2 K-1,
 * efficacy 1.28.
 */
const CMIP5_LIKE: TwoBoxParams = { upperHeatCapacity: 7.3, deepHeatCapacity: 106, feedbackWm2K: 1.13, exchangeWm2K: 0.73, deepEfficacy: 1.28 };

/**
 * The two-box step against the analytic response to an abrupt forcing of 3.93 W m-2 (Geoffroy et
 * al. 2013a, eqs. 15-16): the largest difference in surface or deep temperature over 500 years, and
 * the equilibrium F / lambda after 6,000 years.
 */
export const twoBoxAnalytic: PublishedCheck = {
  id: 'two-box-analytic',
  run: () => {
    const forcing = 3.93;
    const years = 6000;
    const f = new Float64Array(years + 1).fill(forcing);
    const t = new Float64Array(f.length);
    const d = new Float64Array(f.length);
    propagateTwoBoxInto(CMIP5_LIKE, f, t, d);
    let worst = 0;
    for (let k = 0; k <= 500; k++) {
      const exact = abruptResponse(CMIP5_LIKE, forcing, k);
      worst = Math.max(worst, Math.abs(t[k] - exact.surfaceK), Math.abs(d[k] - exact.deepK));
    }
    const equilibrium = forcing / CMIP5_LIKE.feedbackWm2K;
    const rows: VerificationRow[] = [
      {
        check: 'two-box step vs analytic abrupt 3.93 W m-2 response, 0-500 yr (C 7.3, Cd 106, lambda 1.13, gamma 0.73, eps 1.28)',
        source: 'Geoffroy et al. 2013a, J. Climate 26, eqs. 15-16',
        published: 'analytic solution',
        warmcast: `largest difference ${worst.toExponential(1)} K`,
        tolerance: 'at most 1e-6 K',
        pass: worst <= 1e-6,
      },
      {
        check: 'two-box equilibrium after 6000 yr of 3.93 W m-2',
        source: 'Held et al. 2010, steady state T = F / lambda',
        published: `${equilibrium.toFixed(4)} K`,
        warmcast: `${t[years].toFixed(4)} K`,
        tolerance: '±1e-6 K',
        pass: Math.abs(t[years] - equilibrium) <= 1e-6,
      },
    ];
    return rows;
  },
};

/**
 * The two-box step against odex, the ODE integration it replaced as the default (rtol = atol =
 * 1e-10), on the bundled history's total forcing for three parameter sets spanning CMIP-like fits:
 * the largest difference in surface temperature over 1750-2024.
 */
export const twoBoxOdex: PublishedCheck = {
  id: 'two-box-odex',
  run: () => {
    const history = loadHistory();
    const s = history.series;
    const forcing = forcingByAgent(history.years.length, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, { co2Formula: 'ar6' }).total;
    const sets: TwoBoxParams[] = [
      CMIP5_LIKE,
      { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.31, exchangeWm2K: 1.02, deepEfficacy: 1 },
      { upperHeatCapacity: 4, deepHeatCapacity: 300, feedbackWm2K: 0.6, exchangeWm2K: 0.5, deepEfficacy: 1.5 },
    ];
    let worst = 0;
    for (const p of sets) {
      const exact = energyBalance(p, forcing, 'exact').surfaceK;
      const ode = energyBalance(p, forcing, 'odex').surfaceK;
      for (let k = 0; k < forcing.length; k++) worst = Math.max(worst, Math.abs(exact[k] - ode[k]));
    }
    return [
      {
        check: 'two-box step vs odex integration of the ODE, history forcing 1750-2024, three parameter sets',
        source: 'Held et al. 2010; Geoffroy et al. 2013b, eq. 1 (the ODE)',
        published: 'the ODE, integrated',
        warmcast: `largest difference ${worst.toExponential(1)} K`,
        tolerance: 'at most 1e-6 K',
        pass: worst <= 1e-6,
      },
    ];
  },
};
