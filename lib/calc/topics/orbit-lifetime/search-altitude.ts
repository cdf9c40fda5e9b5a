/**
 * Root search on a monotone lifetime: the x in [lo, hi] at which ln(L(x)/target) changes sign, by the Illinois
 * variant of regula falsi (Dowell & Jarratt, BIT 11 (1971) 168), which keeps the bracket and converges
 * superlinearly; ln L is close to linear in altitude (exponential atmosphere), so few lifetimes are needed.
 * f values from capped runs (the orbit still up at the horizon) are lower bounds; the bracket stays valid.
 */
export function solveLogLifetime(
  f: (x: number) => number,
  lo: number,
  flo: number,
  hi: number,
  fhi: number,
  tolerance: number,
  maxIterations = 40,
): number {
  if (flo > 0) return lo;
  if (fhi <= 0) return hi;
  let side = 0;
  for (let k = 0; k < maxIterations && hi - lo > tolerance; k++) {
    let x = (lo * fhi - hi * flo) / (fhi - flo);
    // keep each trial strictly inside and away from the ends (guards against stalls on capped values)
    const margin = Math.min(tolerance / 2, (hi - lo) / 4);
    x = Math.min(hi - margin, Math.max(lo + margin, x));
    const fx = f(x);
    if (fx <= 0) {
      lo = x;
      flo = fx;
      if (side === -1) fhi /= 2;
      side = -1;
    } else {
      hi = x;
      fhi = fx;
      if (side === 1) flo /= 2;
      side = 1;
    }
  }
  return lo;
}
