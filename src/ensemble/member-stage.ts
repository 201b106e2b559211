import type { TwoBoxParams } from '../climate/two-box.js';
import type { TwoBoxPropagator } from '../climate/exact-propagator.js';
import { memberGenerators } from './member-generators.js';
import { emptyTwoBoxPropagator, modalTwoBoxPropagatorInto } from './modal-propagator.js';
import type { ExceedanceCounter } from './exceedance-counter.js';
import { PROGRESS_EVERY, type MemberBlock, type MemberTask } from './run-members.js';
import { drawMember, emptyDraw, memberSampler, storeDraw, type MemberDraw, type MemberParameter } from './sample-members.js';

/** Members run before their rows are copied into the year-major block together (282 kB for 551 years). */
const STAGE_MEMBERS = 64;

/**
 * Member-major staging rows for member runs: each member writes its warming (before rebasing) into
 * `rows` at `offset`, then {@link MemberStage.commit} rebases it on its baseline mean, counts its
 * threshold exceedances while the row is still in cache and, every STAGE_MEMBERS members or at the
 * end, copies the rows into the block's year-major layout, so that writes to the large block are
 * contiguous runs.
 */
export class MemberStage {
  /** STAGE_MEMBERS rows of `n` years. */
  readonly rows: Float64Array;
  private staged = 0;

  constructor(
    private readonly n: number,
    private readonly block: MemberBlock,
    private readonly baselineFrom: number,
    private readonly baselineTo: number,
    private readonly exceedance?: ExceedanceCounter,
  ) {
    this.rows = new Float64Array(STAGE_MEMBERS * n);
  }

  /** Index in `rows` where the next member's year 0 goes. */
  get offset(): number {
    return this.staged * this.n;
  }

  /**
   * Ends member `i`'s row: subtracts its baseline mean as `rebase` in src/projection computes it
   * (summed in year order), adds the row to the exceedance counts, then flushes the stage into the
   * block when it is full or `i` is the last member (`to - 1`).
   */
  commit(i: number, to: number): void {
    const { rows, n } = this;
    const row = this.offset;
    let sum = 0;
    for (let k = this.baselineFrom; k <= this.baselineTo; k++) sum += rows[row + k];
    const mean = sum / (this.baselineTo - this.baselineFrom + 1);
    for (let k = row; k < row + n; k++) rows[k] -= mean;
    this.exceedance?.addMember(rows, row);
    this.staged++;
    if (this.staged === STAGE_MEMBERS || i + 1 === to) {
      this.flush(i + 1 - this.staged - this.block.blockStart);
      this.staged = 0;
    }
  }

  /** Copies the staged rows into the block from member column `column`. */
  private flush(column: number): void {
    const { rows, n, staged } = this;
    const w = this.block.warmingK;
    const stride = this.block.memberCount;
    for (let k = 0; k < n; k++) {
      const base = k * stride + column;
      for (let j = 0; j < staged; j++) w[base + j] = rows[j * n + k];
    }
  }
}

/**
 * Draws members [from, to) from their own streams (so member i depends only on the seed and i),
 * stores each one's parameters at index `first + (i - from)` of `parameters`, builds its one-year
 * propagator (the closed-form modal one) and hands the member to `each`. The start every member
 * run shares, whole-member (runMemberLoop) or streamed (MemberStream).
 *
 * @param carbon whether members also draw the carbon-cycle multiplier (emission pathways)
 * @param each receives the member's global index, its draw and its propagator (both reused)
 * @returns unphysical draws discarded in total
 */
export function drawMembers(
  task: MemberTask,
  from: number,
  to: number,
  parameters: Record<MemberParameter, Float64Array>,
  first: number,
  carbon: boolean,
  each: (i: number, draw: MemberDraw, prop: TwoBoxPropagator) => void,
): number {
  const { upperHeatCapacity, deepHeatCapacity, deepEfficacy } = task.sampling;
  const sampler = memberSampler(task.sampling, task.co2Formula, carbon);
  const next = memberGenerators(task.seed, from);
  const draw = emptyDraw();
  const params: TwoBoxParams = { upperHeatCapacity, deepHeatCapacity, feedbackWm2K: NaN, exchangeWm2K: NaN, deepEfficacy };
  const prop = emptyTwoBoxPropagator();
  let redraws = 0;
  for (let i = from; i < to; i++) {
    redraws += drawMember(next(), sampler, draw);
    storeDraw(parameters, first + (i - from), draw);
    params.feedbackWm2K = draw.feedbackWm2K;
    params.exchangeWm2K = draw.exchangeWm2K;
    each(i, draw, modalTwoBoxPropagatorInto(params, prop));
  }
  return redraws;
}

/**
 * The loop every whole-member run shares: for members [from, to), draw and store the member
 * (drawMembers), let `runOne` write its warming (before rebasing) into `rows` from `offset`, then
 * rebase it, count its exceedances (when `exceedance` is given) and stage it into the block, reporting
 * progress every PROGRESS_EVERY members.
 *
 * @param carbon whether members also draw the carbon-cycle multiplier (emission pathways)
 * @param exceedance receives every member's threshold exceedances (optional)
 * @returns unphysical draws discarded in total
 */
export function runMemberLoop(
  task: MemberTask,
  n: number,
  from: number,
  to: number,
  block: MemberBlock,
  carbon: boolean,
  onProgress: ((done: number) => void) | undefined,
  exceedance: ExceedanceCounter | undefined,
  runOne: (draw: MemberDraw, prop: TwoBoxPropagator, rows: Float64Array, offset: number) => void,
): number {
  const staging = new MemberStage(n, block, task.baselineFrom, task.baselineTo, exceedance);
  return drawMembers(task, from, to, block.parameters, from - block.blockStart, carbon, (i, draw, prop) => {
    runOne(draw, prop, staging.rows, staging.offset);
    staging.commit(i, to);
    if (onProgress && ((i - from + 1) % PROGRESS_EVERY === 0 || i + 1 === to)) onProgress(i - from + 1);
  });
}
