/**
 * NRLMSISE-00 empirical model of the neutral atmosphere, 0–1000 km.
 *
 * Method: J. M. Picone, A. E. Hedin, D. P. Drob and A. C. Aikin, "NRLMSISE-00 empirical model of the
 * atmosphere: Statistical comparisons and scientific issues", J. Geophys. Res. 107(A12), 1468 (2002),
 * built on MSIS-86 (Hedin 1987, J. Geophys. Res. 92, 4649) and MSISE-90 (Hedin 1991, J. Geophys. Res. 96, 1159).
 * The model is defined by its published release (FORTRAN routines GTD7/GTD7D, GTS7, GLOBE7, GLOB7S,
 * DENSU, DENSM and the coefficient block GTD7BK); this is a TypeScript rendering of that algorithm, with
 * the coefficients of nrlmsise00Coefficients.ts. The release's rounded constants (degree-to-radian
 * 1.74533e-2, day-to-radian 1.72142e-2, hour-to-radian 0.2618, second-to-radian 7.2722e-5, R = 831.4,
 * amu 1.66e-24 g) are kept, because the published check values depend on them.
 *
 * Units are the model's own (CGS): number densities cm⁻³, mass density g/cm³, temperatures K,
 * altitude km (geodetic), latitude/longitude degrees (geodetic), local solar time hours.
 * All switches are at their standard setting (every variation on). Daily Ap is used unless a 7-value
 * Ap history is given (the model's switch 9 = −1 mode):
 *   [daily Ap, 3-h ap now, 3 h before, 6 h before, 9 h before, mean of the eight 3-h ap 12–33 h before,
 *    mean of the eight 3-h ap 36–57 h before].
 * Below 72.5 km O, H, N and anomalous O are zero (as in the model).
 * Pure function; the spline routines share module scratch arrays, which is safe because a call runs
 * to completion before another can start.
 */
import { PAVGM, PD, PDL, PDM, PMA, PS, PT, PTL, PTM } from './nrlmsise00-coefficients';

export interface Nrlmsise00Input {
  /** day of year, 1–366 (UTC) */
  dayOfYear: number;
  /** seconds of the UTC day */
  utSeconds: number;
  /** geodetic altitude [km] */
  altitudeKm: number;
  /** geodetic latitude [deg] */
  latitudeDeg: number;
  /** longitude [deg], east positive */
  longitudeDeg: number;
  /** local apparent solar time [h] */
  localSolarTimeHours: number;
  /** 81-day average F10.7 centred on the day [sfu] */
  f107Average: number;
  /** daily F10.7 of the previous day [sfu] */
  f107: number;
  /** daily magnetic index Ap */
  ap: number;
  /** optional 7-value Ap history (see module note); switches the model to its Ap-history mode */
  apHistory?: readonly number[];
}

export interface Nrlmsise00Output {
  /** number densities [cm⁻³] */
  he: number;
  o: number;
  n2: number;
  o2: number;
  ar: number;
  h: number;
  n: number;
  anomalousO: number;
  /** total mass density [g/cm³] without anomalous oxygen (GTD7) */
  massDensityGCm3: number;
  /** effective total mass density [g/cm³] including anomalous oxygen (GTD7D): the value for drag */
  effectiveMassDensityGCm3: number;
  /** exospheric temperature [K] */
  exosphericTemperatureK: number;
  /** temperature at altitude [K] */
  temperatureK: number;
}

const DGTR = 1.74533e-2;
const DR = 1.72142e-2;
const HR = 0.2618;
const SR = 7.2722e-5;
const RGAS = 831.4;
const AMU_G = 1.66e-24;

/** Thermospheric spline nodes ZN1 (the first is replaced by the turbopause-model altitude PDL[1][15]). */
const ZA = PDL[1][15];
const ZN1 = [ZA, 110.0, 100.0, 90.0, 72.5];
const ZN2 = [72.5, 55.0, 45.0, 32.5];
const ZN3 = [32.5, 20.0, 15.0, 10.0, 0.0];
const ZMIX = 62.5;
/** Thermal-diffusion coefficients α per species (He, O, N2, O2, Ar, –, H, N, anomalous O). */
const ALPHA = [-0.38, 0.0, 0.0, 0.0, 0.17, 0.0, -0.38, 0.0, 0.0];
/** Altitudes below which the mixing (turbopause) correction is applied, per species. */
const ALTL = [200.0, 300.0, 160.0, 250.0, 240.0, 450.0, 320.0, 450.0];

/** State of one evaluation (the model's common blocks). */
interface State {
  doy: number;
  sec: number;
  lat: number;
  lon: number;
  lst: number;
  f107: number;
  f107A: number;
  ap: number;
  apHistory: readonly number[] | undefined;
  /** gravity at the surface [cm/s²] and effective Earth radius [km] for the latitude */
  gsurf: number;
  re: number;
  dfa: number;
  p0: Float64Array;
  p1: Float64Array;
  p2: Float64Array;
  p3: Float64Array;
  ctloc: number;
  stloc: number;
  c2tloc: number;
  s2tloc: number;
  c3tloc: number;
  s3tloc: number;
  /** magnetic-activity functions left by the last GLOBE7 evaluation (read by GLOB7S) */
  apdf: number;
  apt0: number;
  tn1: number[];
  tgn1: number[];
  tn2: number[];
  tgn2: number[];
  tn3: number[];
  tgn3: number[];
  /** temperature left by the last DENSU/DENSM evaluation */
  tz: number;
  /** mixed N2 density at altitude from GTS7 */
  dm28: number;
}

