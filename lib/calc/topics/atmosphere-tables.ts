/**
 * Atmosphere density tables (data only).
 *
 * MEAN_EXPONENTIAL: Vallado, Fundamentals of Astrodynamics and Applications 4th ed. (2013),
 *   Table 8-4 "Exponential atmospheric model" (base altitude h0 km, nominal density ρ0 kg/m³,
 *   scale height H km; ρ = ρ0 exp(−(h − h0)/H) for h0 ≤ h < next h0). Values as printed in the
 *   book (checked against a public transcription of the table).
 *
 * MSISE-90 low / high solar activity: densities at 20 km steps from the MSISE-90 model
 *   (Hedin 1991, J. Geophys. Res. 96, 1159) as tabulated for low and high solar activity by
 *   R. A. Braeunig, "Atmospheric Models" (braeunig.us/space/atmos.htm); transcribed from a public
 *   reproduction of that table, 100–900 km. Between nodes the density is interpolated
 *   exponentially (log-linear).
 */

/** [h0 km, ρ0 kg/m³, H km] rows of Vallado 4th ed. Table 8-4. */
export const MEAN_EXPONENTIAL: readonly (readonly [number, number, number])[] = [
  [0, 1.225, 7.249],
  [25, 3.899e-2, 6.349],
  [30, 1.774e-2, 6.682],
  [40, 3.972e-3, 7.554],
  [50, 1.057e-3, 8.382],
  [60, 3.206e-4, 7.714],
  [70, 8.77e-5, 6.549],
  [80, 1.905e-5, 5.799],
  [90, 3.396e-6, 5.382],
  [100, 5.297e-7, 5.877],
  [110, 9.661e-8, 7.263],
  [120, 2.438e-8, 9.473],
  [130, 8.484e-9, 12.636],
  [140, 3.845e-9, 16.149],
  [150, 2.07e-9, 22.523],
  [180, 5.464e-10, 29.74],
  [200, 2.789e-10, 37.105],
  [250, 7.248e-11, 45.546],
  [300, 2.418e-11, 53.628],
  [350, 9.518e-12, 53.298],
  [400, 3.725e-12, 58.515],
  [450, 1.585e-12, 60.828],
  [500, 6.967e-13, 63.822],
  [600, 1.454e-13, 71.835],
  [700, 3.614e-14, 88.667],
  [800, 1.17e-14, 124.64],
  [900, 5.245e-15, 181.05],
  [1000, 3.019e-15, 268.0],
];

/** MSISE-90 density [kg/m³] at 100, 120, …, 900 km, low solar activity (Braeunig table). */
export const MSISE90_LOW: readonly number[] = [
  5.77e-7, 1.7e-8, 2.96e-9, 9.65e-10, 3.9e-10, 1.75e-10, 8.47e-11, 4.31e-11, 2.3e-11, 1.27e-11, 7.24e-12, 4.21e-12,
  2.5e-12, 1.51e-12, 9.2e-13, 5.68e-13, 3.54e-13, 2.23e-13, 1.42e-13, 9.2e-14, 6.03e-14, 4.03e-14, 2.75e-14, 1.93e-14,
  1.39e-14, 1.03e-14, 7.96e-15, 6.24e-15, 5.06e-15, 4.21e-15, 3.58e-15, 3.09e-15, 2.7e-15, 2.39e-15, 2.13e-15, 1.91e-15,
  1.73e-15, 1.56e-15, 1.42e-15, 1.3e-15, 1.18e-15,
];

/** MSISE-90 density [kg/m³] at 100, 120, …, 900 km, high solar activity (Braeunig table). */
export const MSISE90_HIGH: readonly number[] = [
  2.78e-7, 1.24e-8, 3.34e-9, 2.23e-9, 1.28e-9, 8.28e-10, 5.69e-10, 4.08e-10, 3.0e-10, 2.25e-10, 1.71e-10, 1.32e-10,
  1.03e-10, 8.05e-11, 6.35e-11, 5.04e-11, 4.02e-11, 3.23e-11, 2.6e-11, 2.1e-11, 1.7e-11, 1.38e-11, 1.13e-11, 9.21e-12,
  7.55e-12, 6.2e-12, 5.1e-12, 4.21e-12, 3.47e-12, 2.88e-12, 2.38e-12, 1.98e-12, 1.65e-12, 1.37e-12, 1.15e-12, 9.59e-13,
  8.05e-13, 6.74e-13, 5.67e-13, 4.77e-13, 4.03e-13,
];

export const MSISE90_FIRST_KM = 100;
export const MSISE90_STEP_KM = 20;
