import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { isScenarioTable, readScenarioTable, scenarioPathway, selectScenario } from '../../src/io/iamc-read.js';
import { tempDirs } from '../cli/cli-harness.js';
import { inventedScenario, wideCsv } from './iamc-fixture.js';

const tempDir = tempDirs('iamc-read');

async function table() {
  const dir = tempDir();
  const path = join(dir, 't.csv');
  writeFileSync(path, '# invented\n' + wideCsv([...inventedScenario('A', 'Quick', 1), ...inventedScenario('A', 'Slow', 0.1), ...inventedScenario('B', 'Quick', 0.5)]));
  return { path, table: await readScenarioTable(path) };
}

describe('isScenarioTable', () => {
  it('knows a table by its IAMC header (after comments) or an .xlsx name, and a pathway file as none', async () => {
    const { path } = await table();
    expect(isScenarioTable(path)).toBe(true);
    expect(isScenarioTable('pathways/swift.csv')).toBe(false);
    expect(isScenarioTable('anything.xlsx')).toBe(true);
  });
});

describe('selectScenario', () => {
  it('finds a scenario by name, case-insensitively, with --model when two models use it', async () => {
    const { table: t } = await table();
    expect(selectScenario(t, { scenario: 'slow' }).model).toBe('A');
    expect(selectScenario(t, { scenario: 'Quick', model: 'b' }).model).toBe('B');
    expect(() => selectScenario(t, { scenario: 'Quick' })).toThrow(ConfigError);
    expect(() => selectScenario(t, { scenario: 'Quick' })).toThrow(/add --model NAME/);
    expect(() => selectScenario(t, { scenario: 'Slo' })).toThrow(/did you mean "Slow"/);
    expect(() => selectScenario(t, { scenario: 'Slow', model: 'C' })).toThrow(/not a model/);
    expect(() => selectScenario(t, {})).toThrow(/3 scenarios: choose one with --scenario NAME/);
    expect(selectScenario(t, { model: 'B' }).scenario).toBe('Quick');
  });
});

describe('scenarioPathway', () => {
  it('puts a scenario on the annual grid and splices it onto the history like a pathway file, with the table\'s notes first', async () => {
    const { table: t } = await table();
    const read = scenarioPathway(t.scenarios[1]);
    expect(read.annual.years[0]).toBe(2020);
    expect(read.annual.years.length).toBe(81);
    expect(read.pathway.provenance.spliceYear).toBe(2020);
    expect(read.pathway.provenance.source).toMatch(/t\.csv \[model "A", scenario "Slow"\]$/);
    expect(read.pathway.provenance.notes[0]).toMatch(/^read from the scenario table .*t\.csv \[model "A", scenario "Slow"\], region World$/);
    expect(read.pathway.provenance.notes).toContain('rows of other regions skipped (R5ASIA): only region World is read');
  });
});