// Scratch arrays for the spline routines (at most 5 nodes are used).
const XS = new Float64Array(10);
const YS = new Float64Array(10);
const Y2 = new Float64Array(10);
const U = new Float64Array(10);

function zeta(re: number, zz: number, zl: number): number {
  return ((zz - zl) * (re + zl)) / (re + zz);
}

/** Second derivatives of a cubic spline (Press et al., Numerical Recipes); end slopes yp1, ypn. */
function spline(x: Float64Array, y: Float64Array, n: number, yp1: number, ypn: number, y2: Float64Array): void {
  if (yp1 > 0.99e30) {
    y2[0] = 0;
    U[0] = 0;
  } else {
    y2[0] = -0.5;
    U[0] = (3.0 / (x[1] - x[0])) * ((y[1] - y[0]) / (x[1] - x[0]) - yp1);
  }
  for (let i = 1; i < n - 1; i++) {
    const sig = (x[i] - x[i - 1]) / (x[i + 1] - x[i - 1]);
    const p = sig * y2[i - 1] + 2.0;
    y2[i] = (sig - 1.0) / p;
    U[i] =
      ((6.0 * ((y[i + 1] - y[i]) / (x[i + 1] - x[i]) - (y[i] - y[i - 1]) / (x[i] - x[i - 1]))) / (x[i + 1] - x[i - 1]) -
        sig * U[i - 1]) /
      p;
  }
  let qn = 0;
  let un = 0;
  if (!(ypn > 0.99e30)) {
    qn = 0.5;
    un = (3.0 / (x[n - 1] - x[n - 2])) * (ypn - (y[n - 1] - y[n - 2]) / (x[n - 1] - x[n - 2]));
  }
  y2[n - 1] = (un - qn * U[n - 2]) / (qn * y2[n - 2] + 1.0);
  for (let k = n - 2; k >= 0; k--) y2[k] = y2[k] * y2[k + 1] + U[k];
}

/** Cubic-spline value at x. */
function splint(xa: Float64Array, ya: Float64Array, y2a: Float64Array, n: number, x: number): number {
  let klo = 0;
  let khi = n - 1;
  while (khi - klo > 1) {
    const k = (khi + klo) >> 1;
    if (xa[k] > x) khi = k;
    else klo = k;
  }
  const h = xa[khi] - xa[klo];
  const a = (xa[khi] - x) / h;
  const b = (x - xa[klo]) / h;
  return a * ya[klo] + b * ya[khi] + (((a * a * a - a) * y2a[klo] + (b * b * b - b) * y2a[khi]) * h * h) / 6.0;
}

/** Integral of the cubic spline from xa[0] to x. */
function splini(xa: Float64Array, ya: Float64Array, y2a: Float64Array, n: number, x: number): number {
  let yi = 0;
  let klo = 0;
  let khi = 1;
  while (x > xa[klo] && khi < n) {
    let xx = x;
    if (khi < n - 1) xx = x < xa[khi] ? x : xa[khi];
    const h = xa[khi] - xa[klo];
    const a = (xa[khi] - xx) / h;
    const b = (xx - xa[klo]) / h;
    const a2 = a * a;
    const b2 = b * b;
    yi +=
      (((1.0 - a2) * ya[klo]) / 2.0 +
        (b2 * ya[khi]) / 2.0 +
        (((-(1.0 + a2 * a2) / 4.0 + a2 / 2.0) * y2a[klo] + ((b2 * b2) / 4.0 - b2 / 2.0) * y2a[khi]) * h * h) / 6.0) *
      h;
    klo++;
    khi++;
  }
  return yi;
}

/** Chemistry/dissociation correction: target ratio r, transition scale h1, half-ratio altitude zh. */
function ccor(alt: number, r: number, h1: number, zh: number): number {
  const e = (alt - zh) / h1;
  if (e > 70) return 1;
  if (e < -70) return Math.exp(r);
  return Math.exp(r / (1.0 + Math.exp(e)));
}

/** Two-scale version of ccor. */
function ccor2(alt: number, r: number, h1: number, zh: number, h2: number): number {
  const e1 = (alt - zh) / h1;
  const e2 = (alt - zh) / h2;
  if (e1 > 70 || e2 > 70) return 1;
  if (e1 < -70 && e2 < -70) return Math.exp(r);
  return Math.exp(r / (1.0 + 0.5 * (Math.exp(e1) + Math.exp(e2))));
}

/** Turbopause correction: combines diffusive density dd and fully mixed density dm. */
function dnet(dd: number, dm: number, zhm: number, xmm: number, xm: number): number {
  const a = zhm / (xmm - xm);
  if (!(dm > 0 && dd > 0)) {
    if (dd === 0 && dm === 0) dd = 1;
    if (dm === 0) return dd;
    if (dd === 0) return dm;
  }
  const ylog = a * Math.log(dm / dd);
  if (ylog < -10) return dd;
  if (ylog > 10) return dm;
  return dd * Math.pow(1.0 + Math.exp(ylog), 1.0 / a);
}

