/**
 * Monte-Carlo spread of the node local-time drift caused by Gaussian injection errors.
 *
 * Each sample draws an altitude error Δh ~ N(0, σh) [km] and an inclination error Δi ~ N(0, σi) [rad] (independent,
 * zero mean) and, when asked, a local-time offset ΔLTAN ~ N(0, σL) [min] from a second, independent stream
 * (seeded-random.ts: xoshiro128**, SplitMix64 seeding, Marsaglia polar normals). The drift of the sample is the
 * exact difference of secular node rates of the chosen theory, Ω̇(a + Δh, i + Δi) − Ω̇(a, i), in minutes of local
 * time per year — the same rates as injection-sensitivity, not a linearisation. The correction of a sample is an
 * inclination-only plane change at a node, Δv = 2 v sin(|Δi|/2) (Vallado 4th ed. §6.4, number from memory), plus a
 * two-impulse Hohmann transfer between the injected and the nominal circular radii, Δv = |v₁(√(2r₂/(r₁+r₂)) − 1)| +
 * |v₂(1 − √(2r₁/(r₁+r₂)))| (Vallado 4th ed. §6.3, number from memory), performed separately (a combined
 * manoeuvre costs less: the sum is an upper bound). The local-time offset is not corrected by a manoeuvre here.
 *
 * Quantiles are Hyndman & Fan's definition 7 (linear interpolation between order statistics; R. J. Hyndman and
 * Y. Fan, "Sample quantiles in statistical packages", The American Statistician 50(4) (1996) 361–365).
 * Units: km, rad, s inside; outputs in min/yr, min, m/s.
 */
import { EARTH_MU_KM3_S2 } from '../constants';
import { computeSecularRates, type SecularTheory } from './secular-rates';
import { fillStandardNormals, seededStreams } from './seeded-random';
import { computeLocalTimeDriftMinPerYear } from './sun-synchronous';

/** Two-sided 3σ coverage of a normal distribution, erf(3/√2) = 0.9973002… (rounded as the trade quotes it). */
export const P997 = 0.9973;

export interface DispersionInputs {
  aKm: number;
  iRad: number;
  sigmaAltitudeKm: number;
  sigmaInclinationRad: number;
  /** σ of the local-time offset at injection [min]; 0 ⇒ none drawn */
  sigmaLtanMin: number;
  samples: number;
  seed: number;
  theory: SecularTheory;
  histogramBins: number;
}

export interface HistogramBin {
  driftMinPerYear: number;
  binLowMinPerYear: number;
  binHighMinPerYear: number;
  count: number;
}

export interface DispersionResult {
  nominalDriftMinPerYear: number;
  meanDriftMinPerYear: number;
  ltanDriftSigmaMinPerYear: number;
  ltanDriftP997MinPerYear: number;
  ltanDeviationOneYearP997Min: number;
  planeChangeDeltaVP997Mps: number;
  altitudeDeltaVP997Mps: number;
  correctionDeltaVP997Mps: number;
  histogram: HistogramBin[];
}

