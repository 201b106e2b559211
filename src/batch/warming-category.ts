/** What the AR6 WG3 warming categories are judged on: shares of members, each from 0 to 1. */
export interface CategoryEvidence {
  /** Share of members whose peak warming over 2001-2100 exceeds each level (key: the level in K, as `1.5`). */
  peakAbove: (levelK: number) => number;
  /** Share of members whose warming in 2100 exceeds the level; undefined when the run ends before 2100. */
  warming2100Above?: (levelK: number) => number;
}

/** One warming category: its code (the trade's), its name and the test on the evidence. */
export interface WarmingCategory {
  code: 'C1' | 'C2' | 'C3' | 'C4' | 'C5' | 'C6' | 'C7' | 'C8';
  name: string;
  /** The criterion in words, with its probabilities. */
  criterion: string;
  test: (e: CategoryEvidence) => boolean;
}

/**
 * The warming categories of the IPCC AR6 WG3 report (Table SPM.2 and Annex III; the criteria recalled
 * from memory, not read from the report here): tested in order, a scenario takes the first it meets.
 * Peak warming is over the 21st century; "likelihood" is the share of ensemble members. C1 and C2
 * need the 2100 warming, so a run that ends before 2100 can be no better than C3.
 */
export const AR6_WARMING_CATEGORIES: readonly WarmingCategory[] = [
  {
    code: 'C1',
    name: 'limit warming to 1.5 °C (>50 %) with no or limited overshoot',
    criterion: 'peak warming above 1.5 K with a likelihood of 67 % or less, and warming in 2100 below 1.5 K with a likelihood above 50 %',
    test: (e) => e.peakAbove(1.5) <= 0.67 && e.warming2100Above !== undefined && e.warming2100Above(1.5) < 0.5,
  },
  {
    code: 'C2',
    name: 'return warming to 1.5 °C (>50 %) after a high overshoot',
    criterion: 'peak warming above 1.5 K with a likelihood above 67 %, and warming in 2100 below 1.5 K with a likelihood above 50 %',
    test: (e) => e.peakAbove(1.5) > 0.67 && e.warming2100Above !== undefined && e.warming2100Above(1.5) < 0.5,
  },
  { code: 'C3', name: 'limit warming to 2 °C (>67 %)', criterion: 'peak warming below 2 K with a likelihood above 67 %', test: (e) => 1 - e.peakAbove(2) > 0.67 },
  { code: 'C4', name: 'limit warming to 2 °C (>50 %)', criterion: 'peak warming below 2 K with a likelihood above 50 %', test: (e) => 1 - e.peakAbove(2) > 0.5 },
  { code: 'C5', name: 'limit warming to 2.5 °C (>50 %)', criterion: 'peak warming below 2.5 K with a likelihood above 50 %', test: (e) => 1 - e.peakAbove(2.5) > 0.5 },
  { code: 'C6', name: 'limit warming to 3 °C (>50 %)', criterion: 'peak warming below 3 K with a likelihood above 50 %', test: (e) => 1 - e.peakAbove(3) > 0.5 },
  { code: 'C7', name: 'limit warming to 4 °C (>50 %)', criterion: 'peak warming below 4 K with a likelihood above 50 %', test: (e) => 1 - e.peakAbove(4) > 0.5 },
  { code: 'C8', name: 'exceed warming of 4 °C (>=50 %)', criterion: 'peak warming above 4 K with a likelihood of 50 % or more', test: () => true },
];

/**
 * The AR6 WG3 warming category of a scenario's ensemble: the first of AR6_WARMING_CATEGORIES whose
 * criterion the members meet.
 *
 * @param evidence shares of members above warming levels (peak over 2001-2100, and in 2100)
 * @returns the category
 * @example warmingCategory({ peakAbove: (t) => (t <= 1.5 ? 0.5 : 0), warming2100Above: () => 0.2 }).code // 'C1'
 */
export function warmingCategory(evidence: CategoryEvidence): WarmingCategory {
  return AR6_WARMING_CATEGORIES.find((c) => c.test(evidence))!;
}

/**
 * The evidence of warmingCategory from members' peak warming and 2100 warming (K, one value per
 * member): shares of members strictly above each level.
 *
 * @param peakK each member's peak warming over 2001-2100
 * @param warming2100K each member's warming in 2100, or undefined when the run ends earlier
 */
export function categoryEvidence(peakK: ArrayLike<number>, warming2100K?: ArrayLike<number>): CategoryEvidence {
  const shareAbove = (values: ArrayLike<number>, level: number) => {
    let n = 0;
    for (let i = 0; i < values.length; i++) if (values[i] > level) n++;
    return n / values.length;
  };
  return {
    peakAbove: (level) => shareAbove(peakK, level),
    ...(warming2100K ? { warming2100Above: (level: number) => shareAbove(warming2100K, level) } : {}),
  };
}
