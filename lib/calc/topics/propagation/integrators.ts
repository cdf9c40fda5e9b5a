/**
 * ODE integrators for y' = f(t, y) on Float64Array states, allocation-free in the step loop.
 *  - integrateRk4: classical fixed-step 4th-order Runge–Kutta (Kutta 1901; Hairer, Nørsett & Wanner, Solving ODEs I
 *    2nd ed., §II.1).
 *  - integrateAdaptive: embedded pairs DOPRI5 (Dormand & Prince 1980) and DOP853 (Hairer et al. §II.5) with the
 *    step-size control of Hairer et al. §II.4 (eq. 4.10–4.13): err = ‖error / (atol + rtol·max(|y|,|y_new|))‖_RMS,
 *    h_new = h · min(10, max(0.2, 0.9 · err^(−1/(q+1)))), no increase right after a rejection; starting step
 *    from Hairer et al. §II.4 "Starting step size" algorithm (equation numbers from memory).
 * Units are those of the caller.
 */
import { DOP853, DOPRI5, type Tableau } from './tableaus';

export type Derivative = (t: number, y: Float64Array, dydt: Float64Array) => void;
/** Called after every accepted step with the new time and state (do not keep the array). */
export type StepObserver = (t: number, y: Float64Array) => void;

export interface IntegrationStats {
  t: number;
  y: Float64Array;
  steps: number;
  rejected: number;
  evaluations: number;
}

export interface AdaptiveOptions {
  relTol: number;
  absTol: number;
  maxSteps: number;
}

export class IntegrationError extends Error {}

/** Classical RK4 with nSteps equal steps from t0 to t1. */
export function integrateRk4(
  f: Derivative,
  t0: number,
  y0: Float64Array,
  t1: number,
  nSteps: number,
  onStep?: StepObserver,
): IntegrationStats {
  const n = y0.length;
  const y = Float64Array.from(y0);
  const k1 = new Float64Array(n);
  const k2 = new Float64Array(n);
  const k3 = new Float64Array(n);
  const k4 = new Float64Array(n);
  const tmp = new Float64Array(n);
  const h = (t1 - t0) / nSteps;
  let t = t0;
  for (let s = 0; s < nSteps; s++) {
    f(t, y, k1);
    for (let d = 0; d < n; d++) tmp[d] = y[d] + 0.5 * h * k1[d];
    f(t + 0.5 * h, tmp, k2);
    for (let d = 0; d < n; d++) tmp[d] = y[d] + 0.5 * h * k2[d];
    f(t + 0.5 * h, tmp, k3);
    for (let d = 0; d < n; d++) tmp[d] = y[d] + h * k3[d];
    f(t + h, tmp, k4);
    for (let d = 0; d < n; d++) y[d] += (h / 6) * (k1[d] + 2 * k2[d] + 2 * k3[d] + k4[d]);
    t = s + 1 === nSteps ? t1 : t0 + (s + 1) * h;
    if (onStep) onStep(t, y);
  }
  return { t, y, steps: nSteps, rejected: 0, evaluations: 4 * nSteps };
}

/** Sparse form of tableau rows: for each row the stage indices and values of its non-zero coefficients. */
interface SparseRows {
  /** row r occupies [start[r], start[r + 1]) of idx/val */
  start: Int32Array;
  idx: Int32Array;
  val: Float64Array;
}

function sparseRows(rows: number[][]): SparseRows {
  const start = [0];
  const idx: number[] = [];
  const val: number[] = [];
  for (const row of rows) {
    row.forEach((v, j) => {
      if (v !== 0) {
        idx.push(j);
        val.push(v);
      }
    });
    start.push(idx.length);
  }
  return { start: Int32Array.from(start), idx: Int32Array.from(idx), val: Float64Array.from(val) };
}

/**
 * Pre-processed tableau with flat work arrays for an n-dimensional state: stage derivatives live in
 * one Float64Array k (stage s at offset s·n), so the step loop allocates nothing.
 */
class EmbeddedStepper {
  readonly stages: number;
  /** rows 0..stages-1: a; row stages: b; row stages+1: e; row stages+2: e3 (empty when absent) */
  readonly rows: SparseRows;
  readonly hasE3: boolean;
  readonly k: Float64Array;
  readonly stage: Float64Array;
  readonly stageView: Float64Array[];
  readonly c: Float64Array;

  constructor(
    readonly tab: Tableau,
    readonly n: number,
  ) {
    this.stages = tab.c.length;
    this.hasE3 = tab.e3 !== undefined;
    this.rows = sparseRows([...tab.a, tab.b, tab.e, tab.e3 ?? []]);
    // slot `stages` holds f(t + h, y_new) when the tableau does not provide it as its last stage
    this.k = new Float64Array((this.stages + 1) * n);
    this.stageView = Array.from({ length: this.stages + 1 }, (_, s) => this.k.subarray(s * n, (s + 1) * n));
    this.stage = new Float64Array(n);
    this.c = Float64Array.from(tab.c);
  }

  /** out[d] = Σ_j row_r[j] · k_j[d] */
  private combine(r: number, out: Float64Array): void {
    const { n, k } = this;
    const { start, idx, val } = this.rows;
    const j0 = start[r];
    const j1 = start[r + 1];
    for (let d = 0; d < n; d++) {
      let acc = 0;
      for (let j = j0; j < j1; j++) acc += val[j] * k[idx[j] * n + d];
      out[d] = acc;
    }
  }

