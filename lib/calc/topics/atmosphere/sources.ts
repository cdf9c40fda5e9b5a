/**
 * Citations for the atmosphere and solar-activity model notes (kept beside the models so that the
 * shared references.ts stays untouched by this topic). Each was checked against a public listing.
 */
export const ATMOSPHERE_REF = {
  picone2002:
    'J. M. Picone, A. E. Hedin, D. P. Drob and A. C. Aikin, NRLMSISE-00 empirical model of the atmosphere: Statistical comparisons and scientific issues, J. Geophys. Res. 107(A12) (2002) 1468, doi:10.1029/2002JA009430',
  nrlmsiseRelease:
    'NRLMSISE-00 model release: FORTRAN package of the U.S. Naval Research Laboratory and its public-domain C version by D. Brodowski (release 20041227): coefficient block GTD7BK and test-driver output',
} as const;