/** Quantile p of the values in `sorted` (ascending), Hyndman & Fan definition 7. */
export function quantileSorted(sorted: Float64Array, p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/**
 * Rearrange `a` so that a[k] is its k-th smallest value, smaller or equal values before it and larger or equal after
 * (Hoare's selection, "FIND", Comm. ACM 4(7) (1961) 321, with a median-of-three pivot); O(n) on average.
 */
function selectInPlace(a: Float64Array, k: number): void {
  let left = 0;
  let right = a.length - 1;
  while (right > left) {
    const mid = (left + right) >>> 1;
    // median of three as the pivot value
    const x = a[left];
    const y = a[mid];
    const z = a[right];
    const pivot = x < y ? (y < z ? y : x < z ? z : x) : x < z ? x : y < z ? z : y;
    let i = left;
    let j = right;
    while (i <= j) {
      while (a[i] < pivot) i++;
      while (a[j] > pivot) j--;
      if (i <= j) {
        const t = a[i];
        a[i] = a[j];
        a[j] = t;
        i++;
        j--;
      }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return;
  }
}

/**
 * The same value as quantileSorted on a sorted copy, found by selection instead of a full sort (the two order
 * statistics around (n − 1)p are exact, so the result is identical). `values` is reordered.
 */
export function quantileInPlace(values: Float64Array, p: number): number {
  const n = values.length;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  selectInPlace(values, lo);
  const below = values[lo];
  if (lo + 1 >= n) return below;
  let above = Infinity;
  for (let k = lo + 1; k < n; k++) if (values[k] < above) above = values[k];
  return below + (h - lo) * (above - below);
}

/** Hohmann Δv [km/s] between circular orbits of radius r1 and r2 [km]. */
export function computeHohmannDeltaV(r1: number, r2: number): number {
  const sum = r1 + r2;
  const v1 = Math.sqrt(EARTH_MU_KM3_S2 / r1);
  const v2 = Math.sqrt(EARTH_MU_KM3_S2 / r2);
  return Math.abs(v1 * (Math.sqrt((2 * r2) / sum) - 1)) + Math.abs(v2 * (1 - Math.sqrt((2 * r1) / sum)));
}

/** Equal-width histogram of `values` over [min, max] (symmetric about 0 when the values straddle it). */
function buildHistogram(values: Float64Array, bins: number): HistogramBin[] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const x of values) {
    if (x < lo) lo = x;
    if (x > hi) hi = x;
  }
  if (lo < 0 && hi > 0) {
    const m = Math.max(-lo, hi);
    lo = -m;
    hi = m;
  }
  if (!(hi > lo)) {
    // every sample equal (all σ zero): one bin of width 1e-9 min/yr around the value
    lo -= 5e-10;
    hi += 5e-10;
  }
  const width = (hi - lo) / bins;
  const counts = new Array<number>(bins).fill(0);
  for (const x of values) counts[Math.min(bins - 1, Math.floor((x - lo) / width))]++;
  return counts.map((count, k) => ({
    driftMinPerYear: lo + (k + 0.5) * width,
    binLowMinPerYear: lo + k * width,
    binHighMinPerYear: lo + (k + 1) * width,
    count,
  }));
}

/** Run the Monte-Carlo (see the module note). Deterministic for a given seed and inputs. */
export function computeInjectionDispersion(o: DispersionInputs): DispersionResult {
  const n = o.samples;
  const [errorStream, ltanStream] = seededStreams(o.seed);
  const normals = fillStandardNormals(errorStream, new Float64Array(2 * n));
  const ltanNormals = o.sigmaLtanMin > 0 ? fillStandardNormals(ltanStream, new Float64Array(n)) : undefined;
  const nominalDrift = computeLocalTimeDriftMinPerYear(computeSecularRates(o.aKm, 0, o.iRad, o.theory).nodeRate);
  const vNominal = Math.sqrt(EARTH_MU_KM3_S2 / o.aKm);

  const drift = new Float64Array(n);
  const absDrift = new Float64Array(n);
  const deviation = new Float64Array(ltanNormals ? n : 0);
  const planeDv = new Float64Array(n);
  const altitudeDv = new Float64Array(n);
  const totalDv = new Float64Array(n);
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const dh = o.sigmaAltitudeKm * normals[2 * k];
    const di = o.sigmaInclinationRad * normals[2 * k + 1];
    const d =
      computeLocalTimeDriftMinPerYear(computeSecularRates(o.aKm + dh, 0, o.iRad + di, o.theory).nodeRate) -
      nominalDrift;
    drift[k] = d;
    absDrift[k] = Math.abs(d);
    sum += d;
    if (ltanNormals) deviation[k] = Math.abs(d + o.sigmaLtanMin * ltanNormals[k]);
    planeDv[k] = 2 * vNominal * Math.sin(Math.abs(di) / 2) * 1000;
    altitudeDv[k] = dh === 0 ? 0 : computeHohmannDeltaV(o.aKm + dh, o.aKm) * 1000;
    totalDv[k] = planeDv[k] + altitudeDv[k];
  }
  const mean = sum / n;
  let squares = 0;
  for (let k = 0; k < n; k++) squares += (drift[k] - mean) ** 2;
  const p997 = (values: Float64Array) => quantileInPlace(values, P997);
  const histogram = buildHistogram(drift, o.histogramBins);
  const ltanDriftP997 = p997(absDrift);
  return {
    nominalDriftMinPerYear: nominalDrift,
    meanDriftMinPerYear: mean,
    ltanDriftSigmaMinPerYear: Math.sqrt(squares / Math.max(1, n - 1)),
    ltanDriftP997MinPerYear: ltanDriftP997,
    // without a local-time offset the one-year deviation is the drift over one year
    ltanDeviationOneYearP997Min: ltanNormals ? p997(deviation) : ltanDriftP997,
    planeChangeDeltaVP997Mps: p997(planeDv),
    altitudeDeltaVP997Mps: p997(altitudeDv),
    correctionDeltaVP997Mps: p997(totalDv),
    histogram,
  };
}
