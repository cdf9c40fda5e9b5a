import { describe, expect, it } from 'vitest';
import { DOP853, DOPRI5, type Tableau } from '../../../../../lib/calc/topics/propagation/tableaus';

/** Σ_i b_i c_i^k = 1/(k+1): the "bushy tree" order conditions (Hairer, Nørsett & Wanner §II.2). */
function quadratureError(t: Tableau, weights: number[], k: number): number {
  return Math.abs(weights.reduce((s, b, i) => s + b * t.c[i] ** k, 0) - 1 / (k + 1));
}

describe('Runge–Kutta tableaux transcribed from the published tables', () => {
  it.each([DOPRI5, DOP853])('$name: row sums of A equal c (consistency)', (t) => {
    t.a.forEach((row, s) => expect(Math.abs(row.reduce((x, y) => x + y, 0) - t.c[s])).toBeLessThan(1e-13));
  });

  it('DOPRI5 (Dormand & Prince 1980): 5th-order weights satisfy Σ b c^k = 1/(k+1) for k ≤ 4, 4th-order weights for k ≤ 3', () => {
    for (let k = 0; k <= 4; k++) expect(quadratureError(DOPRI5, DOPRI5.b, k)).toBeLessThan(1e-15);
    const bStar = DOPRI5.b.map((b, i) => b - DOPRI5.e[i]);
    for (let k = 0; k <= 3; k++) expect(quadratureError(DOPRI5, bStar, k)).toBeLessThan(1e-15);
    expect(quadratureError(DOPRI5, bStar, 4)).toBeGreaterThan(1e-6); // genuinely only 4th order
  });

  it('DOP853 (Hairer et al. 2nd ed.): 8th-order weights satisfy Σ b c^k = 1/(k+1) for k ≤ 7', () => {
    for (let k = 0; k <= 7; k++) expect(quadratureError(DOP853, DOP853.b, k)).toBeLessThan(1e-13);
  });

  it('DOP853: a second-level condition Σ b_i a_ij c_j = 1/6 holds', () => {
    let s = 0;
    DOP853.a.forEach((row, i) => row.forEach((a, j) => (s += DOP853.b[i] * a * DOP853.c[j])));
    expect(Math.abs(s - 1 / 6)).toBeLessThan(1e-13);
  });

  it('error weights sum to zero (they estimate a difference of two consistent methods)', () => {
    expect(Math.abs(DOPRI5.e.reduce((x, y) => x + y, 0))).toBeLessThan(1e-15);
    expect(Math.abs(DOP853.e.reduce((x, y) => x + y, 0))).toBeLessThan(1e-13);
    expect(Math.abs((DOP853.e3 ?? [1]).reduce((x, y) => x + y, 0))).toBeLessThan(1e-13);
  });
});