function scaleHeight(s: State, alt: number, xm: number, temp: number): number {
  const g = s.gsurf / Math.pow(1.0 + alt / s.re, 2.0);
  return (RGAS * temp) / (g * xm);
}

/** Fill XS, YS, Y2 for temperature nodes zn/tn with end gradients tgn; returns [zgdif, x] for altitude z. */
function temperatureSpline(
  s: State,
  z: number,
  zn: readonly number[],
  tn: readonly number[],
  tgn: readonly number[],
  mn: number,
): [number, number] {
  const z1 = zn[0];
  const z2 = zn[mn - 1];
  const t1 = tn[0];
  const t2 = tn[mn - 1];
  const zg = zeta(s.re, z, z1);
  const zgdif = zeta(s.re, z2, z1);
  for (let k = 0; k < mn; k++) {
    XS[k] = zeta(s.re, zn[k], z1) / zgdif;
    YS[k] = 1.0 / tn[k];
  }
  const yd1 = (-tgn[0] / (t1 * t1)) * zgdif;
  const yd2 = (-tgn[1] / (t2 * t2)) * zgdif * Math.pow((s.re + z2) / (s.re + z1), 2.0);
  spline(XS, YS, mn, yd1, yd2, Y2);
  return [zgdif, zg / zgdif];
}

/**
 * Temperature (xm = 0) or density of species of mass xm in the thermosphere: Bates profile above
 * ZN1[0], spline in inverse temperature below (DENSU). Sets s.tz.
 */
function densu(
  s: State,
  alt: number,
  dlb: number,
  tinf: number,
  tlb: number,
  xm: number,
  alpha: number,
  zlb: number,
  s2: number,
): number {
  const za = ZN1[0];
  const zg2 = zeta(s.re, Math.max(alt, za), zlb);
  const tt = tinf - (tinf - tlb) * Math.exp(-s2 * zg2);
  s.tz = tt;
  let zgdif = 0;
  let x = 0;
  if (alt < za) {
    s.tgn1[0] = (tinf - tt) * s2 * Math.pow((s.re + zlb) / (s.re + za), 2.0);
    s.tn1[0] = tt;
    [zgdif, x] = temperatureSpline(s, Math.max(alt, ZN1[4]), ZN1, s.tn1, s.tgn1, 5);
    s.tz = 1.0 / splint(XS, YS, Y2, 5, x);
  }
  if (xm === 0) return s.tz;

  let glb = s.gsurf / Math.pow(1.0 + zlb / s.re, 2.0);
  const gamma = (xm * glb) / (s2 * RGAS * tinf);
  // (sic) the release caps exp(...) rather than its argument; kept as published
  let expl = Math.exp(-s2 * gamma * zg2);
  if (expl > 50.0 || tt <= 0) expl = 50.0;
  const densa = dlb * Math.pow(tlb / tt, 1.0 + alpha + gamma) * expl;
  if (alt >= za) return densa;

  glb = s.gsurf / Math.pow(1.0 + ZN1[0] / s.re, 2.0);
  const gamm = (xm * glb * zgdif) / RGAS;
  let expl2 = gamm * splini(XS, YS, Y2, 5, x);
  if (expl2 > 50.0 || s.tz <= 0) expl2 = 50.0;
  return densa * Math.pow(s.tn1[0] / s.tz, 1.0 + alpha) * Math.exp(-expl2);
}

/** Temperature (xm = 0) or density in the middle and lower atmosphere below 72.5 km (DENSM). Sets s.tz. */
function densm(s: State, alt: number, d0: number, xm: number): number {
  let dens = d0;
  // stratosphere / mesosphere
  let [zgdif, x] = temperatureSpline(s, Math.max(alt, ZN2[3]), ZN2, s.tn2, s.tgn2, 4);
  s.tz = 1.0 / splint(XS, YS, Y2, 4, x);
  if (xm !== 0) {
    const glb = s.gsurf / Math.pow(1.0 + ZN2[0] / s.re, 2.0);
    const expl = Math.min(((xm * glb * zgdif) / RGAS) * splini(XS, YS, Y2, 4, x), 50.0);
    dens = dens * (s.tn2[0] / s.tz) * Math.exp(-expl);
  }
  if (alt > ZN3[0]) return xm === 0 ? s.tz : dens;
  // troposphere / stratosphere
  [zgdif, x] = temperatureSpline(s, alt, ZN3, s.tn3, s.tgn3, 5);
  s.tz = 1.0 / splint(XS, YS, Y2, 5, x);
  if (xm !== 0) {
    const glb = s.gsurf / Math.pow(1.0 + ZN3[0] / s.re, 2.0);
    const expl = Math.min(((xm * glb * zgdif) / RGAS) * splini(XS, YS, Y2, 5, x), 50.0);
    dens = dens * (s.tn3[0] / s.tz) * Math.exp(-expl);
  }
  return xm === 0 ? s.tz : dens;
}

/** Magnetic-activity function of one 3-h ap value (Picone et al. 2002 / Hedin 1987 eq. A24d). */
function apFunction(a: number, p: readonly number[], p24: number): number {
  const k = Math.abs(p24);
  return a - 4.0 + (p[25] - 1.0) * (a - 4.0 + (Math.exp(-k * (a - 4.0)) - 1.0) / k);
}

