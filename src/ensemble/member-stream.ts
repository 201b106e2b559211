import { ExceedanceCounter } from './exceedance-counter.js';
import { emptyMemberPeaks, type MemberPeaks } from './member-peaks.js';
import { drawMembers } from './member-stage.js';
import type { MemberTask } from './run-members.js';
import { RUNNING_MEAN_WINDOW } from './running-mean.js';
import { emptyParameters, type MemberParameter } from './sample-members.js';

/** Years in a running mean, and years after the labelled one (module constants, so loops fold them in). */
const WINDOW = RUNNING_MEAN_WINDOW.before + RUNNING_MEAN_WINDOW.after + 1;
const AFTER = RUNNING_MEAN_WINDOW.after;

/** Years every thread advances its members by between two synchronisations. */
export const STREAM_BLOCK_YEARS = 16;

/**
 * Rows of year-major member values a streamed run keeps: a block being written with the 20-year
 * look-back of the running mean behind it, and the block before it (whose percentiles other threads
 * may still be reading while this thread writes the next); all `n` years when the members are kept.
 * @example streamRows(551, false) // 36
 */
export function streamRows(n: number, keep: boolean): number {
  return keep ? n : Math.min(n, Math.max(2 * STREAM_BLOCK_YEARS, STREAM_BLOCK_YEARS + WINDOW));
}

