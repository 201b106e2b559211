/**
 * `warmcast calibrate` in-process (main(argv, captureIo())): the parameter JSON it prints and how a
 * --params file combines with flags.
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { calibrate } from '../../src/climate/index.js';
import { runCli, tempDirs } from './cli-harness.js';

const tmp = tempDirs('calibrate');

const run = runCli;

describe('warmcast calibrate output', () => {
  it('calibrate --ecs 3 --tcr 1.8 prints "ecs_k": 3 and "tcr_k": 1.8 as asked, with no solver noise', async () => {
    const r = await run(['calibrate', '--ecs', '3', '--tcr', '1.8']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('"ecs_k": 3,');
    expect(r.out).toContain('"tcr_k": 1.8,');
  });
});

describe('warmcast calibrate --params FILE with --ecs or --tcr (a flag overrides the file)', () => {
  /** A params file as `calibrate ARGS > params.json` writes it, and its parsed JSON. */
  async function calibrated(args: string[]): Promise<{ file: string; json: Record<string, number | string> }> {
    const r = await run(['calibrate', ...args]);
    expect(r.code).toBe(0);
    const file = join(tmp(), 'params.json');
    writeFileSync(file, r.out);
    return { file, json: JSON.parse(r.out) };
  }

  it('--ecs 4 re-derives the file\'s feedback and exchange for ECS 4 K and the file\'s TCR 1.8 K, keeping its heat capacity, and says so', async () => {
    const { file, json } = await calibrated(['--ecs', '3', '--tcr', '1.8', '--upper-heat-capacity', '7']);
    const r = await run(['calibrate', '--params', file, '--ecs', '4']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out.ecs_k).toBe(4);
    expect(out.tcr_k).toBe(1.8);
    expect(out.upper_heat_capacity).toBe(7);
    expect(out.feedback_wm2k).toBe(json.forcing_2x_wm2 as number / 4);
    expect(out).toEqual(JSON.parse((await run(['calibrate', '--ecs', '4', '--tcr', '1.8', '--upper-heat-capacity', '7'])).out));
    expect(r.err).toContain(`note: --ecs 4 overrides the ECS target of ${file}, so the feedback_wm2k and exchange_wm2k it gives (derived from its own targets) were re-derived for ECS 4 K and TCR 1.8 K`);
  });

  it('--tcr 2 re-derives only the exchange: the file\'s feedback (and so its ECS) stays', async () => {
    const { file, json } = await calibrated(['--ecs', '3.5', '--tcr', '1.8']);
    const r = await run(['calibrate', '--params', file, '--tcr', '2']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out.feedback_wm2k).toBe(json.feedback_wm2k);
    expect(out.ecs_k).toBe(3.5);
    expect(out.tcr_k).toBe(2);
    expect(out.exchange_wm2k).not.toBe(json.exchange_wm2k);
    expect(r.err).toMatch(/note: --tcr 2 overrides the TCR target of .*, so the exchange_wm2k it gives \(derived from its own targets\) was re-derived/);
  });

  it('a physical parameter given as a flag wins over the file and the re-derivation (DESIGN.md)', async () => {
    const { file } = await calibrated(['--ecs', '3', '--tcr', '1.8']);
    const out = JSON.parse((await run(['calibrate', '--params', file, '--ecs', '4', '--upper-heat-capacity', '6'])).out);
    expect(out.upper_heat_capacity).toBe(6);
    expect(out.ecs_k).toBe(4);
    expect(out.tcr_k).toBe(1.8);
  });

  it('a file that fixes the exchange without a tcr_k keeps the TCR its own parameters give when --ecs re-derives it', async () => {
    const file = join(tmp(), 'physics.json');
    writeFileSync(file, JSON.stringify({ feedback_wm2k: 1.2, exchange_wm2k: 0.7 }));
    const implied = calibrate({ feedbackWm2K: 1.2, exchangeWm2K: 0.7 }).tcrK;
    const out = JSON.parse((await run(['calibrate', '--params', file, '--ecs', '4'])).out);
    expect(out.ecs_k).toBe(4);
    expect(out.tcr_k).toBe(implied);
  });

  it('without a target flag the file\'s physical parameters are used as written, with no note', async () => {
    const file = join(tmp(), 'physics.json');
    writeFileSync(file, JSON.stringify({ ecs_k: 3, tcr_k: 1.8, exchange_wm2k: 0.5 }));
    const r = await run(['calibrate', '--params', file]);
    expect(JSON.parse(r.out).exchange_wm2k).toBe(0.5);
    expect(r.err).not.toContain('note:');
  });
});
