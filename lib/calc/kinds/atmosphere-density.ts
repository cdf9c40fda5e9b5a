import { numberField } from '../fields';
import { defineKind } from '../registry';
import { computeAtmosphereState } from '../topics/atmosphere/density-at-epoch';
import { ATMOSPHERE_REF } from '../topics/atmosphere/sources';
import { epoch, numOut } from './common';
import { epochDate } from './node-local-time';

/** Space-weather input fields shared by the atmosphere kinds (sfu is no mathjs unit, so it is named in the label). */
export const spaceWeatherFields = () => ({
  f107: numberField('F10.7 solar flux, daily, previous day (sfu)', null, {
    min: 50,
    max: 400,
    default: 150,
    help: '10.7 cm solar radio flux of the day before, in solar flux units (1e-22 W m⁻² Hz⁻¹)',
  }),
  f107Average: numberField('F10.7 solar flux, 81-day centred mean (sfu)', null, { min: 50, max: 400, default: 150 }),
  ap: numberField('Geomagnetic index Ap, daily', null, { min: 0, max: 400, default: 15 }),
});

/** Plain-sentence warnings for unusual space weather. */
export function spaceWeatherWarnings(v: { f107: number; f107Average: number; ap: number }): string[] {
  const w: string[] = [];
  if (v.f107 < 60 || v.f107 > 300 || v.f107Average < 60 || v.f107Average > 300) {
    w.push('F10.7 outside 60–300 sfu is unusual for solar-cycle conditions: the model is extrapolating.');
  }
  if (v.ap > 100)
    w.push(
      `Ap ${v.ap} is a major geomagnetic storm level: densities then change within hours and a daily value describes them poorly.`,
    );
  return w;
}

export const atmosphereDensityKind = defineKind({
  kind: 'atmosphere-density',
  title: 'Atmospheric density (NRLMSISE-00)',
  summary:
    'Total mass density and temperatures of the neutral atmosphere at an epoch, altitude and place for given solar flux and geomagnetic activity.',
  inputs: {
    epoch: epoch(),
    altitudeKm: numberField('Geodetic altitude', 'km', { min: 0, max: 1000, default: 400 }),
    latitudeDeg: numberField('Geodetic latitude', 'deg', { min: -90, max: 90, default: 0 }),
    longitudeDeg: numberField('Longitude (east positive)', 'deg', { min: -180, max: 360, default: 0 }),
    ...spaceWeatherFields(),
  },
  outputs: [
    numOut('densityKgM3', 'Total mass density (incl. anomalous oxygen)', 'kg/m^3', 15),
    numOut('exosphericTemperatureK', 'Exospheric temperature', 'K', 1),
    numOut('temperatureK', 'Temperature at altitude', 'K', 1),
    numOut('localSolarTimeHours', 'Local solar time used', 'h', 3),
  ],
  model: {
    method:
      'NRLMSISE-00 empirical atmosphere (Picone et al. 2002) with its published coefficients, standard switches and daily Ap; total mass density as the model’s effective density for drag (GTD7D, anomalous oxygen included). Local solar time = UT + longitude/15, as the model prescribes.',
    assumptions: [
      'F10.7 is the observed daily flux of the previous day and its 81-day centred mean; Ap is the daily index. Forecast values carry their own, often larger, uncertainty.',
      'The model gives climatological mean conditions for the space weather given: the actual density departs from it, most of all during geomagnetic storms.',
      'Altitude and latitude are geodetic; 0–1000 km.',
      'Checked against all 17 cases of the model release’s published test-driver output to the printed seven digits.',
    ],
    references: [ATMOSPHERE_REF.picone2002, ATMOSPHERE_REF.nrlmsiseRelease],
  },
  compute(v) {
    const date = epochDate(v.epoch);
    const s = computeAtmosphereState(date, v.altitudeKm, v.latitudeDeg, v.longitudeDeg, {
      f107: v.f107,
      f107Average: v.f107Average,
      ap: v.ap,
    });
    const warnings = spaceWeatherWarnings(v);
    return {
      outputs: {
        densityKgM3: s.densityKgM3,
        exosphericTemperatureK: s.exosphericTemperatureK,
        temperatureK: s.temperatureK,
        localSolarTimeHours: s.localSolarTimeHours,
      },
      warnings,
    };
  },
});
