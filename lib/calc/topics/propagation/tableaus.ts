/**
 * Butcher tableaux of the integrators (data + error-estimate kind).
 * DOPRI5: Dormand & Prince, J. Comput. Appl. Math. 6 (1980) 19–26, the 5(4) pair "RK5(4)7M"
 * (also Hairer, Nørsett & Wanner, Solving ODEs I 2nd ed., §II.5, table number from memory); first-same-as-last.
 * DOP853: see dop853Coefficients.ts.
 */
import { DOP853_A, DOP853_B, DOP853_C, DOP853_E3, DOP853_E5 } from './dop853-coefficients';

export interface Tableau {
  name: 'dopri5' | 'dop853';
  c: number[];
  /** a[s] = coefficients of stages 0..s-1 for stage s */
  a: number[][];
  b: number[];
  /** error weights; for dop853 the 5th-order weights */
  e: number[];
  /** dop853 only: 3rd-order error weights (Hairer's combined estimate) */
  e3?: number[];
  /** true when the last stage is evaluated at (t + h, y_new), so f(y_new) comes for free */
  lastStageIsNewPoint: boolean;
  /** order of the error estimator q; step factor ∝ err^(−1/(q+1)) */
  errorOrder: number;
}

const B5 = [35 / 384, 0, 500 / 1113, 125 / 192, -2187 / 6784, 11 / 84, 0];
const B4 = [5179 / 57600, 0, 7571 / 16695, 393 / 640, -92097 / 339200, 187 / 2100, 1 / 40];

export const DOPRI5: Tableau = {
  name: 'dopri5',
  c: [0, 1 / 5, 3 / 10, 4 / 5, 8 / 9, 1, 1],
  a: [
    [],
    [1 / 5],
    [3 / 40, 9 / 40],
    [44 / 45, -56 / 15, 32 / 9],
    [19372 / 6561, -25360 / 2187, 64448 / 6561, -212 / 729],
    [9017 / 3168, -355 / 33, 46732 / 5247, 49 / 176, -5103 / 18656],
    B5.slice(0, 6),
  ],
  b: B5,
  e: B5.map((b, j) => b - B4[j]),
  lastStageIsNewPoint: true,
  errorOrder: 4,
};

export const DOP853: Tableau = {
  name: 'dop853',
  c: DOP853_C,
  a: DOP853_A,
  b: DOP853_B,
  e: DOP853_E5,
  e3: DOP853_E3,
  lastStageIsNewPoint: false,
  errorOrder: 7,
};
