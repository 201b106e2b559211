import { Outcome, Solver } from 'odex';
import { NumericalError } from '../errors.js';

/** Tolerances and limits for the odex (Gragg-Bulirsch-Stoer) integrator. */
export interface OdeTolerances {
  /** Relative tolerance per component (odex default 1e-5; warmcast default 1e-10). */
  relativeTolerance: number;
  /** Absolute tolerance per component. */
  absoluteTolerance: number;
  /** Bound on integrator steps within one unit step, so a stiff or broken system cannot hang. */
  maxStepsPerUnit: number;
}

/** warmcast's default tolerances: tight enough that the ODE path matches the exact propagator to 1e-8 K. */
export const DEFAULT_TOLERANCES: OdeTolerances = {
  relativeTolerance: 1e-10,
  absoluteTolerance: 1e-10,
  maxStepsPerUnit: 2000,
};

/**
 * Derivatives during unit step `k` at fraction `s` in [0, 1] of that step. Knowing the step lets the
 * caller make inputs (forcing, emissions) linear within each step without searching for it.
 */
export type StepDerivatives = (k: number, s: number, y: number[]) => number[];

/**
 * Advances an ODE system over `steps` consecutive unit steps with odex, one `solve` call per step so
 * that inputs may change slope at each step boundary. Calls `record(k, y)` with the state at the end
 * of step k (k from 0), after checking it is finite.
 *
 * The integrator knows nothing about the physics: `derivatives` does.
 *
 * @param derivatives right-hand side
 * @param y0 initial state (not modified)
 * @param steps number of unit steps
 * @param tolerances tolerances and step bound
 * @param record receives each end-of-step state (a fresh array the caller may keep)
 * @returns total number of right-hand-side evaluations
 * @throws NumericalError when odex exceeds its step bound or the state stops being finite
 */
export function integrateSteps(
  derivatives: StepDerivatives,
  y0: readonly number[],
  steps: number,
  tolerances: OdeTolerances,
  record: (k: number, y: number[]) => void,
): number {
  const solver = new Solver(y0.length);
  solver.relativeTolerance = tolerances.relativeTolerance;
  solver.absoluteTolerance = tolerances.absoluteTolerance;
  solver.maxSteps = tolerances.maxStepsPerUnit;
  solver.initialStepSize = 0.1;
  let y = Array.from(y0);
  let evaluations = 0;
  for (let k = 0; k < steps; k++) {
    const f = (s: number, state: number[]) => derivatives(k, s, state);
    const result = solver.solve(f, 0, y, 1);
    evaluations += result.nEval;
    if (result.outcome !== Outcome.Converged) {
      throw new NumericalError(
        `the ODE integrator exceeded ${tolerances.maxStepsPerUnit} steps in step ${k}; the system is too stiff for these parameters`,
        'numerical.max-steps',
      );
    }
    for (const v of result.y) {
      if (!Number.isFinite(v)) throw new NumericalError(`the model state became non-finite in step ${k}`, 'numerical.non-finite');
    }
    y = result.y;
    record(k, y.slice());
  }
  return evaluations;
}
