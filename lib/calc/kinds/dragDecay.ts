import { enumField, numberField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { REENTRY_ALTITUDE_KM, summariseDrag, TABLE_TOP_KM } from '../topics/dragLifetime';
import { numOut } from './common';

export const dragDecayKind = defineKind({
  kind: 'drag-decay',
  title: 'Drag decay and lifetime',
  summary: 'Atmospheric density, decay rate, lifetime down to 200 km and the yearly ΔV to hold altitude, for a circular orbit.',
  inputs: {
    altitudeKm: numberField('Mean altitude above the equatorial radius', 'km', { min: 150, max: 1000, default: 500 }),
    massKg: numberField('Mass', 'kg', { min: 0.1, max: 1e6, default: 100 }),
    areaM2: numberField('Mean drag area', 'm^2', { min: 0.001, max: 1e4, default: 1 }),
    dragCoefficient: numberField('Drag coefficient', null, { min: 1, max: 4, default: 2.2 }),
    solarActivity: enumField('Solar activity', ['low', 'moderate', 'high'] as const, 'moderate', 'moderate: Vallado Table 8-4 mean exponential model; low/high: MSISE-90 tables (≤ 900 km)'),
  },
  check(v): Record<string, string> {
    const top = TABLE_TOP_KM[v.solarActivity];
    return v.altitudeKm <= top ? {} : { altitudeKm: `altitudeKm: the ${v.solarActivity} solar-activity density table ends at ${top} km` };
  },
  outputs: [
    numOut('densityKgM3', 'Atmospheric density', 'kg/m^3', 15),
    numOut('ballisticCoefficientKgM2', 'Ballistic coefficient m/(C_D A)', 'kg/m^2', 1),
    numOut('decayKmPerDay', 'Decay rate', 'km/d', 5),
    numOut('lifetimeDays', 'Lifetime to 200 km (order of magnitude)', 'd', 0),
    numOut('lifetimeYears', 'Lifetime to 200 km (order of magnitude)', 'yr', 2),
    numOut('maintenanceDeltaVMpsPerYear', 'ΔV per year to hold altitude', 'm/s', 3),
    numOut('dragAccelerationMps2', 'Drag acceleration', 'm/s^2', 12),
  ],
  model: {
    method: 'Circular decay rate da/dt = −ρ (C_D A/m) √(μ a) (King-Hele) integrated by Gauss–Legendre quadrature down to 200 km; ΔV/yr = ½ ρ v² (C_D A/m) × 1 yr.',
    assumptions: [
      'Lifetimes are order-of-magnitude: real density varies by a factor of 10 or more with the solar cycle, geomagnetic storms and local time.',
      'moderate: Vallado 4th ed. Table 8-4 exponential atmosphere (a static mean model). low / high: MSISE-90 densities for low and high solar activity (Hedin 1991) as tabulated by Braeunig, interpolated exponentially between 20 km nodes; the activity level is held constant over the whole lifetime.',
      'Circular orbit, constant drag area (no attitude or tumbling model), no atmospheric rotation or winds.',
      'Lifetime ends at 200 km, below which decay takes days.',
      'Valid for circular orbits from 150 km to the top of the chosen density table; below 300 km lifetimes are weeks to months and the kind warns, as it does for implausible ballistic coefficients.',
    ],
    references: [REF.kingHele, REF.valladoAtmosphere, REF.msise90, REF.smad],
  },
  compute(v) {
    const s = summariseDrag(v.altitudeKm, v.massKg, v.areaM2, v.dragCoefficient, v.solarActivity);
    const warnings: string[] = [];
    if (v.altitudeKm <= REENTRY_ALTITUDE_KM) warnings.push('The altitude is at or below the 200 km end point: lifetime is reported as 0; decay from here takes days.');
    else if (v.altitudeKm < 300) warnings.push('Below 300 km the orbit decays within weeks to months.');
    const ballistic = v.massKg / (v.dragCoefficient * v.areaM2);
    if (ballistic < 5 || ballistic > 1000) warnings.push(`Ballistic coefficient ${ballistic.toFixed(1)} kg/m² is unusual for a satellite (typically 10–200 kg/m²); check mass and area.`);
    return {
      outputs: {
        densityKgM3: s.densityKgM3,
        ballisticCoefficientKgM2: ballistic,
        decayKmPerDay: s.decayKmPerDay,
        lifetimeDays: s.lifetimeDays,
        lifetimeYears: s.lifetimeDays / 365.25,
        maintenanceDeltaVMpsPerYear: s.maintenanceDeltaVMpsPerYear,
        dragAccelerationMps2: s.dragAccelerationMps2,
      },
      warnings,
    };
  },
});
