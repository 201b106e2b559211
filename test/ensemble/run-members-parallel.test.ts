// Worker threads run only from compiled JavaScript (see src/ensemble/run-members-parallel.ts), so
// this test compiles the project with tsc into a scratch folder under tmp/ and runs the built
// ensemble in child processes, once on one thread and once on two, then compares both with the
// in-process run from the TypeScript sources.
import { execFileSync } from 'node:child_process';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runEnsemble, workerThreadsAvailable } from '../../src/ensemble/index.js';
import { canonical } from './canonical.js';
import { syntheticInput } from './synthetic-input.js';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const buildDir = join(root, 'tmp', `ensemble-workers-${process.pid}`);
const input = syntheticInput(1750, 2150);
const options = { members: 3000, seed: 42, thresholds: [1.5, 2, 3], baseline: [1850, 1900] as [number, number] };

/** Runs the built runEnsemble in a fresh node process and returns its canonical output (as canonical.ts). */
function runBuilt(workers: number): { text: string; workersUsed: number } {
  const inputFile = join(buildDir, 'input.json');
  const script = `
    import { readFileSync } from 'node:fs';
    const { runEnsemble, ensembleTable } = await import(${JSON.stringify(pathToFileURL(join(buildDir, 'src/ensemble/index.js')).href)});
    const raw = JSON.parse(readFileSync(${JSON.stringify(inputFile)}, 'utf8'));
    const byAgent = Object.fromEntries(Object.entries(raw.byAgent).map(([k, v]) => [k, Float64Array.from(v)]));
    const r = await runEnsemble({ years: Float64Array.from(raw.years), forcing: { total: Float64Array.from(raw.total), byAgent }, co2Formula: 'ar6' },
      { ...raw.options, workers: ${workers} });
    const t = ensembleTable(r);
    const text = JSON.stringify({ columns: t.columns, values: t.columns.map((c) => Array.from(t.values[c])), crossings: r.crossings, parameters: r.parameters,
      ecsTcrCorrelation: r.ecsTcrCorrelation, redraws: r.redraws, memberCount: r.memberCount, notes: r.notes });
    process.stdout.write(JSON.stringify({ text, workersUsed: r.workersUsed }));`;
  const scriptFile = join(buildDir, `run-${workers}.mjs`);
  writeFileSync(scriptFile, script);
  return JSON.parse(execFileSync(process.execPath, [scriptFile], { cwd: root, encoding: 'utf8', maxBuffer: 1 << 28 }));
}

describe('runMembersParallel', () => {
  beforeAll(() => {
    mkdirSync(buildDir, { recursive: true });
    try {
      execFileSync(process.execPath, [join(root, 'node_modules/typescript/bin/tsc'), '-p', join(root, 'tsconfig.build.json'), '--outDir', buildDir], { cwd: root, stdio: 'pipe' });
    } catch {
      // tsc exits non-zero on type errors anywhere in the project but still writes the JavaScript.
    }
    const a = input.forcing.byAgent;
    writeFileSync(
      join(buildDir, 'input.json'),
      JSON.stringify({ years: Array.from(input.years), total: Array.from(input.forcing.total), byAgent: Object.fromEntries(Object.entries(a).map(([k, v]) => [k, Array.from(v)])), options }),
    );
  }, 120_000);
  afterAll(() => rmSync(buildDir, { recursive: true, force: true }));

  it('the built runEnsemble gives byte-identical output on one and on two worker threads, and the same as the in-process run from sources', async () => {
    const one = runBuilt(1);
    const two = runBuilt(2);
    expect(one.workersUsed).toBe(1);
    expect(two.workersUsed).toBe(2);
    expect(two.text).toBe(one.text);
    // Under vitest the sources are TypeScript, so this run stays in-process.
    expect(workerThreadsAvailable()).toBe(false);
    const here = await runEnsemble(input, options);
    expect(here.workersUsed).toBe(1);
    expect(canonical(here)).toBe(one.text);
  }, 120_000);
});
