import { halogenAnomalyPpt, halogenEmissionsKt, halogenForcingWm2 } from '../carbon/halogen-cycle.js';
import { HALOGEN_PRESENT_DAY, HALOGEN_PRESENT_DAY_YEAR } from '../carbon/halogen-present-day.js';
import { HALOGEN_SPECIES, type HalogenColumn, type HalogenSpecies } from '../carbon/halogen-species.js';
import { InputError } from '../errors.js';
import type { Pathway } from '../pathway.js';
import { absentEmissionsFactor, ABSENT_EMISSIONS_CHOICES, describeAbsentEmissionsRule, type AbsentEmissionsRule } from './absent-emissions.js';
import { aerosolAciWm2, aerosolAriWm2, PRECURSOR_PRESENT_DAY, PRECURSORS, type Precursor, type PrecursorEmissions } from './aerosol.js';
import { eescPpt } from './eesc.js';
import { AR6_OZONE } from './ozone.js';

/** Aerosol precursors (the aerosol group) and ozone precursors (the ozone group), Mt yr-1 columns `<name>_mt`. */
export const AEROSOL_PRECURSORS = ['so2', 'bc', 'oc', 'nh3'] as const satisfies readonly Precursor[];
export const OZONE_PRECURSORS = ['nox', 'co', 'nmvoc'] as const satisfies readonly Precursor[];

/** Groups of the fluorinated gases that `fgas_mtco2e` stands for. */
const FGAS_GROUPS: readonly HalogenSpecies['group'][] = ['hfc', 'pfc', 'other-fluorinated'];

/**
 * Join years for which the bundled present-day halogen concentrations (2019 and their trend) give
 * the state an emission pathway continues from (common practice, no source: about 10-20 years of
 * linear extrapolation from 2019 stays within a few per cent for the gases that matter).
 */
const HALOGEN_JOIN_YEARS = [2010, 2040] as const;

/**
 * Bounds on the factor that makes the aerosol forcing of a file's first-year emissions equal the
 * history's (common practice, no source): AR6's own 5-95 % range of aerosol ERF spans about a factor
 * of 3 either way of its best estimate, so a factor beyond 5 says the emissions are in another unit
 * (kt instead of Mt) or another quantity, not that the aerosol is uncertain.
 */
const AEROSOL_SCALE_LIMITS = [0.2, 5] as const;

/** Options of {@link resolveEmissionForcing}. */
export interface EmissionForcingOptions {
  /** What fills a group of species the file does not give. Without it such a file is refused. */
  absent?: AbsentEmissionsRule;
  /** Line of the file's first data row (comments counted), for messages about first-year values. */
  firstRowLine?: number;
}

/** The result of {@link resolveEmissionForcing}. */
export interface EmissionForcing {
  /**
   * The file's pathway with forcing columns computed from its emissions (`aerosol_ari_wm2`,
   * `aerosol_aci_wm2`, `ozone_wm2`, `strat_h2o_wm2`, `other_ghg_wm2`, `bc_snow_wm2`, where the file
   * gives no forcing for that agent) and `responsiveFrom` set, so that splicing uses them instead of
   * holding the history's values. Unchanged when the file has no emissions to resolve.
   */
  pathway: Pathway;
  /** Where each agent comes from after the join, in words, for `warmcast check`. */
  sources: Record<string, string>;
  /** The assumptions that fill species the file does not give; shown in the headline block and recorded in every file. */
  assumptions: string[];
  /** Factors that make the aerosol forcing of the file's first-year emissions equal the history's (1 = AR6 coefficients as published). */
  aerosolScale?: { ari: number; aci: number };
  /** Annual-mean concentration anomalies (ppt above pre-industrial) of every halogenated gas, on the file's years, when computed. */
  halogenPpt?: Partial<Record<HalogenColumn, Float64Array>>;
  /** Emissions of every precursor used (given or assumed), Mt yr-1, on the file's years, when computed. */
  precursorMt?: Record<Precursor, Float64Array>;
}

type Series = Record<string, Float64Array | undefined>;

