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
import { memberThreads } from '../../src/ensemble/run-members-parallel.js';
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
      ecsTcrCorrelation: r.ecsTcrCorrelation, peak: r.peak, memberPeaks: [Array.from(r.memberParameters.peaks.warmingK), Array.from(r.memberParameters.peaks.yearIndex)],
      redraws: r.redraws, memberCount: r.memberCount, notes: r.notes });
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

  it('a started pool of two threads (startEnsembleThreads) gives the one-thread output on every run, and a run that fails in the workers (ConfigError) leaves the pool usable', () => {
    const inputFile = join(buildDir, 'input.json');
    const script = `
      import { readFileSync } from 'node:fs';
      const { runEnsemble, ensembleTable, startEnsembleThreads, AR6_SAMPLING } = await import(${JSON.stringify(pathToFileURL(join(buildDir, 'src/ensemble/index.js')).href)});
      const raw = JSON.parse(readFileSync(${JSON.stringify(inputFile)}, 'utf8'));
      const byAgent = Object.fromEntries(Object.entries(raw.byAgent).map(([k, v]) => [k, Float64Array.from(v)]));
      const input = { years: Float64Array.from(raw.years), forcing: { total: Float64Array.from(raw.total), byAgent }, co2Formula: 'ar6' };
      const text = (r) => { const t = ensembleTable(r); return JSON.stringify({ values: t.columns.map((c) => Array.from(t.values[c])), crossings: r.crossings, redraws: r.redraws,
        peak: r.peak, memberPeaks: [Array.from(r.memberParameters.peaks.warmingK), Array.from(r.memberParameters.peaks.yearIndex)] }); };
      const threads = startEnsembleThreads(2);
      const one = text(await runEnsemble(input, { ...raw.options, workers: 1 }));
      const first = await runEnsemble(input, { ...raw.options, threads });
      const second = await runEnsemble(input, { ...raw.options, threads });
      // No TCR below any ECS: every worker's draws fail.
      let error = '';
      try {
        await runEnsemble(input, { ...raw.options, threads, sampling: { ...AR6_SAMPLING, tcrK: { p05: 10, p17: 11, p50: 12, p83: 13, p95: 14 } } });
      } catch (e) {
        error = e.name + ': ' + e.message;
      }
      const after = await runEnsemble(input, { ...raw.options, threads });
      // Kept members (as a shard keeps them): every year of every member, the same from both paths.
      const keptTwo = await runEnsemble(input, { ...raw.options, threads, keepMembers: true });
      const keptOne = await runEnsemble(input, { ...raw.options, workers: 1, keepMembers: true });
      const keptSame = text(keptTwo) === one && Buffer.from(keptTwo.members.warmingK.buffer).equals(Buffer.from(keptOne.members.warmingK.buffer));
      await threads.close();
      process.stdout.write(JSON.stringify({ same: [first, second, after].map((r) => text(r) === one), used: [first, second, after].map((r) => r.workersUsed), error, keptSame }));`;
    const scriptFile = join(buildDir, 'pool.mjs');
    writeFileSync(scriptFile, script);
    const result = JSON.parse(execFileSync(process.execPath, [scriptFile], { cwd: root, encoding: 'utf8', maxBuffer: 1 << 28 }));
    expect(result.same).toEqual([true, true, true]);
    expect(result.used).toEqual([2, 2, 2]);
    expect(result.error).toMatch(/^ConfigError: the ensemble sampling gave 1000 unphysical draws in a row/);
    expect(result.keptSame).toBe(true);
  }, 120_000);

  it('a process that leaves its pool open still exits once its work is done (idle workers do not keep it alive)', () => {
    const script = `
      const { startEnsembleThreads } = await import(${JSON.stringify(pathToFileURL(join(buildDir, 'src/ensemble/index.js')).href)});
      startEnsembleThreads(2);
      process.stdout.write('started');`;
    const scriptFile = join(buildDir, 'open-pool.mjs');
    writeFileSync(scriptFile, script);
    expect(execFileSync(process.execPath, [scriptFile], { cwd: root, encoding: 'utf8', timeout: 30_000 })).toBe('started');
  }, 60_000);

  it('an emission-driven ensemble (members kept whole, then percentiles split by years) gives byte-identical output on one and two threads', () => {
    const script = `
      const url = (p) => ${JSON.stringify(pathToFileURL(buildDir).href)} + '/src/' + p;
      const { runEnsemble, ensembleTable, shardToJson } = await import(url('ensemble/index.js'));
      const { loadPathway } = await import(url('io/index.js'));
      const { calibrate } = await import(url('climate/calibrate.js'));
      const { ensembleInput } = await import(url('projection/ensemble-input.js'));
      const { input } = ensembleInput(loadPathway('swift-emissions'), calibrate());
      const options = { members: 301, seed: 4, thresholds: [1.5, 2], baseline: [1850, 1900], keepMembers: true };
      const text = (r) => { const t = ensembleTable(r); return JSON.stringify({ values: t.columns.map((c) => Array.from(t.values[c])), crossings: r.crossings, members: shardToJson(r.members),
        peak: r.peak, memberPeaks: [Array.from(r.memberParameters.peaks.warmingK), Array.from(r.memberParameters.peaks.yearIndex)] }); };
      const one = await runEnsemble(input, { ...options, workers: 1 });
      const two = await runEnsemble(input, { ...options, workers: 2 });
      process.stdout.write(JSON.stringify({ same: text(one) === text(two), used: [one.workersUsed, two.workersUsed] }));`;
    const scriptFile = join(buildDir, 'emissions.mjs');
    writeFileSync(scriptFile, script);
    const result = JSON.parse(execFileSync(process.execPath, [scriptFile], { cwd: root, encoding: 'utf8', maxBuffer: 1 << 28 }));
    expect(result).toEqual({ same: true, used: [1, 2] });
  }, 120_000);

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

describe('memberThreads', () => {
  it('memberThreads keeps rows of 2^32 bytes or more in the calling thread (Node 20 wraps the length of larger shared arrays sent to workers)', () => {
    const usual = workerThreadsAvailable() ? 2 : 1;
    expect(memberThreads(2, 1000, 2 ** 32 - 8)).toBe(usual);
    expect(memberThreads(2, 1000, 2 ** 32)).toBe(1);
    expect(memberThreads(2, 1, 8)).toBe(1);
    expect(memberThreads(4, 1000, 8, 2)).toBe(usual);
    expect(memberThreads(4, 1000, 8, 0)).toBe(1);
  });
});