  /** k_0 must hold f(t, y). Writes y_new and returns the scaled error norm. */
  attempt(
    f: Derivative,
    t: number,
    y: Float64Array,
    h: number,
    yNew: Float64Array,
    work: Float64Array,
    work3: Float64Array,
    o: AdaptiveOptions,
  ): number {
    const { n, stage, stageView, c } = this;
    for (let s = 1; s < this.stages; s++) {
      this.combine(s, stage);
      for (let d = 0; d < n; d++) stage[d] = y[d] + h * stage[d];
      f(t + c[s] * h, stage, stageView[s]);
    }
    this.combine(this.stages, yNew);
    for (let d = 0; d < n; d++) yNew[d] = y[d] + h * yNew[d];
    this.combine(this.stages + 1, work);
    if (this.hasE3) this.combine(this.stages + 2, work3);
    let s5 = 0;
    let s3 = 0;
    for (let d = 0; d < n; d++) {
      const sc = o.absTol + o.relTol * Math.max(Math.abs(y[d]), Math.abs(yNew[d]));
      s5 += (work[d] / sc) ** 2;
      if (this.hasE3) s3 += (work3[d] / sc) ** 2;
    }
    if (!this.hasE3) return Math.abs(h) * Math.sqrt(s5 / n);
    if (s5 === 0 && s3 === 0) return 0;
    // DOP853 combined estimate (Hairer et al., description of DOP853): err = |h| · err5² / sqrt(n (err5² + 0.01 err3²))
    return (Math.abs(h) * s5) / Math.sqrt(n * (s5 + 0.01 * s3));
  }
}

function rmsScaled(v: Float64Array, y: Float64Array, o: AdaptiveOptions): number {
  let s = 0;
  for (let d = 0; d < v.length; d++) s += (v[d] / (o.absTol + o.relTol * Math.abs(y[d]))) ** 2;
  return Math.sqrt(s / v.length);
}

/** Starting step size, Hairer, Nørsett & Wanner §II.4 ("Starting step size"). */
function initialStep(
  f: Derivative,
  t0: number,
  y0: Float64Array,
  f0: Float64Array,
  order: number,
  o: AdaptiveOptions,
  span: number,
): number {
  const d0 = rmsScaled(y0, y0, o);
  const d1 = rmsScaled(f0, y0, o);
  const h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 : (0.01 * d0) / d1;
  const y1 = new Float64Array(y0.length);
  const f1 = new Float64Array(y0.length);
  for (let d = 0; d < y0.length; d++) y1[d] = y0[d] + h0 * f0[d];
  f(t0 + h0, y1, f1);
  for (let d = 0; d < y0.length; d++) f1[d] -= f0[d];
  const d2 = rmsScaled(f1, y0, o) / h0;
  const h1 = Math.max(d1, d2) <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : (0.01 / Math.max(d1, d2)) ** (1 / (order + 1));
  return Math.min(100 * h0, h1, span);
}

const SAFETY = 0.9;
const MIN_FACTOR = 0.2;
const MAX_FACTOR = 10;

/** Adaptive integration with DOPRI5 or DOP853 from t0 to t1 (t1 > t0). */
export function integrateAdaptive(
  method: 'dopri5' | 'dop853',
  f: Derivative,
  t0: number,
  y0: Float64Array,
  t1: number,
  o: AdaptiveOptions,
  onStep?: StepObserver,
): IntegrationStats {
  const tab = method === 'dopri5' ? DOPRI5 : DOP853;
  const n = y0.length;
  const st = new EmbeddedStepper(tab, n);
  const exponent = -1 / (tab.errorOrder + 1);
  let y = Float64Array.from(y0);
  let yNew = new Float64Array(n);
  const k0 = st.stageView[0];
  const work = new Float64Array(n);
  const work3 = new Float64Array(n);
  f(t0, y, k0);
  let evaluations = 2;
  let h = initialStep(f, t0, y, k0, tab.errorOrder, o, t1 - t0);
  let t = t0;
  let steps = 0;
  let rejected = 0;
  const newPoint = tab.lastStageIsNewPoint ? st.stageView[st.stages - 1] : st.stageView[st.stages];
  while (t < t1) {
    if (steps >= o.maxSteps) throw new IntegrationError(`more than ${o.maxSteps} steps needed`);
    let justRejected = false;
    for (;;) {
      const hTry = Math.min(h, t1 - t);
      const err = st.attempt(f, t, y, hTry, yNew, work, work3, o);
      evaluations += st.stages - 1;
      if (err < 1) {
        let factor = err === 0 ? MAX_FACTOR : Math.min(MAX_FACTOR, SAFETY * err ** exponent);
        if (justRejected) factor = Math.min(1, factor);
        t = hTry === t1 - t ? t1 : t + hTry;
        h = hTry * factor;
        break;
      }
      h = hTry * Math.max(MIN_FACTOR, SAFETY * err ** exponent);
      justRejected = true;
      rejected++;
      if (!(h > 1e-12 * Math.max(1, Math.abs(t)))) throw new IntegrationError('step size underflow');
    }
    if (!tab.lastStageIsNewPoint) {
      f(t, yNew, newPoint);
      evaluations++;
    }
    // first-same-as-last: f(t_new, y_new) becomes stage 0 of the next step
    k0.set(newPoint);
    [y, yNew] = [yNew, y];
    steps++;
    if (onStep) onStep(t, y);
  }
  return { t, y, steps, rejected, evaluations };
}