/**
 * Turns a pathway's emissions of aerosol and ozone precursors and halogenated gases into forcing
 * columns, anchored at the history: in the file's first year F each agent takes the history's value
 * (in F, or in its last year when F is later), and from there it changes with the emissions.
 *
 * - Aerosols (aerosolAriWm2, aerosolAciWm2: IPCC AR6 WG1 7.SM.1.3.1, Smith et al. 2021): the AR6
 *   forms times a factor that makes them equal the history's ERFari and ERFaci in F, so zero
 *   anthropogenic emissions give zero anthropogenic aerosol forcing and the history's magnitude is
 *   kept. The factors are reported (near 1 when the file's emissions are inventory-like).
 * - Ozone: the history's value plus the AR6 linear terms (AR6_OZONE, Thornhill et al. 2021) in the
 *   NOx, CO and NMVOC emissions and the EESC of the halogenated gases, relative to F; the CH4 and N2O
 *   terms depend on the run's concentrations and are added by forcingByAgent from `responsiveFrom`.
 * - Stratospheric water vapour: the history's value; its CH4 term is added the same way.
 * - Other well-mixed greenhouse gases: the history's value plus the forcing change of each
 *   halogenated gas from F (halogen-cycle.ts, AR6 lifetimes and radiative efficiencies), from
 *   2019 concentrations carried to F (halogen-present-day.ts).
 * - BC on snow: the history's value times the BC emissions relative to F (AR6 7.SM.1.3: linear in BC
 *   emissions; from memory).
 * A group the file gives nothing of (neither emissions nor forcing) follows `options.absent`, and an
 * emission-driven file (one with `co2_gtco2`) that leaves a group out without it is refused. Species
 * missing from a group the file does give follow `options.absent` too, or without it are held at
 * their present-day emissions; either way the assumption is recorded.
 *
 * @param file the file's own annual pathway (before splicing)
 * @param history the history it will be spliced onto, or undefined when it is not spliced
 * @param options the assumption for absent groups
 * @returns the pathway with forcing columns, sources, assumptions and diagnostics
 * @throws InputError (exit 2) when a group is absent from an emission-driven file and no rule is given,
 *   when a group is given both as emissions and as forcing, when the first-year aerosol emissions are
 *   implausible against the history's aerosol forcing, or when halogenated gases must join the
 *   history outside 2010-2040
 * @throws ConfigError from the rule (follow-co2 without CO2 emissions, zero-by a past year)
 * @example
 * const r = resolveEmissionForcing(plannerFile, loadHistory(), { absent: { kind: 'hold' } });
 * r.pathway.series.aerosol_aci_wm2 // from the file's SO2, BC and OC
 */
