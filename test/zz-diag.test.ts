import { it } from 'vitest';
import { runEmissionDriven } from '../src/carbon/run-emission-driven.js';
import { calibrate } from '../src/climate/calibrate.js';
import { loadHistory, loadPathway } from '../src/io/index.js';
import { oracleEmissionRun } from './carbon/coupled-ode-oracle.js';
it('diag', () => {
  const params = calibrate();
  const options = { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 } };
  for (const p of [loadHistory(), loadPathway('swift-emissions')]) {
    const run = runEmissionDriven(p, params, options);
    const o = oracleEmissionRun(p, params, options);
    const rows = [];
    for (const y of [1750, 1751, 1800, 1900, 1960, 1973, 2000, 2010, 2019, 2023, 2024, 2025, 2026, 2050, 2100, 2150]) {
      const k = y - 1750; if (k >= p.years.length) continue;
      rows.push({ y, e: run.co2EmissionsGtco2[k].toFixed(3), eo: o.co2EmissionsGtco2[k].toFixed(3), c: run.co2Ppm[k].toFixed(3), co: o.co2Ppm[k].toFixed(3), ce: run.co2YearEndPpm[k].toFixed(3), ceo: o.co2YearEndPpm[k].toFixed(3), t: run.surfaceK[k].toFixed(4), to: o.surfaceK[k].toFixed(4), u: run.carbonBudget.uptakeGtc[k].toFixed(2), uo: o.uptakeGtc[k].toFixed(2) });
    }
    console.table(rows);
    let w = 0, wy = 0; for (let k = 0; k < p.years.length; k++) { const d = Math.abs(run.co2EmissionsGtco2[k] - o.co2EmissionsGtco2[k]); if (d > w) { w = d; wy = 1750 + k; } }
    let w2 = 0, wy2 = 0; for (let k = 0; k < p.years.length; k++) { const d = Math.abs(run.co2YearEndPpm[k] - o.co2YearEndPpm[k]); if (d > w2) { w2 = d; wy2 = 1750 + k; } }
    let w3 = 0, wy3 = 0; for (let k = 0; k < p.years.length; k++) { const d = Math.abs(run.surfaceK[k] - o.surfaceK[k]); if (d > w3) { w3 = d; wy3 = 1750 + k; } }
    console.log({ w, wy, e: run.co2EmissionsGtco2[wy - 1750], w2, wy2, w3, wy3 });
  }
});
