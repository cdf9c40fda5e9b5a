/**
 * Citations used in model notes: they reach the customer (model notes, the PDF appendix), so each names a source a
 * reader can check. Chapter and section titles of the books below were checked against published tables of contents
 * (library catalogue records); where a section number could not be checked, the citation names the chapter by its
 * title, and textbook citations that could not be checked at all were dropped in favour of the papers.
 * The values of Vallado 4th ed. Table 8-4 were compared with two independent public transcriptions of the table.
 * Not checked against a copy of the book (from memory): the numbers of Vallado 4th ed. eq. 3-47 and Algorithm 29.
 */
export const REF = {
  wgs84: 'NIMA TR8350.2, Department of Defense World Geodetic System 1984, 3rd ed. (2000), Table 3.1',
  egm96:
    'Lemoine et al., The Development of the Joint NASA GSFC and NIMA Geopotential Model EGM96, NASA/TP-1998-206861 (1998)',
  kozai1959: 'Y. Kozai, The motion of a close earth satellite, Astronomical Journal 64 (1959) 367–377',
  brouwer1959:
    'D. Brouwer, Solution of the problem of artificial satellite theory without drag, Astronomical Journal 64 (1959) 378–397',
  lyddane1963:
    'R. H. Lyddane, Small eccentricities or inclinations in the Brouwer theory of the artificial satellite, Astronomical Journal 68 (1963) 555–558',
  valladoGauss:
    "D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013): Gauss's form of the variation-of-parameters equations",
  valladoCoe:
    'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013): conversions between classical orbital elements and position and velocity (COE2RV, RV2COE)',
  wertzOrbitDesign:
    'J. R. Wertz, Mission Geometry; Orbit and Constellation Design and Management, Microcosm Press and Kluwer (2001), chapter "Orbit Selection and Design" (sun-synchronous and repeat ground-track orbits)',
  wertzCoverage:
    'J. R. Wertz, Mission Geometry; Orbit and Constellation Design and Management, Microcosm Press and Kluwer (2001), chapters "Earth Coverage" and "Viewing and Lighting Conditions"',
  valladoGmst:
    'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), eq. 3-47 (IAU 1982 GMST) and Example 3-5',
  valladoSun:
    'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Algorithm 29 (SUN, Astronomical Almanac low-precision formulae)',
  valladoAtmosphere:
    'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Table 8-4 exponential atmosphere',
  batePlaneChange:
    'R. R. Bate, D. D. Mueller and J. E. White, Fundamentals of Astrodynamics, Dover (1971), §3.4 Out-of-plane orbit changes (simple plane change Δv = 2 v sin(Δi/2))',
  chobotovGeodetic:
    'V. A. Chobotov (ed.), Orbital Mechanics, 3rd ed., AIAA Education Series (2002), §4.14 Geodetic and geocentric altitudes',
  meeus: 'J. Meeus, Astronomical Algorithms, 2nd ed. (1998), ch. 25 (Sun position) and ch. 28 (equation of time)',
  kingHele:
    'D. King-Hele, Satellite Orbits in an Atmosphere: Theory and Applications, Blackie (1987): circular-orbit decay rate da/dt = −ρ B √(μ a)',
  // The low/high tables were transcribed from a secondary tabulation of MSISE-90 (see topics/atmosphere-tables.ts);
  // the customer is pointed at the model itself, against which the values can be checked.
  msise90:
    'A. E. Hedin, Extension of the MSIS thermosphere model into the middle and lower atmosphere, J. Geophys. Res. 96 (1991) 1159–1172 (MSISE-90): total mass density at low and high solar activity, tabulated every 20 km from 100 to 900 km and interpolated log-linearly',
  cook1966:
    "G. E. Cook, Perturbations of near-circular orbits by the Earth's gravitational potential, Planetary and Space Science 14 (1966) 433–444",
  dormandPrince1980:
    'J. R. Dormand and P. J. Prince, A family of embedded Runge-Kutta formulae, J. Comput. Appl. Math. 6 (1980) 19–26',
  hairer:
    'E. Hairer, S. P. Nørsett, G. Wanner, Solving Ordinary Differential Equations I, 2nd ed. (1993), §II.4–II.5 (step control, DOP853 coefficients)',
  montenbruck:
    'O. Montenbruck and E. Gill, Satellite Orbits: Models, Methods and Applications (2000), §3.2 zonal-harmonic acceleration',
  montenbruckShadow:
    'O. Montenbruck and E. Gill, Satellite Orbits: Models, Methods and Applications (2000): conical Earth shadow (umbra and penumbra) in the solar radiation pressure model',
  iauSunRadius: 'IAU 2015 Resolution B3, nominal solar radius 695 700 km (Mamajek et al., arXiv:1510.07674)',
  solorzanoPrado2007:
    "C. R. H. Solórzano and A. F. B. A. Prado, Third-body perturbation using a single averaged model: application in nonsingular variables, Mathematical Problems in Engineering 2007, Article ID 40475, doi:10.1155/2007/40475 (orbit-averaged third-body disturbing function in Lagrange's planetary equations)",
  montenbruckThirdBody:
    'O. Montenbruck and E. Gill, Satellite Orbits: Models, Methods and Applications (2000): point-mass acceleration of the Sun and the Moon (direct and indirect terms)',
  iau2009Constants:
    'B. Luzum et al., The IAU 2009 system of astronomical constants, Celestial Mechanics and Dynamical Astronomy 110 (2011) 293–304 (GM☉ = 1.32712440041e20 m³/s², TDB-compatible)',
  valladoFk5:
    'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Example 3-15 and Table 3-6 (IAU-76/FK5 reduction: precession, nutation, TEME)',
  lieske1977:
    'J. H. Lieske, T. Lederle, W. Fricke, B. Morando, Expressions for the precession quantities based upon the IAU (1976) system of astronomical constants, Astronomy and Astrophysics 58 (1977) 1–16',
  seidelmannNutation:
    'P. K. Seidelmann (ed.), Explanatory Supplement to the Astronomical Almanac (1992), §3.222: the 1980 IAU theory of nutation (P. K. Seidelmann, Celestial Mechanics 27 (1982) 79–106)',
  valladoTeme:
    'D. A. Vallado, P. Crawford, R. Hujsak, T. S. Kelso, Revisiting Spacetrack Report #3, AIAA 2006-6753 (2006): TEME and the SGP4 verification cases',
  celestrakTle:
    'T. S. Kelso, CelesTrak, "NORAD Two-Line Element Set Format" (celestrak.com/NORAD/documentation/tle-fmt.php): columns and the modulo-10 checksum',
  hootsRoehrich1980:
    'F. R. Hoots and R. L. Roehrich, Models for Propagation of NORAD Element Sets, Spacetrack Report No. 3 (1980)',
  mathjsSecurity: 'mathjs documentation, "Security" (restricting import, createUnit, evaluate, parse in expressions)',
  smadGeometry:
    'J. R. Wertz and W. J. Larson (eds.), Space Mission Analysis and Design, 3rd ed. (1999), ch. 5 Space Mission Geometry: Earth central angle and pass duration for a minimum elevation',
  ccsdsOdm:
    'CCSDS 502.0-B-3, Orbit Data Messages, Recommended Standard (Blue Book), Issue 3, April 2023 (OPM and OEM; issue 2, November 2009, reads the same for the keywords used here)',
} as const;