/** Weighted Ap-history function (eq. A24a, with the normalisation A24c). */
function apHistoryFunction(ex: number, p: readonly number[], p24: number, a: readonly number[]): number {
  const g = (v: number) => apFunction(v, p, p24);
  const sumex = 1.0 + ((1.0 - Math.pow(ex, 19.0)) / (1.0 - ex)) * Math.pow(ex, 0.5);
  return (
    (g(a[1]) +
      (g(a[2]) * ex +
        g(a[3]) * ex * ex +
        g(a[4]) * Math.pow(ex, 3.0) +
        ((g(a[5]) * Math.pow(ex, 4.0) + g(a[6]) * Math.pow(ex, 12.0)) * (1.0 - Math.pow(ex, 8.0))) / (1.0 - ex))) /
    sumex
  );
}

/** G(L) expansion of the upper thermosphere (GLOBE7) for coefficient set p. Sets s.apdf / s.apt0. */
function globe7(s: State, p: readonly number[]): number {
  const { p0, p1, p2, p3, dfa } = s;
  const cd32 = Math.cos(DR * (s.doy - p[31]));
  const cd18 = Math.cos(2.0 * DR * (s.doy - p[17]));
  const cd14 = Math.cos(DR * (s.doy - p[13]));
  const cd39 = Math.cos(2.0 * DR * (s.doy - p[38]));
  const df = s.f107 - s.f107A;
  let sum = p[19] * df * (1.0 + p[59] * dfa) + p[20] * df * df + p[21] * dfa + p[29] * dfa * dfa;
  const f1 = 1.0 + (p[47] * dfa + p[19] * df + p[20] * df * df);
  const f2 = 1.0 + (p[49] * dfa + p[19] * df + p[20] * df * df);
  // time independent
  sum += p[1] * p0[2] + p[2] * p0[4] + p[22] * p0[6] + p[14] * p0[2] * dfa + p[26] * p0[1];
  // symmetrical annual and semiannual, asymmetrical annual and semiannual
  sum += p[18] * cd32;
  sum += (p[15] + p[16] * p0[2]) * cd18;
  sum += f1 * (p[9] * p0[1] + p[10] * p0[3]) * cd14;
  sum += p[37] * p0[1] * cd39;
  // diurnal
  const t71 = p[11] * p1[2] * cd14;
  const t72 = p[12] * p1[2] * cd14;
  sum +=
    f2 *
    ((p[3] * p1[1] + p[4] * p1[3] + p[27] * p1[5] + t71) * s.ctloc +
      (p[6] * p1[1] + p[7] * p1[3] + p[28] * p1[5] + t72) * s.stloc);
  // semidiurnal
  const t81 = (p[23] * p2[3] + p[35] * p2[5]) * cd14;
  const t82 = (p[33] * p2[3] + p[36] * p2[5]) * cd14;
  sum += f2 * ((p[5] * p2[2] + p[41] * p2[4] + t81) * s.c2tloc + (p[8] * p2[2] + p[42] * p2[4] + t82) * s.s2tloc);
  // terdiurnal
  sum +=
    f2 *
    ((p[39] * p3[3] + (p[93] * p3[4] + p[46] * p3[6]) * cd14) * s.s3tloc +
      (p[40] * p3[3] + (p[94] * p3[4] + p[48] * p3[6]) * cd14) * s.c3tloc);
  // magnetic activity
  const history = s.apHistory;
  if (history) {
    if (p[51] !== 0) {
      let exp1 = Math.exp((-10800.0 * Math.abs(p[51])) / (1.0 + p[138] * (45.0 - Math.abs(s.lat))));
      if (exp1 > 0.99999) exp1 = 0.99999;
      const p24 = p[24] < 1.0e-4 ? 1.0e-4 : p[24];
      s.apt0 = apHistoryFunction(exp1, p, p24, history);
      sum +=
        s.apt0 *
        (p[50] +
          p[96] * p0[2] +
          p[54] * p0[4] +
          (p[125] * p0[1] + p[126] * p0[3] + p[127] * p0[5]) * cd14 +
          (p[128] * p1[1] + p[129] * p1[3] + p[130] * p1[5]) * Math.cos(HR * (s.lst - p[131])));
    }
  } else {
    const apd = s.ap - 4.0;
    const p44 = p[43] < 0 ? 1.0e-5 : p[43];
    s.apdf = apd + (p[44] - 1.0) * (apd + (Math.exp(-p44 * apd) - 1.0) / p44);
    sum +=
      s.apdf *
      (p[32] +
        p[45] * p0[2] +
        p[34] * p0[4] +
        (p[100] * p0[1] + p[101] * p0[3] + p[102] * p0[5]) * cd14 +
        (p[121] * p1[1] + p[122] * p1[3] + p[123] * p1[5]) * Math.cos(HR * (s.lst - p[124])));
  }
  // longitudinal
  const cosLon = Math.cos(DGTR * s.lon);
  const sinLon = Math.sin(DGTR * s.lon);
  sum +=
    (1.0 + p[80] * dfa) *
    ((p[64] * p1[2] +
      p[65] * p1[4] +
      p[66] * p1[6] +
      p[103] * p1[1] +
      p[104] * p1[3] +
      p[105] * p1[5] +
      (p[109] * p1[1] + p[110] * p1[3] + p[111] * p1[5]) * cd14) *
      cosLon +
      (p[90] * p1[2] +
        p[91] * p1[4] +
        p[92] * p1[6] +
        p[106] * p1[1] +
        p[107] * p1[3] +
        p[108] * p1[5] +
        (p[112] * p1[1] + p[113] * p1[3] + p[114] * p1[5]) * cd14) *
        sinLon);
  // universal time and mixed UT / longitude
  sum +=
    (1.0 + p[95] * p0[1]) *
      (1.0 + p[81] * dfa) *
      (1.0 + p[119] * p0[1] * cd14) *
      ((p[68] * p0[1] + p[69] * p0[3] + p[70] * p0[5]) * Math.cos(SR * (s.sec - p[71]))) +
    (p[76] * p2[3] + p[77] * p2[5] + p[78] * p2[7]) *
      Math.cos(SR * (s.sec - p[79]) + 2.0 * DGTR * s.lon) *
      (1.0 + p[137] * dfa);
  // UT / longitude magnetic activity
  if (history) {
    if (p[51] !== 0) {
      sum +=
        s.apt0 *
          (1.0 + p[132] * p0[1]) *
          ((p[52] * p1[2] + p[98] * p1[4] + p[67] * p1[6]) * Math.cos(DGTR * (s.lon - p[97]))) +
        s.apt0 * (p[133] * p1[1] + p[134] * p1[3] + p[135] * p1[5]) * cd14 * Math.cos(DGTR * (s.lon - p[136])) +
        s.apt0 * (p[55] * p0[1] + p[56] * p0[3] + p[57] * p0[5]) * Math.cos(SR * (s.sec - p[58]));
    }
  } else {
    sum +=
      s.apdf *
        (1.0 + p[120] * p0[1]) *
        ((p[60] * p1[2] + p[61] * p1[4] + p[62] * p1[6]) * Math.cos(DGTR * (s.lon - p[63]))) +
      s.apdf * (p[115] * p1[1] + p[116] * p1[3] + p[117] * p1[5]) * cd14 * Math.cos(DGTR * (s.lon - p[118])) +
      s.apdf * (p[83] * p0[1] + p[84] * p0[3] + p[85] * p0[5]) * Math.cos(SR * (s.sec - p[75]));
  }
  return p[30] + sum;
}

