// What the in-process command-line tests share: running main(argv) with captured streams, and
// temporary folders removed after the file's tests.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

/** Runs `warmcast argv` in-process (relative paths against `cwd`), returning its exit code and output. */
export async function runCli(argv: string[], cwd?: string): Promise<{ code: number; out: string; err: string }> {
  const io = captureIo(cwd);
  const code = await main(argv, io);
  return { code, out: io.out, err: io.err };
}

/**
 * A maker of fresh temporary folders named `warmcast-<prefix>-…`, all removed once the calling test
 * file's tests have run (call it at the top level of the file).
 */
export function tempDirs(prefix: string): () => string {
  const roots: string[] = [];
  afterAll(() => {
    for (const dir of roots) rmSync(dir, { recursive: true, force: true });
  });
  return () => {
    const dir = mkdtempSync(join(tmpdir(), `warmcast-${prefix}-`));
    roots.push(dir);
    return dir;
  };
}