/**
 * One thread's share of a concentration-driven ensemble, run as a stream of year blocks: its
 * members' parameters are drawn and their propagators built once ({@link MemberStream.draw}), then
 * {@link MemberStream.advance} steps every member through the next block of years and writes its
 * warming, relative to its own baseline mean, into `rows` (year-major, one row of `width` member
 * columns per year, year k in row k mod rowCount), counting each member's threshold exceedances on
 * the way, and its peak (highest warming so far and its year). Between blocks the caller computes the
 * percentiles of the finished rows. Memory is the
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
  /** Takes the counts of the second copy of an odd last member (never read). */
  private readonly spare: ExceedanceCounter;
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
   * @param peaks receives each member's peak at its column (memberPeaksInto's result on its rows, bit for bit)
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
    private readonly peaks: MemberPeaks,
  ) {
    const count = (this.count = to - from);
    this.n = task.otherWm2.length;
    this.counter = new ExceedanceCounter(thresholds, this.n);
    this.spare = new ExceedanceCounter(thresholds, this.n);
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
    this.offsets = new Int32Array(STREAM_BLOCK_YEARS + WINDOW);
  }

  /**
   * Draws every member's parameters (drawMembers, as whole-member runs draw them), stores them,
   * builds its propagator, computes its baseline mean and sets its peak to "no year seen yet".
   * @returns unphysical draws discarded
   */
  draw(): number {
    const count = this.count;
    const redraws = drawMembers(this.task, this.from, this.from + count, this.parameters, this.column, false, (member, draw, prop) => {
      const i = member - this.from;
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
    });
    for (let i = 0; i < count; i += 2) this.baselineMeans(i, i + 1 < count ? i + 1 : i);
    this.peaks.warmingK.fill(-Infinity, this.column, this.column + count);
    this.peaks.yearIndex.fill(-1, this.column, this.column + count);
    return redraws;
  }

  /**
   * The mean warming over the baseline years (relative to the start) of members a and b, summed in
   * year order as `rebase` does, into `mean`. Two members step side by side: each step waits on the
   * one before it, so a second independent chain costs little (b may equal a, for an odd member).
   * The paired step is written out here and in advance() alike: a function call per step would cost
   * more than the step itself.
   */
  private baselineMeans(a: number, b: number): void {
    const { co2Wm2, aerosolWm2, otherWm2, baselineFrom, baselineTo } = this.task;
    const { p00, p01, p10, p11, g0t, g0d, g1t, g1d, co2Scale, aerosolScale } = this;
    const a00 = p00[a];
    const a01 = p01[a];
    const a10 = p10[a];
    const a11 = p11[a];
    const a0t = g0t[a];
    const a0d = g0d[a];
    const a1t = g1t[a];
    const a1d = g1d[a];
    const aCo2 = co2Scale[a];
    const aAer = aerosolScale[a];
    const b00 = p00[b];
    const b01 = p01[b];
    const b10 = p10[b];
    const b11 = p11[b];
    const b0t = g0t[b];
    const b0d = g0d[b];
    const b1t = g1t[b];
    const b1d = g1d[b];
    const bCo2 = co2Scale[b];
    const bAer = aerosolScale[b];
    let ta = 0;
    let da = 0;
    let tb = 0;
    let db = 0;
    let sumA = 0;
    let sumB = 0;
    let fa = aCo2 * co2Wm2[0] + aAer * aerosolWm2[0] + otherWm2[0];
    let fb = bCo2 * co2Wm2[0] + bAer * aerosolWm2[0] + otherWm2[0];
    for (let k = 0; k <= baselineTo; k++) {
      if (k >= baselineFrom) {
        sumA += ta;
        sumB += tb;
      }
      if (k === baselineTo) break;
      const c1 = co2Wm2[k + 1];
      const e1 = aerosolWm2[k + 1];
      const o1 = otherWm2[k + 1];
      const fa1 = aCo2 * c1 + aAer * e1 + o1;
      const dfa = fa1 - fa;
      const tna = a00 * ta + a01 * da + a0t * fa + a1t * dfa;
      da = a10 * ta + a11 * da + a0d * fa + a1d * dfa;
      ta = tna;
      fa = fa1;
      const fb1 = bCo2 * c1 + bAer * e1 + o1;
      const dfb = fb1 - fb;
      const tnb = b00 * tb + b01 * db + b0t * fb + b1t * dfb;
      db = b10 * tb + b11 * db + b0d * fb + b1d * dfb;
      tb = tnb;
      fb = fb1;
    }
    const years = baselineTo - baselineFrom + 1;
    this.mean[a] = sumA / years;
    this.mean[b] = sumB / years;
  }

  /**
   * Steps every member from year `y0` (where the previous block ended, or 0) through year y1 - 1,
   * writing its rebased warming into the rows and, on the way, advancing its 20-year sum and
   * recording changes of its level: the sum of years k-19..k is the 20-year mean that stands for
   * year k - 10 (as ExceedanceCounter.addMember has it). The level test compares the sum with
   * ExceedanceCounter.sumBounds, which is the same as comparing the mean with the thresholds. Each
   * member's peak moves only on a strictly higher value, so ties keep the first year (memberPeaksInto).
   */
  advance(y0: number, y1: number): void {
    const { rowCount, offsets, count, column } = this;
    // offsets[j]: where year y0 - WINDOW + j of member 0 of this share goes (-1 before year 0).
    for (let j = 0; j < WINDOW + y1 - y0; j++) {
      const k = y0 - WINDOW + j;
      offsets[j] = k >= 0 ? (k % rowCount) * this.width + column : -1;
    }
    const { n, rows, counter, spare } = this;
    const sumBounds = counter.sumBounds;
    const { co2Wm2, aerosolWm2, otherWm2 } = this.task;
    const { p00, p01, p10, p11, g0t, g0d, g1t, g1d, co2Scale, aerosolScale, mean, surface, deep, sum, level, reached } = this;
    const { warmingK: peakK, yearIndex: peakYear } = this.peaks;
    // Members go two at a time, side by side: the two-box step is a chain of dependent
    // multiplications, so a second, independent chain in the same loop nearly doubles the throughput
    // of member-years, and the two members' values share cache lines of the rows. An odd last member
    // goes twice, its second copy counted apart (in `spare`, never read).
    for (let a = 0; a < count; a += 2) {
      const b = a + 1 < count ? a + 1 : a;
      const counterB = b > a ? counter : spare;
      const a00 = p00[a];
      const a01 = p01[a];
      const a10 = p10[a];
      const a11 = p11[a];
      const a0t = g0t[a];
      const a0d = g0d[a];
      const a1t = g1t[a];
      const a1d = g1d[a];
      const aCo2 = co2Scale[a];
      const aAer = aerosolScale[a];
      const aBase = mean[a];
      const b00 = p00[b];
      const b01 = p01[b];
      const b10 = p10[b];
      const b11 = p11[b];
      const b0t = g0t[b];
      const b0d = g0d[b];
      const b1t = g1t[b];
      const b1d = g1d[b];
      const bCo2 = co2Scale[b];
      const bAer = aerosolScale[b];
      const bBase = mean[b];
      let ta = surface[a];
      let da = deep[a];
      let sa = sum[a];
      let la = level[a];
      let aBelow = sumBounds[la];
      let aAbove = sumBounds[la + 1];
      let tb = surface[b];
      let db = deep[b];
      let sb = sum[b];
      let lb = level[b];
      let bBelow = sumBounds[lb];
      let bAbove = sumBounds[lb + 1];
      let pa = peakK[column + a];
      let ya = peakYear[column + a];
      let pb = peakK[column + b];
      let yb = peakYear[column + b];
      let fa = aCo2 * co2Wm2[y0] + aAer * aerosolWm2[y0] + otherWm2[y0];
      let fb = bCo2 * co2Wm2[y0] + bAer * aerosolWm2[y0] + otherWm2[y0];
      for (let k = y0; k < y1; k++) {
        const wa = ta - aBase;
        const wb = tb - bBase;
        const out = offsets[k - y0 + WINDOW];
        rows[out + a] = wa;
        rows[out + b] = wb;
        if (wa > pa) {
          pa = wa;
          ya = k;
        }
        if (wb > pb) {
          pb = wb;
          yb = k;
        }
        if (k < WINDOW) {
          sa += wa;
          sb += wb;
        } else {
          const back = offsets[k - y0];
          sa += wa - rows[back + a];
          sb += wb - rows[back + b];
        }
        if (k >= WINDOW - 1) {
          // The level bounds on the sum, held in registers: a mean is computed only when the level changes.
          if (!(sa > aBelow) || sa > aAbove) {
            const r = reached[a];
            la = counter.move(sa / WINDOW, la, r, k - AFTER);
            if (la > r) reached[a] = la;
            aBelow = sumBounds[la];
            aAbove = sumBounds[la + 1];
          }
          if (!(sb > bBelow) || sb > bAbove) {
            const r = reached[b];
            lb = counterB.move(sb / WINDOW, lb, r, k - AFTER);
            if (lb > r) reached[b] = lb;
            bBelow = sumBounds[lb];
            bAbove = sumBounds[lb + 1];
          }
        }
        if (k + 1 < n) {
          const c1 = co2Wm2[k + 1];
          const e1 = aerosolWm2[k + 1];
          const o1 = otherWm2[k + 1];
          const fa1 = aCo2 * c1 + aAer * e1 + o1;
          const dfa = fa1 - fa;
          const tna = a00 * ta + a01 * da + a0t * fa + a1t * dfa;
          da = a10 * ta + a11 * da + a0d * fa + a1d * dfa;
          ta = tna;
          fa = fa1;
          const fb1 = bCo2 * c1 + bAer * e1 + o1;
          const dfb = fb1 - fb;
          const tnb = b00 * tb + b01 * db + b0t * fb + b1t * dfb;
          db = b10 * tb + b11 * db + b0d * fb + b1d * dfb;
          tb = tnb;
          fb = fb1;
        }
      }
      surface[b] = tb;
      deep[b] = db;
      sum[b] = sb;
      level[b] = lb;
      peakK[column + b] = pb;
      peakYear[column + b] = yb;
      surface[a] = ta;
      deep[a] = da;
      sum[a] = sa;
      level[a] = la;
      peakK[column + a] = pa;
      peakYear[column + a] = ya;
    }
  }

  /**
   * Runs a stream of three members over 40 invented years whose warming rises through two thresholds
   * and falls back, so that every branch of draw() and advance() (redraws aside) has run once before
   * a real run: the compiler then optimises them with all their type feedback, instead of optimising
   * early, meeting an unseen branch (the first look-back, the first threshold crossing, the odd last
   * member, the last year) and starting over, which cost about 40 ms at the start of a 10,000-member
   * run. The numbers it computes are thrown away.
   * @param task the real run's task (its sampling, formula and seed)
   */
  static prime(task: MemberTask): void {
    const n = 2 * STREAM_BLOCK_YEARS + 8;
    const forcing = Float64Array.from({ length: n }, (_, k) => (k < STREAM_BLOCK_YEARS ? 8 : -8));
    const zeros = new Float64Array(n);
    const primer: MemberTask = { ...task, co2Wm2: zeros, aerosolWm2: zeros, otherWm2: forcing, baselineFrom: 0, baselineTo: 1 };
    delete primer.carbon;
    const members = 3;
    const rows = new Float64Array(n * members);
    const stream = new MemberStream(primer, 0, members, 0, members, rows, n, emptyParameters(members), [0.5, 1.5], emptyMemberPeaks(members));
    stream.draw();
    for (let y0 = 0; y0 < n; y0 += STREAM_BLOCK_YEARS) stream.advance(y0, Math.min(n, y0 + STREAM_BLOCK_YEARS));
  }

  /** Adds this share's exceedance counts (layout of exceedanceCountsInto). */
  addCountsTo(counts: Float64Array): void {
    this.counter.addCountsTo(counts);
  }
}