/** Expansion for the lower atmosphere node temperatures (GLOB7S); uses s.apdf / s.apt0 left by GLOBE7. */
function glob7s(s: State, p: readonly number[]): number {
  const { p0, p1, p2, p3 } = s;
  const cd32 = Math.cos(DR * (s.doy - p[31]));
  const cd18 = Math.cos(2.0 * DR * (s.doy - p[17]));
  const cd14 = Math.cos(DR * (s.doy - p[13]));
  const cd39 = Math.cos(2.0 * DR * (s.doy - p[38]));
  let sum = p[21] * s.dfa;
  sum += p[1] * p0[2] + p[2] * p0[4] + p[22] * p0[6] + p[26] * p0[1] + p[14] * p0[3] + p[59] * p0[5];
  sum += (p[18] + p[47] * p0[2] + p[29] * p0[4]) * cd32;
  sum += (p[15] + p[16] * p0[2] + p[30] * p0[4]) * cd18;
  sum += (p[9] * p0[1] + p[10] * p0[3] + p[20] * p0[5]) * cd14;
  sum += p[37] * p0[1] * cd39;
  const t71 = p[11] * p1[2] * cd14;
  const t72 = p[12] * p1[2] * cd14;
  sum += (p[3] * p1[1] + p[4] * p1[3] + t71) * s.ctloc + (p[6] * p1[1] + p[7] * p1[3] + t72) * s.stloc;
  const t81 = (p[23] * p2[3] + p[35] * p2[5]) * cd14;
  const t82 = (p[33] * p2[3] + p[36] * p2[5]) * cd14;
  sum += (p[5] * p2[2] + p[41] * p2[4] + t81) * s.c2tloc + (p[8] * p2[2] + p[42] * p2[4] + t82) * s.s2tloc;
  sum += p[39] * p3[3] * s.s3tloc + p[40] * p3[3] * s.c3tloc;
  sum += s.apHistory ? p[50] * s.apt0 + p[96] * p0[2] * s.apt0 : s.apdf * (p[32] + p[45] * p0[2]);
  sum +=
    (1.0 +
      p0[1] * (p[80] * Math.cos(DR * (s.doy - p[81])) + p[85] * Math.cos(2.0 * DR * (s.doy - p[86]))) +
      p[83] * Math.cos(DR * (s.doy - p[84])) +
      p[87] * Math.cos(2.0 * DR * (s.doy - p[88]))) *
    ((p[64] * p1[2] + p[65] * p1[4] + p[66] * p1[6] + p[74] * p1[1] + p[75] * p1[3] + p[76] * p1[5]) *
      Math.cos(DGTR * s.lon) +
      (p[90] * p1[2] + p[91] * p1[4] + p[92] * p1[6] + p[77] * p1[1] + p[78] * p1[3] + p[79] * p1[5]) *
        Math.sin(DGTR * s.lon));
  return sum;
}

/** One species above the thermospheric lower boundary: diffusive profile, turbopause mixing below altl. */
interface MixedSpecies {
  /** diffusive density at the lower boundary */
  dbLower: number;
  /** diffusive density at altitude */
  diffusive: number;
  /** mixed density at the turbopause height zh (used for the mixing-ratio corrections) */
  mixedAtTurbopause: number;
  /** net (diffusive/mixed) density at altitude */
  net: number;
}

