// Invented scenario sets in the IAMC table layout, for the bundled example (build-example-scenarios.ts)
// and the batch benchmark (bench-batch.ts). Every number here is made up by a seeded storyline of our
// own: these are not published scenarios and not forecasts.
//
// Try: node dist/scripts/build-example-scenarios.js

/** Reporting years: five-year steps to 2060, then ten-year steps to 2100 (a common IAMC grid). */
export const INVENTED_YEARS = [2020, 2025, 2030, 2035, 2040, 2045, 2050, 2055, 2060, 2070, 2080, 2090, 2100];

/** Invented model names (our own). */
const MODELS = ['Gridline 2.1', 'Tessera 0.9', 'Larkspur 1.4'];

/** Storyline families and the ranges their invented parameters are drawn from. */
const FAMILIES = [
  { name: 'Immediate', peak: [2020, 2022], zero: [2035, 2045], floor: [-12, -6], ch4: [0.3, 0.45], so2: [0.05, 0.1] },
  { name: 'Rapid', peak: [2020, 2025], zero: [2045, 2060], floor: [-8, -3], ch4: [0.35, 0.55], so2: [0.05, 0.15] },
  { name: 'Orderly', peak: [2022, 2030], zero: [2060, 2075], floor: [-6, -1], ch4: [0.5, 0.7], so2: [0.1, 0.25] },
  { name: 'Delayed', peak: [2030, 2040], zero: [2070, 2095], floor: [-5, 0], ch4: [0.6, 0.85], so2: [0.15, 0.35] },
  { name: 'Pledges', peak: [2025, 2035], zero: [2100, 2200], floor: [0, 0], ch4: [0.75, 1.0], so2: [0.25, 0.5] },
  { name: 'Drift', peak: [2045, 2070], zero: [2300, 2400], floor: [0, 0], ch4: [0.95, 1.3], so2: [0.4, 0.7] },
] as const;

/** One row of an invented table: identifiers and one value per reporting year. */
export interface InventedRow {
  model: string;
  scenario: string;
  region: string;
  variable: string;
  unit: string;
  values: number[];
}

/** mulberry32 (Tommy Ettinger's 32-bit generator): a few lines, enough for invented data. */
function generator(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * `count` invented scenarios spread over three invented models and six storyline families: total
 * CO2 rising to a peak, falling linearly to net zero and on to a floor of net removals; CH4, N2O and
 * the aerosol and ozone precursors falling towards a fraction of their 2020 level by 2100;
 * F-gases and HFC-134a. The second model reports CO2 only by its two sectors; the third adds rows
 * for two R5 regions (which readers skip). Deterministic in `seed`.
 */
export function inventedScenarioSet(count: number, seed = 2026): InventedRow[] {
  const random = generator(seed);
  const between = ([lo, hi]: readonly [number, number]) => lo + (hi - lo) * random();
  const rows: InventedRow[] = [];
  for (let i = 0; i < count; i++) {
    const model = MODELS[i % MODELS.length];
    const family = FAMILIES[Math.floor(i / MODELS.length) % FAMILIES.length];
    const scenario = `${family.name}-${String(Math.floor(i / (MODELS.length * FAMILIES.length)) + 1).padStart(2, '0')}`;
    const co2Start = between([39, 42]);
    const peakYear = between(family.peak);
    const peak = co2Start + between([0, 0.25]) * Math.max(0, peakYear - 2020);
    const zeroYear = between(family.zero);
    const floor = between(family.floor);
    const co2 = INVENTED_YEARS.map((y) => {
      if (y <= peakYear) return co2Start + ((peak - co2Start) * (y - 2020)) / Math.max(1, peakYear - 2020);
      if (y <= zeroYear) return peak * (1 - (y - peakYear) / (zeroYear - peakYear));
      return Math.max(floor, (floor * (y - zeroYear)) / 15);
    });
    const towards = (start: number, end: number) => INVENTED_YEARS.map((y) => start + (end - start) * Math.min(1, (y - 2020) / 60) ** 0.8);
    const ch4End = between(family.ch4);
    const so2End = between(family.so2);
    const row = (variable: string, unit: string, values: number[], region = 'World') => rows.push({ model, scenario, region, variable, unit, values: values.map((v) => +v.toPrecision(5)) });
    if (model === MODELS[1]) {
      // Land-use CO2 falls to net removals early; energy and industry carry the rest.
      const afolu = INVENTED_YEARS.map((y) => 4 - Math.min(1, (y - 2020) / 40) * (4 - Math.min(0, floor) * 0.3 - 0.5 * 4));
      row('Emissions|CO2|Energy and Industrial Processes', 'Mt CO2/yr', co2.map((v, k) => 1000 * (v - afolu[k])));
      row('Emissions|CO2|AFOLU', 'Mt CO2/yr', afolu.map((v) => 1000 * v));
    } else {
      row('Emissions|CO2', 'Mt CO2/yr', co2.map((v) => 1000 * v));
    }
    row('Emissions|CH4', 'Mt CH4/yr', towards(between([370, 390]), 380 * ch4End));
    row('Emissions|N2O', 'kt N2O/yr', towards(between([10_000, 11_000]), 10_500 * between([0.6, 1.2])));
    row('Emissions|Sulfur', 'Mt SO2/yr', towards(between([75, 85]), 80 * so2End));
    row('Emissions|BC', 'Mt BC/yr', towards(7, 7 * between([0.2, 0.9])));
    row('Emissions|OC', 'Mt OC/yr', towards(30, 30 * between([0.3, 0.9])));
    row('Emissions|NH3', 'Mt NH3/yr', towards(60, 60 * between([0.8, 1.2])));
    row('Emissions|NOx', 'Mt NO2/yr', towards(110, 110 * between([0.2, 0.8])));
    row('Emissions|CO', 'Mt CO/yr', towards(800, 800 * between([0.3, 0.9])));
    row('Emissions|VOC', 'Mt VOC/yr', towards(180, 180 * between([0.4, 0.9])));
    row('Emissions|F-Gases', 'Mt CO2-equiv/yr', towards(1_500, 1_500 * between([0.1, 1.2])));
    if (model === MODELS[2]) {
      row('Emissions|CO2', 'Mt CO2/yr', co2.map((v) => 1000 * 0.45 * v), 'R5ASIA');
      row('Emissions|CO2', 'Mt CO2/yr', co2.map((v) => 1000 * 0.3 * v), 'R5OECD90+EU');
    }
  }
  return rows;
}

/** The rows as a wide CSV table in the IAMC layout, after `comments` (`#` lines). */
export function inventedTableCsv(rows: InventedRow[], comments: string[] = []): string {
  const quote = (s: string | number) => (/[",]/.test(String(s)) ? `"${String(s).replace(/"/g, '""')}"` : String(s));
  const lines = [...comments.map((c) => `# ${c}`), ['Model', 'Scenario', 'Region', 'Variable', 'Unit', ...INVENTED_YEARS].join(',')];
  for (const r of rows) lines.push([r.model, r.scenario, r.region, r.variable, r.unit, ...r.values].map(quote).join(','));
  return lines.join('\n') + '\n';
}
