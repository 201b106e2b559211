import { calibrate, transientResponse } from '../climate/calibrate.js';
import type { PublishedCheck, VerificationRow } from './published-check.js';

/** ECS-TCR pairs across the AR6 very likely ranges (ECS 2-5 K, TCR 1.2-2.4 K; IPCC AR6 WG1 7.5). */
const PAIRS = [
  [2, 1.2],
  [3, 1.8],
  [4, 2.2],
  [5, 2.4],
] as const;

/**
 * The calibration round trip: parameters calibrated to an ECS and a TCR give them back, ECS as
 * F2x / lambda (the model's equilibrium) and TCR as the mean warming over years 61-80 of the model's
 * own 1 %/yr CO2 run (IPCC AR6 WG1 Box 7.1 definition).
 */
export const calibrationRoundTrip: PublishedCheck = {
  id: 'calibration-round-trip',
  run: () =>
    PAIRS.map(([ecs, tcr]): VerificationRow => {
      const p = calibrate({ ecsK: ecs, tcrK: tcr });
      const ecsBack = p.forcing2xWm2 / p.feedbackWm2K;
      const tcrBack = transientResponse(p);
      const worst = Math.max(Math.abs(ecsBack - ecs), Math.abs(tcrBack - tcr));
      return {
        check: `calibrated to ECS ${ecs} K, TCR ${tcr} K: the model's own ECS and TCR`,
        source: 'IPCC AR6 WG1 Box 7.1 definitions (ECS: equilibrium of 2xCO2; TCR: years 61-80 of 1 %/yr CO2)',
        published: `ECS ${ecs} K, TCR ${tcr} K`,
        warmcast: `ECS ${ecsBack.toFixed(6)} K, TCR ${tcrBack.toFixed(6)} K`,
        tolerance: '±1e-6 K',
        pass: worst <= 1e-6,
      };
    }),
};
