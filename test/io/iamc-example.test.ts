import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readScenarioTable } from '../../src/io/iamc-read.js';
import { inventedScenarioSet, inventedTableCsv } from '../../scripts/invented-scenarios.js';

const EXAMPLE = 'pathways/examples/invented-scenarios.csv';

describe('the bundled example table (pathways/examples/invented-scenarios.csv)', () => {
  it('is what scripts/build-example-scenarios.ts writes (regenerating gives the same file)', () => {
    const text = readFileSync(EXAMPLE, 'utf8');
    const body = text.split('\n').filter((l) => !l.startsWith('#')).join('\n');
    expect(body).toBe(inventedTableCsv(inventedScenarioSet(50)));
  });

  it('holds 50 scenarios from 3 models, every one readable', async () => {
    const table = await readScenarioTable(EXAMPLE);
    expect(table.scenarios).toHaveLength(50);
    expect(new Set(table.scenarios.map((s) => s.model)).size).toBe(3);
    expect(table.scenarios.filter((s) => s.problems.length > 0)).toEqual([]);
  });
});
