import { leastSquaresSlope } from '../stats/index.js';
import { DEFAULT_DIAMETER_EXPONENT } from './normalise-time.js';

export interface DiameterRow {
  athleteId: string;
  eventType: string;
  speciesId: string;
  diameterMm: number;
  hundredths: number;
}

/**
 * Below these the fit falls back to cross-section area (exponent 2). Counted only over
 * results from an athlete who cut the same event and species on two or more diameters,
 * since nobody else's results say anything about diameter once athletes are demeaned.
 */
export const EXPONENT_FIT_THRESHOLDS = { minResults: 30, minAthletes: 5 } as const;

export interface DiameterExponentFit {
  source: 'fitted' | 'default';
  exponent: number;
  standardError: number | null;
  /** 95 % t interval for the exponent; null for the default. */
  low: number | null;
  high: number | null;
  /** Results and athletes that carried information about diameter. */
  results: number;
  athletes: number;
  note: string;
}

/**
 * Estimates k in time ∝ diameter^k from the league's own results: least squares of
 * ln(time) on ln(diameter) after subtracting each athlete's own means (per athlete, event
 * type and species), so a fast athlete who races big blocks does not bend the slope.
 */
export function fitDiameterExponent(
  rows: readonly DiameterRow[],
  thresholds: { minResults: number; minAthletes: number } = EXPONENT_FIT_THRESHOLDS,
): DiameterExponentFit {
  const strata = new Map<string, DiameterRow[]>();
  for (const row of rows) {
    if (!(row.hundredths > 0 && row.diameterMm > 0)) continue;
    const key = JSON.stringify([row.athleteId, row.eventType, row.speciesId]);
    strata.set(key, [...(strata.get(key) ?? []), row]);
  }
  const informative = [...strata.values()].filter((group) => new Set(group.map((r) => r.diameterMm)).size >= 2);
  const results = informative.reduce((sum, group) => sum + group.length, 0);
  const athletes = new Set(informative.flatMap((group) => group.map((r) => r.athleteId))).size;
  if (results < thresholds.minResults || athletes < thresholds.minAthletes) {
    return fallback(
      results,
      athletes,
      `Too little data to estimate the diameter exponent (${results} results from ${athletes} athletes on two or more diameters; ` +
        `needs ${thresholds.minResults} and ${thresholds.minAthletes}); using cross-section area (exponent 2).`,
    );
  }
  const points = informative.flatMap((group) => {
    const meanX = group.reduce((s, r) => s + Math.log(r.diameterMm), 0) / group.length;
    const meanY = group.reduce((s, r) => s + Math.log(r.hundredths), 0) / group.length;
    return group.map((r) => ({ x: Math.log(r.diameterMm) - meanX, y: Math.log(r.hundredths) - meanY }));
  });
  const absorbedParameters = informative.length - 1;
  if (points.length - 2 - absorbedParameters < 1) {
    return fallback(results, athletes, 'No degrees of freedom left after demeaning; using cross-section area (exponent 2).');
  }
  const fit = leastSquaresSlope(points, { absorbedParameters });
  return {
    source: 'fitted',
    exponent: fit.slope,
    standardError: fit.standardError,
    low: fit.low,
    high: fit.high,
    results,
    athletes,
    note: `Fitted from ${results} results by ${athletes} athletes who cut two or more diameters.`,
  };
}

function fallback(results: number, athletes: number, note: string): DiameterExponentFit {
  return { source: 'default', exponent: DEFAULT_DIAMETER_EXPONENT, standardError: null, low: null, high: null, results, athletes, note };
}