export function resolveEmissionForcing(file: Pathway, history: Pathway | undefined, options: EmissionForcingOptions = {}): EmissionForcing {
  const s = file.series as Series;
  const years = file.years;
  const n = years.length;
  const source = file.provenance.source;
  const has = (c: string) => s[c] !== undefined;

  const aerosolForcingGiven = ['aerosol_wm2', 'aerosol_ari_wm2', 'aerosol_aci_wm2'].filter(has);
  const ozoneForcingGiven = ['ozone_wm2', 'other_wm2'].filter(has);
  const halogenForcingGiven = ['other_ghg_wm2', 'other_wm2'].filter(has);
  const aerosolGiven = AEROSOL_PRECURSORS.filter((p) => has(`${p}_mt`));
  const ozoneGiven = OZONE_PRECURSORS.filter((p) => has(`${p}_mt`));
  const halogenGiven = HALOGEN_SPECIES.filter((g) => has(`${g.column}_kt`) || has(`${g.column}_ppt`));
  const fgas = s.fgas_mtco2e;
  const emissionDriven = has('co2_gtco2');

  const problems = [
    ...bothWays(source, 'aerosol', aerosolGiven.map((p) => `${p}_mt`), aerosolForcingGiven),
    ...bothWays(source, 'ozone', ozoneGiven.map((p) => `${p}_mt`), ozoneForcingGiven),
    ...bothWays(source, 'halogenated-gas', [...halogenGiven.map((g) => (has(`${g.column}_kt`) ? `${g.column}_kt` : `${g.column}_ppt`)), ...(fgas ? ['fgas_mtco2e'] : [])], halogenForcingGiven),
  ];
  const fluorinatedGiven = halogenGiven.filter((g) => FGAS_GROUPS.includes(g.group));
  if (fgas && fluorinatedGiven.length > 0) {
    problems.push({
      file: source,
      column: 'fgas_mtco2e',
      code: 'input.fgas-twice',
      message: `must not be given beside single fluorinated gases (${fluorinatedGiven.map((g) => `${g.column}_kt`).join(', ')}): the total already counts them`,
      expected: 'either fgas_mtco2e or the single gases',
    });
  }
  if (problems.length > 0) throw new InputError(problems);

  const anyEmissions = aerosolGiven.length + ozoneGiven.length + halogenGiven.length > 0 || fgas !== undefined;
  if (!emissionDriven && !anyEmissions) return { pathway: file, sources: {}, assumptions: [] };

  // How each group is given: emissions, forcing, an assumption (the rule), or not at all. A file
  // without CO2 emissions (concentrations with a few species) leaves an absent group to the history.
  const absentKind = options.absent ? 'assumed' : emissionDriven ? 'absent' : 'history';
  const kindOf = (emissions: boolean, forcing: boolean) => (emissions ? 'emissions' : forcing ? 'forcing' : absentKind);
  const groups = {
    aerosol: kindOf(aerosolGiven.length > 0, aerosolForcingGiven.length > 0),
    ozone: kindOf(ozoneGiven.length > 0, ozoneForcingGiven.length > 0),
    halogens: kindOf(halogenGiven.length > 0 || fgas !== undefined, halogenForcingGiven.length > 0),
  };
  const computes = (kind: string) => kind === 'emissions' || kind === 'assumed';
  const absentGroups = (Object.keys(groups) as (keyof typeof groups)[]).filter((g) => groups[g] === 'absent');
  if (absentGroups.length > 0) {
    const what: Record<string, string> = {
      aerosol: `aerosol precursors (${AEROSOL_PRECURSORS.map((p) => `${p}_mt`).join(', ')}) nor aerosol forcing (aerosol_ari_wm2, aerosol_aci_wm2 or aerosol_wm2)`,
      ozone: `ozone precursors (${OZONE_PRECURSORS.map((p) => `${p}_mt`).join(', ')}) nor ozone forcing (ozone_wm2 or other_wm2)`,
      halogens: 'halogenated gases (<gas>_kt such as hfc134a_kt, or fgas_mtco2e) nor their forcing (other_ghg_wm2 or other_wm2)',
    };
    throw new InputError([{
      file: source,
      code: 'input.absent-emissions',
      message: `gives ${emissionDriven ? 'CO2 emissions' : 'emissions'} but no ${absentGroups.map((g) => what[g]).join('; no ')}; `
        + "warmcast does not hold today's values silently",
      expected: `those columns, or an assumption chosen with --absent-emissions ${ABSENT_EMISSIONS_CHOICES.join(' | ')} `
        + '(hold: present-day emissions; follow-co2: scaled with the CO2 emissions; zero-by-2060: linearly to zero by then)',
    }]);
  }

  const spliced = history !== undefined && history.years[0] < years[0];
  const h0 = spliced ? history.years[0] : 0;
  const hLast = spliced ? history.years[history.years.length - 1] : 0;
  const anchorYear = spliced ? Math.min(years[0], hLast) : years[0];
  const historyAt = (column: string): number => {
    if (!spliced) return 0;
    const v = (history.series as Series)[column];
    if (!v) throw new InputError([{ file: history.provenance.source, column, code: 'input.history-column', message: `must give ${column} to anchor the forcing computed from emissions`, expected: `a ${column} column` }]);
    return v[anchorYear - h0];
  };

  const assumptions: string[] = [];
  const sources: Record<string, string> = {};
  const ruleFactor = options.absent ? absentEmissionsFactor(options.absent, years, s.co2_gtco2) : undefined;
  const holdFactor = new Float64Array(n).fill(1);
  // A species missing from a group the file gives follows the chosen rule too, or is held without one.
  const factor = ruleFactor ?? holdFactor;
  const partialWord = options.absent ? describeAbsentEmissionsRule(options.absent) : 'held at present-day levels';
  const assumedGroups = (Object.keys(groups) as (keyof typeof groups)[]).filter((g) => groups[g] === 'assumed');
  if (options.absent && assumedGroups.length > 0) {
    const names: Record<string, string> = { aerosol: 'aerosol precursors', ozone: 'ozone precursors', halogens: 'halogenated gases' };
    assumptions.push(`${assumedGroups.map((g) => names[g]).join(', ')} not in the file: emissions ${describeAbsentEmissionsRule(options.absent)} (--absent-emissions)`);
  }

  // Precursor emissions, given or filled.
  const precursorMt = {} as Record<Precursor, Float64Array>;
  const heldPrecursors: Precursor[] = [];
  for (const p of PRECURSORS) {
    const given = s[`${p}_mt`];
    if (given) {
      precursorMt[p] = given;
      continue;
    }
    const group = (AEROSOL_PRECURSORS as readonly string[]).includes(p) ? 'aerosol' : 'ozone';
    if (groups[group] === 'emissions') heldPrecursors.push(p);
    precursorMt[p] = factor.map((x) => x * PRECURSOR_PRESENT_DAY[p]);
  }
  if (heldPrecursors.length > 0) {
    assumptions.push(`${heldPrecursors.map((p) => `${p}_mt`).join(', ')} not in the file: emissions ${partialWord} (present day ${heldPrecursors.map((p) => `${PRECURSOR_PRESENT_DAY[p]} Mt`).join(', ')})`);
  }
  const at = (k: number): PrecursorEmissions => {
    const e = {} as PrecursorEmissions;
    for (const p of PRECURSORS) e[p] = precursorMt[p][k];
    return e;
  };

  const out: Series = {};
  const historyLabel = spliced ? `history to ${Math.min(years[0] - 1, hLast)}, then ` : '';

  // Aerosols, anchored multiplicatively.
  let aerosolScale: EmissionForcing['aerosolScale'];
  if (computes(groups.aerosol)) {
    const ari0 = aerosolAriWm2(at(0));
    const aci0 = aerosolAciWm2(at(0));
    const ariScale = anchorScale(historyAt('aerosol_ari_wm2'), ari0);
    const aciScale = anchorScale(historyAt('aerosol_aci_wm2'), aci0);
    for (const [scale, label] of [[ariScale, 'aerosol-radiation'], [aciScale, 'aerosol-cloud']] as const) {
      if (!(scale >= AEROSOL_SCALE_LIMITS[0] && scale <= AEROSOL_SCALE_LIMITS[1])) {
        const cols = aerosolGiven.map((p) => `${p}_mt`).join(', ') || 'the assumed precursor emissions';
        throw new InputError([{
          file: source,
          line: options.firstRowLine,
          column: cols,
          code: 'input.aerosol-emissions-implausible',
          message: `must give first-year (${years[0]}) aerosol precursor emissions that match the history's ${label} forcing in ${anchorYear}: `
            + `they would need a factor ${scale.toPrecision(3)} on the AR6 coefficients (accepted ${AEROSOL_SCALE_LIMITS[0]}-${AEROSOL_SCALE_LIMITS[1]}); are they in Mt per year?`,
          value: aerosolGiven.map((p) => `${p} ${precursorMt[p][0]}`).join(', '),
          expected: `anthropogenic emissions in Mt yr-1 near present-day inventories (SO2 about ${PRECURSOR_PRESENT_DAY.so2}, BC ${PRECURSOR_PRESENT_DAY.bc}, OC ${PRECURSOR_PRESENT_DAY.oc})`,
        }]);
      }
    }
    aerosolScale = { ari: ariScale, aci: aciScale };
    const ari = new Float64Array(n);
    const aci = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      const e = at(k);
      ari[k] = ariScale * aerosolAriWm2(e);
      aci[k] = aciScale * aerosolAciWm2(e);
    }
    out.aerosol_ari_wm2 = ari;
    out.aerosol_aci_wm2 = aci;
    const how = groups.aerosol === 'emissions' ? "the file's precursor emissions" : `assumed precursor emissions (${describeAbsentEmissionsRule(options.absent!)})`;
    sources.aerosol_ari = `${historyLabel}${how} (AR6 form x ${ariScale.toFixed(2)})`;
    sources.aerosol_aci = `${historyLabel}${how} (AR6 form x ${aciScale.toFixed(2)})`;
    if (!has('bc_snow_wm2') && !has('other_wm2')) {
      const bc0 = precursorMt.bc[0];
      const base = historyAt('bc_snow_wm2');
      out.bc_snow_wm2 = precursorMt.bc.map((e) => (bc0 > 0 ? (base * e) / bc0 : base));
      sources.bc_snow = `${historyLabel}scaled with BC emissions`;
    }
  } else if (groups.aerosol === 'forcing') {
    sources.aerosol_ari = 'the file (forcing)';
    sources.aerosol_aci = 'the file (forcing)';
  }

  // Halogenated gases: concentrations from emissions (or as given), from the state at the join.
  // Ozone needs the halogens only for its EESC term: outside the years the present-day state covers,
  // a file that gives no halogens keeps EESC at the join (noted) instead of being refused.
  const joinKnown = !spliced || (years[0] >= HALOGEN_JOIN_YEARS[0] && years[0] <= HALOGEN_JOIN_YEARS[1]);
  const needHalogens = computes(groups.halogens) || (computes(groups.ozone) && joinKnown);
  if (computes(groups.ozone) && !needHalogens) {
    assumptions.push(`ozone-depleting gases held at their ${anchorYear} EESC: the file gives no halogenated gases and starts outside ${HALOGEN_JOIN_YEARS[0]}-${HALOGEN_JOIN_YEARS[1]}, the years the bundled present-day concentrations cover`);
  }
  let halogenPpt: Partial<Record<HalogenColumn, Float64Array>> | undefined;
  if (needHalogens) {
    if (!joinKnown) {
      throw new InputError([{
        file: source,
        code: 'input.halogen-join',
        message: `must start between ${HALOGEN_JOIN_YEARS[0]} and ${HALOGEN_JOIN_YEARS[1]} to continue the halogenated gases from present-day concentrations, or give other_ghg_wm2 and ozone_wm2 (or other_wm2)`,
        value: String(years[0]),
        expected: `a first year from ${HALOGEN_JOIN_YEARS[0]} to ${HALOGEN_JOIN_YEARS[1]}`,
      }]);
    }
    const fgasShares = fgas ? fluorinatedShares() : undefined;
    halogenPpt = {};
    const heldGases: string[] = [];
    for (const g of HALOGEN_SPECIES) {
      const pd = HALOGEN_PRESENT_DAY[g.column];
      const concentration = s[`${g.column}_ppt`];
      if (concentration) {
        halogenPpt[g.column] = concentration.map((c) => c - pd.preindustrialPpt);
        continue;
      }
      const startAnomaly = spliced ? pd.ppt2019 - pd.preindustrialPpt + pd.trendPptPerYr * (years[0] - 0.5 - HALOGEN_PRESENT_DAY_YEAR) : 0;
      let emissions = s[`${g.column}_kt`];
      if (!emissions && fgas && FGAS_GROUPS.includes(g.group)) {
        const share = fgasShares![g.column];
        emissions = fgas.map((mt) => (1000 * mt * share) / g.gwp100);
      }
      if (!emissions) {
        const present = spliced ? Math.max(0, halogenEmissionsKt(g, pd.ppt2019 - pd.preindustrialPpt, pd.trendPptPerYr)) : 0;
        if (groups.halogens === 'emissions') heldGases.push(g.column);
        emissions = factor.map((x) => x * present);
      }
      halogenPpt[g.column] = halogenAnomalyPpt(g, Math.max(0, startAnomaly), emissions);
    }
    if (heldGases.length > 0) {
      assumptions.push(`${heldGases.length} halogenated gases not in the file (${heldGases.slice(0, 4).join(', ')}${heldGases.length > 4 ? ', ...' : ''}): emissions ${partialWord}`);
    }
    if (computes(groups.halogens)) {
      const base = historyAt('other_ghg_wm2');
      const other = new Float64Array(n);
      for (const g of HALOGEN_SPECIES) {
        const d = halogenPpt[g.column]!;
        for (let k = 0; k < n; k++) other[k] += halogenForcingWm2(g, d[k] - d[0]);
      }
      out.other_ghg_wm2 = other.map((x) => base + x);
      sources.other_ghg = `${historyLabel}${groups.halogens === 'emissions' ? `the file's halogenated gases${heldGases.length > 0 ? ` (${heldGases.length} others assumed)` : ''}` : `assumed halogenated-gas emissions (${describeAbsentEmissionsRule(options.absent!)})`} (AR6 lifetimes and radiative efficiencies)`;
    }
  }
  if (groups.halogens === 'forcing') sources.other_ghg = 'the file (forcing)';

  // EESC of the halogenated gases (zero when they were not computed), for ozone and the species split.
  const eesc = new Float64Array(n);
  for (const g of halogenPpt ? HALOGEN_SPECIES : []) {
    const d = halogenPpt![g.column]!;
    for (let k = 0; k < n; k++) eesc[k] += eescPpt(g, d[k]);
  }

  // Ozone: precursor and EESC terms here, CH4 and N2O terms in forcingByAgent.
  if (computes(groups.ozone)) {
    const base = historyAt('ozone_wm2');
    const o = AR6_OZONE;
    const p = precursorMt;
    out.ozone_wm2 = new Float64Array(n).map((_, k) => base
      + o.perNoxMt * (p.nox[k] - p.nox[0]) + o.perCoMt * (p.co[k] - p.co[0]) + o.perNmvocMt * (p.nmvoc[k] - p.nmvoc[0])
      + o.perEesc * (eesc[k] - eesc[0]));
    sources.ozone = `${historyLabel}${groups.ozone === 'emissions' ? "the file's NOx, CO and NMVOC" : `assumed NOx, CO and NMVOC (${describeAbsentEmissionsRule(options.absent!)})`}, halogens' EESC, and the run's CH4 and N2O (AR6 coefficients)`;
  } else if (groups.ozone === 'forcing') {
    sources.ozone = 'the file (forcing)';
  }
  const stratGiven = has('strat_h2o_wm2') || has('other_wm2');
  if (!stratGiven) {
    out.strat_h2o_wm2 = new Float64Array(n).fill(historyAt('strat_h2o_wm2'));
    sources.strat_h2o = `${historyLabel}the run's CH4 (AR6: 0.092 x CH4 ERF)`;
  } else {
    sources.strat_h2o = 'the file (forcing)';
  }

  const series = { ...file.series } as Series;
  for (const [column, values] of Object.entries(out)) series[column] = values;
  const notes = [...file.provenance.notes];
  notes.push(...assumptions.map((a) => `assumption: ${a}`));
  if (aerosolScale) notes.push(`aerosol forcing from precursor emissions, anchored at the history's ${anchorYear} value: AR6 aerosol-radiation form x ${aerosolScale.ari.toFixed(2)}, aerosol-cloud form x ${aerosolScale.aci.toFixed(2)}`);
  const pathway: Pathway = {
    ...file,
    series: series as Pathway['series'],
    provenance: { ...file.provenance, notes, assumptions: [...(file.provenance.assumptions ?? []), ...assumptions] },
    responsiveFrom: { year: years[0], ozone: computes(groups.ozone), stratH2o: !stratGiven, ...(halogenPpt ? { eescPpt: eesc } : {}) },
  };
  return { pathway, sources, assumptions, aerosolScale, halogenPpt, precursorMt };
}

