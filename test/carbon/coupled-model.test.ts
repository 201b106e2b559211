import { describe, expect, it } from 'vitest';
import { CH4_CYCLE, COUPLED_STATE, coupledModel, gasSinkMt, N2O_CYCLE, type GasStepInput } from '../../src/carbon/index.js';
import { calibrate } from '../../src/climate/index.js';
import { ghgForcingFunction, PREINDUSTRIAL } from '../../src/forcing/index.js';
import { expectClose } from '../asserts.js';

const I = COUPLED_STATE;
const params = calibrate();

function model(feedback: boolean) {
  return coupledModel({
    climate: params,
    ghgForcing: ghgForcingFunction({ co2Formula: 'ar6' }),
    feedback,
    co2StartPpm: PREINDUSTRIAL.co2Ppm,
    ch4: CH4_CYCLE,
    n2o: N2O_CYCLE,
    ch4NaturalMt: gasSinkMt(CH4_CYCLE, PREINDUSTRIAL.ch4Ppb),
    n2oNaturalMt: gasSinkMt(N2O_CYCLE, PREINDUSTRIAL.n2oPpb),
  });
}
const prescribed = (slope: number): GasStepInput => ({ prescribed: true, slope, emissionStart: 0, emissionEnd: 0 });
const emitted = (start: number, end: number): GasStepInput => ({ prescribed: false, slope: 0, emissionStart: start, emissionEnd: end });

function equilibrium(): number[] {
  const y = new Array<number>(I.size).fill(0);
  y[I.ch4Ppb] = PREINDUSTRIAL.ch4Ppb;
  y[I.n2oPpb] = PREINDUSTRIAL.n2oPpb;
  return y;
}

describe('coupledModel right-hand side', () => {
  it('the pre-industrial equilibrium without anthropogenic emissions is a fixed point', () => {
    for (const feedback of [true, false]) {
      const out = new Array<number>(I.size).fill(NaN);
      model(feedback).derivativesInto(equilibrium(), 0.5, emitted(0, 0), emitted(0, 0), emitted(0, 0), 0, out);
      for (const v of out) expectClose(v, 0, 1e-15);
    }
  });

  it('with the concentration prescribed the boxes change by exactly dC/dt, and emissions = dC/dt + uptake', () => {
    const y = equilibrium();
    [y[0], y[1], y[2], y[3]] = [60, 50, 40, 20];
    y[I.surfaceK] = 1.1;
    y[I.uptakeGtc] = 380;
    const out = new Array<number>(I.size).fill(NaN);
    const m = model(true);
    m.derivativesInto(y, 0.3, prescribed(5), prescribed(0), prescribed(0), 0, out);
    const boxes = out[0] + out[1] + out[2] + out[3];
    expectClose(boxes, 5, 1e-12);
    expectClose(out[I.emittedGtc], 5 + m.uptakeGtcPerYr(y), 1e-12);
    expectClose(out[I.uptakeGtc], m.uptakeGtcPerYr(y), 1e-12);
  });

  it('emission bookkeeping: d(emitted)/dt = d(atmosphere)/dt + d(uptake)/dt in any state', () => {
    const y = equilibrium();
    [y[0], y[1], y[2], y[3]] = [120, 90, 30, 5];
    y[I.surfaceK] = 2;
    y[I.uptakeGtc] = 700;
    const out = new Array<number>(I.size).fill(NaN);
    model(true).derivativesInto(y, 0.7, emitted(10, 12), emitted(300, 310), emitted(7, 8), -0.5, out);
    const boxes = out[0] + out[1] + out[2] + out[3];
    expectClose(out[I.emittedGtc], 10 + 0.7 * 2, 1e-12);
    expectClose(out[I.emittedGtc], boxes + out[I.uptakeGtc], 1e-12);
  });

  it('the feedback lengthens the time scales as uptake and warming grow (Millar et al. 2017)', () => {
    const m = model(true);
    const cold = equilibrium();
    const warm = equilibrium();
    warm[I.surfaceK] = 1.5;
    const saturated = equilibrium();
    saturated[I.uptakeGtc] = 500;
    expect(m.timescaleScaling(warm)).toBeGreaterThan(m.timescaleScaling(cold));
    expect(m.timescaleScaling(saturated)).toBeGreaterThan(m.timescaleScaling(cold));
    expect(model(false).timescaleScaling(warm)).toBe(1);
  });
});
