// Type declarations for odex 2.0.4. The package ships its TypeScript source (which does not compile
// under strict settings) but no .d.ts; tsconfig `paths` points the compiler here instead.
export type Derivative = (x: number, y: number[]) => number[];
export type OutputFunction = (
  nr: number,
  xold: number,
  x: number,
  y: number[],
  dense?: (c: number, x: number) => number,
) => boolean | void;
export declare enum Outcome {
  Converged = 0,
  MaxStepsExceeded = 1,
  EarlyReturn = 2,
}
export declare class Solver {
  constructor(n: number);
  n: number;
  maxSteps: number;
  initialStepSize: number;
  maxStepSize: number;
  relativeTolerance: number | number[];
  absoluteTolerance: number | number[];
  denseOutput: boolean;
  solve(
    f: Derivative,
    x: number,
    y0: number[],
    xEnd: number,
    solOut?: OutputFunction,
  ): { y: number[]; outcome: Outcome; nStep: number; xEnd: number; nAccept: number; nReject: number; nEval: number };
}