/** History value over the form's value, or 1 when the form is too small to anchor (a file without a history, or no emissions at the join). */
function anchorScale(historyWm2: number, formWm2: number): number {
  if (Math.abs(formWm2) < 1e-3 || Math.abs(historyWm2) < 1e-3) return 1;
  return historyWm2 / formWm2;
}

/** Problems for a group given both as emissions and as forcing. */
function bothWays(file: string, what: string, emissionColumns: string[], forcingColumns: string[]) {
  if (emissionColumns.length === 0 || forcingColumns.length === 0) return [];
  return [{
    file,
    column: forcingColumns[0],
    code: 'input.forcing-and-emissions',
    message: `must not be given beside ${what} emissions (${emissionColumns.join(', ')}): give the emissions or the forcing, not both`,
    expected: `either ${emissionColumns.join(', ')} or ${forcingColumns.join(', ')}`,
  }];
}

/**
 * Shares of each fluorinated gas in the CO2-equivalent (AR6 GWP100) emissions of 2019 implied by the
 * present-day concentrations: how `fgas_mtco2e` is split over the gases.
 */
export function fluorinatedShares(): Record<string, number> {
  const weights: Record<string, number> = {};
  let total = 0;
  for (const g of HALOGEN_SPECIES) {
    if (!FGAS_GROUPS.includes(g.group)) continue;
    const pd = HALOGEN_PRESENT_DAY[g.column];
    const w = Math.max(0, halogenEmissionsKt(g, pd.ppt2019 - pd.preindustrialPpt, pd.trendPptPerYr)) * g.gwp100;
    weights[g.column] = w;
    total += w;
  }
  for (const k of Object.keys(weights)) weights[k] /= total;
  return weights;
}
