/** Brute-force shadow test shared by the eclipse checks (independent of the engine's cone geometry). */
const R = 6378.137;
const MU = 398600.4418;
const AU = 149597870.7;
const R_SUN = 695700; // IAU 2015 Resolution B3 nominal solar radius
const DEG = Math.PI / 180;

/**
 * Brute force over one orbit: N equally spaced points of a circular orbit of radius a at beta angle β, the Sun
 * sunDistanceKm away (default 1 au); at each point compare the apparent discs of the Sun (radius asin(R☉/|s − r|)) and the Earth
 * (asin(R/|r|)) and their angular separation: umbra when the Sun's disc lies inside the Earth's, penumbra
 * when they overlap. Times are fractions × periodMin (default: the Keplerian period of a). Independent of the cone geometry the engine solves.
 */
export function bruteForceShadow(
  altitudeKm: number,
  betaDeg: number,
  sunDistanceKm = AU,
  n = 200000,
  periodMin?: number,
) {
  const a = R + altitudeKm;
  const b = betaDeg * DEG;
  const sun = [sunDistanceKm * Math.cos(b), 0, sunDistanceKm * Math.sin(b)]; // orbit plane = x–y plane
  let umbra = 0;
  let partial = 0;
  let cylinder = 0;
  for (let k = 0; k < n; k++) {
    const u = (2 * Math.PI * (k + 0.5)) / n;
    const r = [a * Math.cos(u), a * Math.sin(u), 0];
    const toSun = [sun[0] - r[0], sun[1] - r[1], sun[2] - r[2]];
    const dSun = Math.hypot(toSun[0], toSun[1], toSun[2]);
    const sunDisc = Math.asin(R_SUN / dSun);
    const earthDisc = Math.asin(R / a);
    const cosSep = -(toSun[0] * r[0] + toSun[1] * r[1] + toSun[2] * r[2]) / (dSun * a);
    const sep = Math.acos(Math.max(-1, Math.min(1, cosSep)));
    if (sep <= earthDisc - sunDisc) umbra++;
    else if (sep < earthDisc + sunDisc) partial++;
    // cylinder: behind the Earth and within R of the Sun line
    const along = (r[0] * sun[0] + r[2] * sun[2]) / sunDistanceKm;
    if (along < 0 && a * a - along * along < R * R) cylinder++;
  }
  const period = periodMin ?? (2 * Math.PI * Math.sqrt(a ** 3 / MU)) / 60;
  return { umbra: (umbra / n) * period, penumbra: ((umbra + partial) / n) * period, cylinder: (cylinder / n) * period };
}
