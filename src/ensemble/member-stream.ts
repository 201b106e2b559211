import type { TwoBoxPropagator } from '../climate/exact-propagator.js';
import type { TwoBoxParams } from '../climate/two-box.js';
import { ExceedanceCounter } from './exceedance-counter.js';
import { memberGenerators } from './member-generators.js';
import { emptyTwoBoxPropagator, modalTwoBoxPropagatorInto } from './modal-propagator.js';
import type { MemberTask } from './run-members.js';
import { RUNNING_MEAN_WINDOW } from './running-mean.js';
import { drawMember, emptyDraw, memberSampler, storeDraw, type MemberParameter } from './sample-members.js';

/** Years every thread advances its members by between two synchronisations. */
export const STREAM_BLOCK_YEARS = 16;

/**
 * Rows of year-major member values a streamed run keeps: a block being written with the 20-year
 * look-back of the running mean behind it, and the block before it (whose percentiles other threads
 * may still be reading while this thread writes the next); all `n` years when the members are kept.
 * @example streamRows(551, false) // 36
 */
export function streamRows(n: number, keep: boolean): number {
  const { before, after } = RUNNING_MEAN_WINDOW;
  return keep ? n : Math.min(n, Math.max(2 * STREAM_BLOCK_YEARS, STREAM_BLOCK_YEARS + before + after + 1));
}

/**
 * One thread's share of a concentration-driven ensemble, run as a stream of year blocks: its
 * members' parameters are drawn and their propagators built once ({@link MemberStream.draw}), then
 * {@link MemberStream.advance} steps every member through the next block of years and writes its
 * warming, relative to its own baseline mean, into `rows` (year-major, one row of `width` member
 * columns per year, year k in row k mod rowCount), counting each member's threshold exceedances on
 * the way. Between blocks the caller computes the percentiles of the finished rows. Memory is the
 * rows plus a few values per member, whatever the number of years, and the rows are read while they
 * are still in cache.
 *
 * The numbers are the same, operation for operation, as those of runMembersInto with an
 * ExceedanceCounter (member-stage.ts): the same draws, propagator, forcing sums, steps, baseline sum
 * (taken in a first pass over the baseline years) and running sums.
 */
export class MemberStream {
  private readonly count: number;
  private readonly n: number;
  private readonly counter: ExceedanceCounter;
  // The one-year propagator, forcing multipliers, baseline mean and state of each member.
  private readonly p00: Float64Array;
  private readonly p01: Float64Array;
  private readonly p10: Float64Array;
  private readonly p11: Float64Array;
  private readonly g0t: Float64Array;
  private readonly g0d: Float64Array;
  private readonly g1t: Float64Array;
  private readonly g1d: Float64Array;
  private readonly co2Scale: Float64Array;
  private readonly aerosolScale: Float64Array;
  private readonly mean: Float64Array;
  private readonly surface: Float64Array;
  private readonly deep: Float64Array;
  // Running 20-year sum, level and highest level of each member (see ExceedanceCounter).
  private readonly sum: Float64Array;
  private readonly level: Int32Array;
  private readonly reached: Int32Array;
  /** Row offsets of the years of a block and of the 20 years before it. */
  private readonly offsets: Int32Array;

  /**
   * @param task the shared inputs (concentration-driven)
   * @param from first member of this share (global index)
   * @param to end member of this share, exclusive
   * @param column column of member `from` in the rows
   * @param width members per row
   * @param rows year-major rows (rowCount x width)
   * @param rowCount rows held (streamRows)
   * @param parameters receives each member's parameters at its column
   * @param thresholds warming levels, K
   */
  constructor(
    private readonly task: MemberTask,
    private readonly from: number,
    to: number,
    private readonly column: number,
    private readonly width: number,
    private readonly rows: Float64Array,
    private readonly rowCount: number,
    private readonly parameters: Record<MemberParameter, Float64Array>,
    thresholds: readonly number[],
  ) {
    const count = (this.count = to - from);
    this.n = task.otherWm2.length;
    this.counter = new ExceedanceCounter(thresholds, this.n);
    const array = () => new Float64Array(count);
    this.p00 = array();
    this.p01 = array();
    this.p10 = array();
    this.p11 = array();
    this.g0t = array();
    this.g0d = array();
    this.g1t = array();
    this.g1d = array();
    this.co2Scale = array();
    this.aerosolScale = array();
    this.mean = array();
    this.surface = array();
    this.deep = array();
    this.sum = array();
    this.level = new Int32Array(count);
    this.reached = new Int32Array(count);
    const { before, after } = RUNNING_MEAN_WINDOW;
    this.offsets = new Int32Array(STREAM_BLOCK_YEARS + before + after + 1);
  }