interface ThermosphereProfile {
  d: number[];
  tinf: number;
  tlb: number;
  s2: number;
}

/** Thermospheric part, altitude ≥ 72.5 km (GTS7). Densities [cm⁻³] in model order: He, O, N2, O2, Ar, ρ, H, N, anomalous O. */
function thermosphere(s: State, z: number): ThermosphereProfile {
  const tinf = z > ZA ? PTM[0] * PT[0] * (1.0 + globe7(s, PT)) : PTM[0] * PT[0];
  const g0 = z > ZN1[4] ? PTM[3] * PS[0] * (1.0 + globe7(s, PS)) : PTM[3] * PS[0];
  const tlb = PTM[1] * (1.0 + globe7(s, PD[3])) * PD[3][0];
  const s2 = g0 / (tinf - tlb);
  // lower-thermosphere node temperatures matter for densities below 300 km only
  const varies = z < 300.0;
  s.tn1[1] = (PTM[6] * PTL[0][0]) / (varies ? 1.0 - glob7s(s, PTL[0]) : 1.0);
  s.tn1[2] = (PTM[2] * PTL[1][0]) / (varies ? 1.0 - glob7s(s, PTL[1]) : 1.0);
  s.tn1[3] = (PTM[7] * PTL[2][0]) / (varies ? 1.0 - glob7s(s, PTL[2]) : 1.0);
  s.tn1[4] = (PTM[4] * PTL[3][0]) / (varies ? 1.0 - glob7s(s, PTL[3]) : 1.0);
  s.tgn1[1] =
    (PTM[8] * PMA[8][0] * (varies ? 1.0 + glob7s(s, PMA[8]) : 1.0) * s.tn1[4] * s.tn1[4]) /
    Math.pow(PTM[4] * PTL[3][0], 2.0);

  const zlb = PTM[5];
  const xmm = PDM[2][4];
  const profile = (db: number, xm: number, alpha: number) => densu(s, z, db, tinf, tlb, xm, alpha, zlb, s2);
  const d = new Array<number>(9).fill(0);

  // N2 (its turbopause sets the mixing scale for every species)
  const g28 = globe7(s, PD[2]);
  const zhf = PDL[1][24] * (1.0 + PDL[0][24] * Math.sin(DGTR * s.lat) * Math.cos(DR * (s.doy - PT[13])));
  const db28 = PDM[2][0] * Math.exp(g28) * PD[2][0];
  d[2] = profile(db28, 28.0, ALPHA[2]);
  const zhm28 = PDM[2][3] * PDL[1][5];
  const b28 = densu(s, PDM[2][2] * zhf, db28, tinf, tlb, 28.0 - xmm, ALPHA[2] - 1.0, zlb, s2);
  if (z <= ALTL[2]) {
    s.dm28 = profile(b28, xmm, ALPHA[2]);
    d[2] = dnet(d[2], s.dm28, zhm28, xmm, 28.0);
  }

  const species = (
    pd: readonly number[],
    pdm: readonly number[],
    xm: number,
    alpha: number,
    mixBelowKm: number,
    inclusive: boolean,
  ): MixedSpecies => {
    const dbLower = pdm[0] * Math.exp(globe7(s, pd)) * pd[0];
    const diffusive = profile(dbLower, xm, alpha);
    const out: MixedSpecies = { dbLower, diffusive, mixedAtTurbopause: 0, net: diffusive };
    if (inclusive ? z <= mixBelowKm : z < mixBelowKm) {
      out.mixedAtTurbopause = densu(s, pdm[2], dbLower, tinf, tlb, xm - xmm, alpha - 1.0, zlb, s2);
      const mixed = densu(s, z, out.mixedAtTurbopause, tinf, tlb, xmm, 0.0, zlb, s2);
      out.net = dnet(diffusive, mixed, zhm28, xmm, xm);
    }
    return out;
  };

  // He
  const he = species(PD[0], PDM[0], 4.0, ALPHA[0], ALTL[0], false);
  d[0] = he.net;
  if (z < ALTL[0])
    d[0] *= ccor(z, Math.log((b28 * PDM[0][1]) / he.mixedAtTurbopause), PDM[0][5] * PDL[1][1], PDM[0][4] * PDL[1][0]);

  // O
  const o = species(PD[1], PDM[1], 16.0, ALPHA[1], ALTL[1], true);
  d[1] = o.net;
  if (z <= ALTL[1]) {
    const rl = PDM[1][1] * PDL[1][16] * (1.0 + PDL[0][23] * (s.f107A - 150.0));
    d[1] *= ccor2(z, rl, PDM[1][5] * PDL[1][3], PDM[1][4] * PDL[1][2], PDM[1][5] * PDL[1][4]);
    d[1] *= ccor(z, PDM[1][3] * PDL[1][14], PDM[1][7] * PDL[1][13], PDM[1][6] * PDL[1][12]);
  }

  // O2
  const o2 = species(PD[4], PDM[3], 32.0, ALPHA[3], ALTL[3], true);
  d[3] = o2.net;
  if (z <= ALTL[3])
    d[3] *= ccor(z, Math.log((b28 * PDM[3][1]) / o2.mixedAtTurbopause), PDM[3][5] * PDL[1][7], PDM[3][4] * PDL[1][6]);
  // departure from diffusive equilibrium above the lower boundary (all altitudes)
  const rc32 = PDM[3][3] * PDL[1][23] * (1.0 + PDL[0][23] * (s.f107A - 150.0));
  d[3] *= ccor2(z, rc32, PDM[3][7] * PDL[1][22], PDM[3][6] * PDL[1][21], PDM[3][7] * PDL[0][22]);

  // Ar
  const ar = species(PD[5], PDM[4], 40.0, ALPHA[4], ALTL[4], true);
  d[4] = ar.net;
  if (z <= ALTL[4])
    d[4] *= ccor(z, Math.log((b28 * PDM[4][1]) / ar.mixedAtTurbopause), PDM[4][5] * PDL[1][9], PDM[4][4] * PDL[1][8]);

  // H
  const h = species(PD[6], PDM[5], 1.0, ALPHA[6], ALTL[6], true);
  d[6] = h.net;
  if (z <= ALTL[6]) {
    d[6] *= ccor(
      z,
      Math.log((b28 * PDM[5][1] * Math.abs(PDL[1][17])) / h.mixedAtTurbopause),
      PDM[5][5] * PDL[1][11],
      PDM[5][4] * PDL[1][10],
    );
    d[6] *= ccor(z, PDM[5][3] * PDL[1][20], PDM[5][7] * PDL[1][19], PDM[5][6] * PDL[1][18]);
  }

  // N
  const n = species(PD[7], PDM[6], 14.0, ALPHA[7], ALTL[7], true);
  d[7] = n.net;
  if (z <= ALTL[7]) {
    d[7] *= ccor(
      z,
      Math.log((b28 * PDM[6][1] * Math.abs(PDL[0][2])) / n.mixedAtTurbopause),
      PDM[6][5] * PDL[0][1],
      PDM[6][4] * PDL[0][0],
    );
    d[7] *= ccor(z, PDM[6][3] * PDL[0][5], PDM[6][7] * PDL[0][4], PDM[6][6] * PDL[0][3]);
  }

  // anomalous (hot) oxygen: isothermal at tho with a scale-height transition at zmho
  const dbHot = PDM[7][0] * Math.exp(globe7(s, PD[8])) * PD[8][0];
  const tho = PDM[7][9] * PDL[0][6];
  const hotDiffusive = densu(s, z, dbHot, tho, tho, 16.0, ALPHA[8], zlb, s2);
  const zsht = PDM[7][5];
  const zmho = PDM[7][4];
  const zsho = scaleHeight(s, zmho, 16.0, tho);
  d[8] = hotDiffusive * Math.exp((-zsht / zsho) * (Math.exp(-(z - zmho) / zsht) - 1.0));

  d[5] = AMU_G * (4.0 * d[0] + 16.0 * d[1] + 28.0 * d[2] + 32.0 * d[3] + 40.0 * d[4] + d[6] + 14.0 * d[7]);
  // temperature at altitude
  densu(s, Math.abs(z), 1.0, tinf, tlb, 0.0, 0.0, zlb, s2);
  return { d, tinf, tlb, s2 };
}

