/**
 * `warmcast calibrate` in-process (main(argv, captureIo())): the parameter JSON it prints and how a
 * --params file combines with flags.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

const roots: string[] = [];
function tmp(): string {
  const dir = mkdtempSync(join(tmpdir(), 'warmcast-calibrate-'));
  roots.push(dir);
  return dir;
}
afterAll(() => {
  for (const dir of roots) rmSync(dir, { recursive: true, force: true });
});

async function run(argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const io = captureIo();
  const code = await main(argv, io);
  return { code, out: io.out, err: io.err };
}

describe('warmcast calibrate output', () => {
  it('calibrate --ecs 3 --tcr 1.8 prints "ecs_k": 3 and "tcr_k": 1.8 as asked, with no solver noise', async () => {
    const r = await run(['calibrate', '--ecs', '3', '--tcr', '1.8']);
    expect(r.code).toBe(0);
    expect(r.out).toContain('"ecs_k": 3,');
    expect(r.out).toContain('"tcr_k": 1.8,');
  });
});