  /**
   * Draws every member's parameters (from its own stream, as runMemberLoop does), stores them,
   * builds its propagator and computes its baseline mean.
   * @returns unphysical draws discarded
   */
  draw(): number {
    const { task, count } = this;
    const { upperHeatCapacity, deepHeatCapacity, deepEfficacy } = task.sampling;
    const sampler = memberSampler(task.sampling, task.co2Formula, false);
    const next = memberGenerators(task.seed, this.from);
    const draw = emptyDraw();
    const params: TwoBoxParams = { upperHeatCapacity, deepHeatCapacity, feedbackWm2K: NaN, exchangeWm2K: NaN, deepEfficacy };
    const prop: TwoBoxPropagator = emptyTwoBoxPropagator();
    let redraws = 0;
    for (let i = 0; i < count; i++) {
      redraws += drawMember(next(), sampler, draw);
      storeDraw(this.parameters, this.column + i, draw);
      params.feedbackWm2K = draw.feedbackWm2K;
      params.exchangeWm2K = draw.exchangeWm2K;
      modalTwoBoxPropagatorInto(params, prop);
      this.p00[i] = prop.phi[0];
      this.p01[i] = prop.phi[1];
      this.p10[i] = prop.phi[2];
      this.p11[i] = prop.phi[3];
      this.g0t[i] = prop.g0[0];
      this.g0d[i] = prop.g0[1];
      this.g1t[i] = prop.g1[0];
      this.g1d[i] = prop.g1[1];
      this.co2Scale[i] = draw.forcing2xScale;
      this.aerosolScale[i] = draw.aerosolScale;
      this.mean[i] = this.baselineMean(i);
    }
    return redraws;
  }

  /** Member i's mean warming over the baseline years (relative to the start), summed in year order as `rebase` does. */
  private baselineMean(i: number): number {
    const { co2Wm2, aerosolWm2, otherWm2, baselineFrom, baselineTo } = this.task;
    const p00 = this.p00[i];
    const p01 = this.p01[i];
    const p10 = this.p10[i];
    const p11 = this.p11[i];
    const g0t = this.g0t[i];
    const g0d = this.g0d[i];
    const g1t = this.g1t[i];
    const g1d = this.g1d[i];
    const cs = this.co2Scale[i];
    const as = this.aerosolScale[i];
    let t = 0;
    let d = 0;
    let sum = 0;
    let f0 = cs * co2Wm2[0] + as * aerosolWm2[0] + otherWm2[0];
    for (let k = 0; k <= baselineTo; k++) {
      if (k >= baselineFrom) sum += t;
      if (k === baselineTo) break;
      const f1 = cs * co2Wm2[k + 1] + as * aerosolWm2[k + 1] + otherWm2[k + 1];
      const df = f1 - f0;
      const tn = p00 * t + p01 * d + g0t * f0 + g1t * df;
      d = p10 * t + p11 * d + g0d * f0 + g1d * df;
      t = tn;
      f0 = f1;
    }
    return sum / (baselineTo - baselineFrom + 1);
  }

  /**
   * Steps every member from year `y0` (where the previous block ended, or 0) through year y1 - 1,
   * writing its rebased warming into the rows and, on the way, advancing its 20-year sum and
   * recording changes of its level: the sum of years k-19..k is the 20-year mean that stands for
   * year k - 10 (as ExceedanceCounter.addMember has it).
   */
  advance(y0: number, y1: number): void {
    const { before, after } = RUNNING_MEAN_WINDOW;
    const width = before + after + 1;
    const { n, rows, rowCount, offsets, count, column, counter } = this;
    const bounds = counter.bounds;
    const { co2Wm2, aerosolWm2, otherWm2 } = this.task;
    const { p00, p01, p10, p11, g0t, g0d, g1t, g1d, co2Scale, aerosolScale, mean, surface, deep, sum, level, reached } = this;
    // offsets[j]: where year y0 - width + j of member 0 of this share goes (-1 before year 0).
    for (let j = 0; j < width + y1 - y0; j++) {
      const k = y0 - width + j;
      offsets[j] = k >= 0 ? (k % rowCount) * this.width + column : -1;
    }
    for (let i = 0; i < count; i++) {
      const q00 = p00[i];
      const q01 = p01[i];
      const q10 = p10[i];
      const q11 = p11[i];
      const h0t = g0t[i];
      const h0d = g0d[i];
      const h1t = g1t[i];
      const h1d = g1d[i];
      const cs = co2Scale[i];
      const as = aerosolScale[i];
      const base = mean[i];
      let t = surface[i];
      let d = deep[i];
      let s = sum[i];
      let l = level[i];
      let f0 = cs * co2Wm2[y0] + as * aerosolWm2[y0] + otherWm2[y0];
      for (let k = y0; k < y1; k++) {
        const w = t - base;
        const j = k - y0 + width;
        rows[offsets[j] + i] = w;
        if (k < width) s += w;
        else s += w - rows[offsets[j - width] + i];
        if (k >= width - 1) {
          const m = s / width;
          if (!(m > bounds[l]) || m > bounds[l + 1]) {
            const r = reached[i];
            l = counter.move(m, l, r, k - after);
            if (l > r) reached[i] = l;
          }
        }
        if (k + 1 < n) {
          const f1 = cs * co2Wm2[k + 1] + as * aerosolWm2[k + 1] + otherWm2[k + 1];
          const df = f1 - f0;
          const tn = q00 * t + q01 * d + h0t * f0 + h1t * df;
          d = q10 * t + q11 * d + h0d * f0 + h1d * df;
          t = tn;
          f0 = f1;
        }
      }
      surface[i] = t;
      deep[i] = d;
      sum[i] = s;
      level[i] = l;
    }
  }

  /** Adds this share's exceedance counts (layout of exceedanceCountsInto). */
  addCountsTo(counts: Float64Array): void {
    this.counter.addCountsTo(counts);
  }
}