function newState(input: Nrlmsise00Input): State {
  const lat = input.latitudeDeg;
  // Latitude variation of gravity and effective radius (GLATF)
  const c2 = Math.cos(2.0 * DGTR * lat);
  const gsurf = 980.616 * (1.0 - 0.0026373 * c2);
  const re = ((2.0 * gsurf) / (3.085462e-6 + 2.27e-9 * c2)) * 1.0e-5;
  // associated Legendre functions of sin(latitude)
  const c = Math.sin(lat * DGTR);
  const sn = Math.cos(lat * DGTR);
  const cc = c * c;
  const c4 = cc * cc;
  const ss = sn * sn;
  const p0 = new Float64Array(9);
  const p1 = new Float64Array(9);
  const p2 = new Float64Array(9);
  const p3 = new Float64Array(9);
  p0[1] = c;
  p0[2] = 0.5 * (3.0 * cc - 1.0);
  p0[3] = 0.5 * (5.0 * c * cc - 3.0 * c);
  p0[4] = (35.0 * c4 - 30.0 * cc + 3.0) / 8.0;
  p0[5] = (63.0 * cc * cc * c - 70.0 * cc * c + 15.0 * c) / 8.0;
  p0[6] = (11.0 * c * p0[5] - 5.0 * p0[4]) / 6.0;
  p1[1] = sn;
  p1[2] = 3.0 * c * sn;
  p1[3] = 1.5 * (5.0 * cc - 1.0) * sn;
  p1[4] = 2.5 * (7.0 * cc * c - 3.0 * c) * sn;
  p1[5] = 1.875 * (21.0 * c4 - 14.0 * cc + 1.0) * sn;
  p1[6] = (11.0 * c * p1[5] - 6.0 * p1[4]) / 5.0;
  p2[2] = 3.0 * ss;
  p2[3] = 15.0 * ss * c;
  p2[4] = 7.5 * (7.0 * cc - 1.0) * ss;
  p2[5] = 3.0 * c * p2[4] - 2.0 * p2[3];
  p2[6] = (11.0 * c * p2[5] - 7.0 * p2[4]) / 4.0;
  p2[7] = (13.0 * c * p2[6] - 8.0 * p2[5]) / 5.0;
  p3[3] = 15.0 * ss * sn;
  p3[4] = 105.0 * ss * sn * c;
  p3[5] = (9.0 * c * p3[4] - 7.0 * p3[3]) / 2.0;
  p3[6] = (11.0 * c * p3[5] - 8.0 * p3[4]) / 3.0;
  const tloc = input.localSolarTimeHours;
  return {
    doy: input.dayOfYear,
    sec: input.utSeconds,
    lat,
    lon: input.longitudeDeg,
    lst: tloc,
    f107: input.f107,
    f107A: input.f107Average,
    ap: input.ap,
    apHistory: input.apHistory,
    gsurf,
    re,
    dfa: input.f107Average - 150.0,
    p0,
    p1,
    p2,
    p3,
    ctloc: Math.cos(HR * tloc),
    stloc: Math.sin(HR * tloc),
    c2tloc: Math.cos(2.0 * HR * tloc),
    s2tloc: Math.sin(2.0 * HR * tloc),
    c3tloc: Math.cos(3.0 * HR * tloc),
    s3tloc: Math.sin(3.0 * HR * tloc),
    apdf: 0,
    apt0: 0,
    tn1: [0, 0, 0, 0, 0],
    tgn1: [0, 0],
    tn2: [0, 0, 0, 0],
    tgn2: [0, 0],
    tn3: [0, 0, 0, 0, 0],
    tgn3: [0, 0],
    tz: 0,
    dm28: 0,
  };
}

