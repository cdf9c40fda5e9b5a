/**
 * Invented TLEs of the invented satellite TERNLIGHT-1 after its invented launch
 * on 2027-09-14 (international designator 27097A, catalogue number T0001 in
 * the alpha-5 form, beyond any number assigned today). Built for the demo with
 * SGP4 (satellite.js) so that they hang together: each set's mean motion gives
 * SGP4's Brouwer mean semi-major axis the scenario asks for (injected 4.2 km
 * below the design's 7070.97 km and 0.028° above its sun-synchronous 98.177°,
 * raised to the design altitude within three weeks, then held within a few
 * hundred metres); the RAAN advances between sets at SGP4's own secular node
 * rate, so the local time of the node drifts from 22:31 as the inclination
 * offset makes it; every line has its correct checksum. Nothing here describes
 * a real object.
 */
export const TERNLIGHT_TLES = `TERNLIGHT-1
1 T0001U 27097A   27258.23770833  .00000150  00000-0  21000-3 0  9906
2 T0001  98.2047 331.7678 0014800  89.2000 212.4000 14.60503420    93
TERNLIGHT-1
1 T0001U 27097A   27264.71100694  .00000150  00000-0  21000-3 0  9919
2 T0001  98.2047 338.1778 0012100  90.0000  47.9000 14.59701530  1032
TERNLIGHT-1
1 T0001U 27097A   27275.39421296  .00000150  00000-0  21000-3 0  9920
2 T0001  98.2047 348.7429 0011200  90.8000 301.2000 14.59181777  2593
TERNLIGHT-1
1 T0001U 27097A   27298.92715278  .00000150  00000-0  21000-3 0  9931
2 T0001  98.2047  11.9963 0010900  89.2000 133.6000 14.59256009  6023
TERNLIGHT-1
1 T0001U 27097A   27322.49343750  .00000150  00000-0  21000-3 0  9944
2 T0001  98.2047  35.2855 0011100  90.0000 260.8000 14.59187964  9462
TERNLIGHT-1
1 T0001U 27097A   27350.15152778  .00000150  00000-0  21000-3 0  9957
2 T0001  98.2047  62.6154 0011300  90.8000  18.3000 14.59265289 13499
TERNLIGHT-1
1 T0001U 27097A   28019.59012731  .00000150  00000-0  21000-3 0  9963
2 T0001  98.2047  96.6495 0011000  89.2000 176.5000 14.59194149 18514
TERNLIGHT-1
1 T0001U 27097A   28055.27181713  .00000150  00000-0  21000-3 0  9976
2 T0001  98.2047 131.9081 0011200  90.0000  92.7000 14.59249823 23717`;

/** The latest of the sets above alone (two lines with the name). */
export const TERNLIGHT_LATEST_TLE = TERNLIGHT_TLES.split('\n').slice(-3).join('\n');
