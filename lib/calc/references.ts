/**
 * Citations used in model notes. Section, equation and table numbers marked
 * "(number from memory)" were not checked against a copy of the book.
 */
export const REF = {
  wgs84: 'NIMA TR8350.2, Department of Defense World Geodetic System 1984, 3rd ed. (2000), Table 3.1',
  egm96: 'Lemoine et al., The Development of the Joint NASA GSFC and NIMA Geopotential Model EGM96, NASA/TP-1998-206861 (1998)',
  kozai1959: 'Y. Kozai, The motion of a close earth satellite, Astronomical Journal 64 (1959) 367–377',
  brouwer1959: 'D. Brouwer, Solution of the problem of artificial satellite theory without drag, Astronomical Journal 64 (1959) 378–397',
  lyddane1963: 'R. H. Lyddane, Small eccentricities or inclinations in the Brouwer theory of the artificial satellite, Astronomical Journal 68 (1963) 555–558',
  valladoGauss: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013): Gauss\'s form of the variation-of-parameters equations',
  valladoCoe: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013): conversions between classical orbital elements and position and velocity (COE2RV, RV2COE)',
  valladoSecular: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), §9.6 secular J2 rates (number from memory)',
  valladoDesign: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), §11.4 sun-synchronous, repeat ground-track and frozen orbits (number from memory)',
  valladoGmst: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), eq. 3-47 (IAU 1982 GMST) and Example 3-5',
  valladoSun: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Algorithm 29 (SUN, Astronomical Almanac low-precision formulae)',
  valladoAtmosphere: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Table 8-4 exponential atmosphere',
  valladoPlaneChange: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), §6.4 inclination-only change Δv = 2 v sin(Δi/2) (number from memory)',
  valladoGeodetic: 'D. A. Vallado, Fundamentals of Astrodynamics and Applications, 4th ed. (2013), Algorithm 12 (geodetic latitude from position; number from memory)',
  meeus: 'J. Meeus, Astronomical Algorithms, 2nd ed. (1998), ch. 25 (Sun position) and ch. 28 (equation of time)',
  smad: 'J. R. Wertz and W. J. Larson (eds.), Space Mission Analysis and Design, 3rd ed. (1999), ch. 6 (orbit selection) and ch. 8 (atmospheric drag; number from memory)',
  newSmad: 'J. R. Wertz, D. F. Everett, J. J. Puschell (eds.), Space Mission Engineering: The New SMAD (2011), ch. 9 orbit and constellation design (number from memory)',
  rickman: 'S. L. Rickman, Introduction to Orbital Mechanics and Spacecraft Attitudes for Thermal Engineers, NASA TFAWS short course (2014): β-angle eclipse fraction (from memory)',
  kingHele: 'D. King-Hele, Satellite Orbits in an Atmosphere: Theory and Applications, Blackie (1987): circular-orbit decay rate da/dt = −ρ B √(μ a)',
  msise90: 'A. E. Hedin, Extension of the MSIS thermosphere model into the middle and lower atmosphere, J. Geophys. Res. 96 (1991) 1159–1172 (MSISE-90); low/high solar-activity density tables as tabulated by R. A. Braeunig, "Atmospheric Models", braeunig.us/space/atmos.htm',
  cook1966: 'G. E. Cook, Perturbations of near-circular orbits by the Earth\'s gravitational potential, Planetary and Space Science 14 (1966) 433–444',
  chobotov: 'V. A. Chobotov (ed.), Orbital Mechanics, 3rd ed. (2002), ch. 11 frozen orbits: e_f ≈ −J3 R sin i / (2 J2 a), ω = 90° (number from memory)',
  dormandPrince1980: 'J. R. Dormand and P. J. Prince, A family of embedded Runge-Kutta formulae, J. Comput. Appl. Math. 6 (1980) 19–26',
  hairer: 'E. Hairer, S. P. Nørsett, G. Wanner, Solving Ordinary Differential Equations I, 2nd ed. (1993), §II.4–II.5 (step control, DOP853 coefficients)',
  montenbruck: 'O. Montenbruck and E. Gill, Satellite Orbits: Models, Methods and Applications (2000), §3.2 zonal-harmonic acceleration',
  montenbruckShadow: 'O. Montenbruck and E. Gill, Satellite Orbits: Models, Methods and Applications (2000): conical Earth shadow (umbra and penumbra) in the solar radiation pressure model',
  iauSunRadius: 'IAU 2015 Resolution B3, nominal solar radius 695 700 km (Mamajek et al., arXiv:1510.07674)',
  mathjsSecurity: 'mathjs documentation, "Security" (restricting import, createUnit, evaluate, parse in expressions)',
} as const;