/**
 * Evaluate NRLMSISE-00 (GTD7 with the GTD7D effective mass density) at one point.
 * Valid input ranges: altitude 0–1000 km (the model extrapolates above), F10.7 roughly 60–300 sfu,
 * Ap 0–400. The caller validates inputs; non-finite input gives non-finite output.
 */
export function evaluateNrlmsise00(input: Nrlmsise00Input): Nrlmsise00Output {
  if (input.apHistory && input.apHistory.length !== 7) throw new RangeError('apHistory must hold 7 values');
  const s = newState(input);
  const alt = input.altitudeKm;
  const top = thermosphere(s, Math.max(alt, ZN2[0]));
  const exosphericTemperatureK = top.tinf;
  let d = top.d;
  let temperatureK = s.tz;
  if (alt < ZN2[0]) {
    // lower mesosphere / upper stratosphere node temperatures (inverse temperature linear in the expansion)
    s.tgn2[0] = s.tgn1[1];
    s.tn2[0] = s.tn1[4];
    s.tn2[1] = (PMA[0][0] * PAVGM[0]) / (1.0 - glob7s(s, PMA[0]));
    s.tn2[2] = (PMA[1][0] * PAVGM[1]) / (1.0 - glob7s(s, PMA[1]));
    s.tn2[3] = (PMA[2][0] * PAVGM[2]) / (1.0 - glob7s(s, PMA[2]));
    s.tgn2[1] =
      (PAVGM[8] * PMA[9][0] * (1.0 + glob7s(s, PMA[9])) * s.tn2[3] * s.tn2[3]) / Math.pow(PMA[2][0] * PAVGM[2], 2.0);
    s.tn3[0] = s.tn2[3];
    if (alt <= ZN3[0]) {
      // lower stratosphere and troposphere
      s.tgn3[0] = s.tgn2[1];
      for (let k = 1; k <= 4; k++) s.tn3[k] = (PMA[k + 2][0] * PAVGM[k + 2]) / (1.0 - glob7s(s, PMA[k + 2]));
      s.tgn3[1] =
        (PMA[7][0] * PAVGM[7] * (1.0 + glob7s(s, PMA[7])) * s.tn3[4] * s.tn3[4]) / Math.pow(PMA[6][0] * PAVGM[6], 2.0);
    }
    // linear transition to full mixing below 72.5 km
    const dmc = alt > ZMIX ? 1.0 - (ZN2[0] - alt) / (ZN2[0] - ZMIX) : 0;
    const upper = top.d;
    const dz28 = upper[2];
    const lower = new Array<number>(9).fill(0);
    lower[2] = densm(s, alt, s.dm28, PDM[2][4]) * (1.0 + (upper[2] / s.dm28 - 1.0) * dmc);
    const ratio = (k: number, row: number) =>
      lower[2] * PDM[row][1] * (1.0 + (upper[k] / (dz28 * PDM[row][1]) - 1.0) * dmc);
    lower[0] = ratio(0, 0);
    lower[3] = ratio(3, 3);
    lower[4] = ratio(4, 4);
    lower[5] = AMU_G * (4.0 * lower[0] + 28.0 * lower[2] + 32.0 * lower[3] + 40.0 * lower[4]);
    temperatureK = densm(s, alt, 1.0, 0);
    d = lower;
  }
  return {
    he: d[0],
    o: d[1],
    n2: d[2],
    o2: d[3],
    ar: d[4],
    h: d[6],
    n: d[7],
    anomalousO: d[8],
    massDensityGCm3: d[5],
    effectiveMassDensityGCm3:
      AMU_G * (4.0 * d[0] + 16.0 * d[1] + 28.0 * d[2] + 32.0 * d[3] + 40.0 * d[4] + d[6] + 14.0 * d[7] + 16.0 * d[8]),
    exosphericTemperatureK,
    temperatureK,
  };
}
