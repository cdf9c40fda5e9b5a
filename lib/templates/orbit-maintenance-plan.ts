import type { MemoTemplate } from './template-types';
import { bullets, calc, complianceTable, doc, figure, from, h, p, requirement, typed, value } from './build-doc';

/** Orbit maintenance plan for the invented TERNLIGHT-1 mission. */
export const orbitMaintenancePlan: MemoTemplate = {
  id: 'orbit-maintenance-plan',
  title: 'Orbit maintenance plan',
  description: 'Drag decay across solar activity, frozen-orbit keeping, local-time drift from injection errors and the resulting ΔV budget.',
  build: () =>
    doc(
      h(1, 'Purpose'),
      p('This plan sizes the manoeuvres that keep TERNLIGHT-1 on its reference ground track and node local time over the five-year mission.'),
      h(1, 'Reference orbit'),
      calc('orbit', 'repeat-orbit', 'Reference repeat orbit', { revolutions: typed('175'), days: typed('12') }),
      p('The reference orbit is at ', value('orbit', 'altitudeKm'), ' and ', value('orbit', 'inclinationDeg'), '.'),
      h(1, 'Drag make-up'),
      calc('dragLow', 'drag-decay', 'Low solar activity', { altitudeKm: from('orbit', 'altitudeKm'), massKg: typed('310 kg'), areaM2: typed('1.6 m^2'), solarActivity: typed('low') }),
      calc('dragHigh', 'drag-decay', 'High solar activity', { altitudeKm: from('orbit', 'altitudeKm'), massKg: typed('310 kg'), areaM2: typed('1.6 m^2'), solarActivity: typed('high') }),
      figure('fig-decay', 'altitude-decay', 'dragHigh', 'Altitude decay without manoeuvres at high solar activity.'),
      p('Drag make-up costs between ', value('dragLow', 'maintenanceDeltaVMpsPerYear'), ' and ', value('dragHigh', 'maintenanceDeltaVMpsPerYear'), ' per year depending on solar activity.'),
      requirement('REQ-OMP-001', 'Drag make-up at high solar activity within the propellant allocation: at most 5.6 m/s per year.', ['dragHigh', 'maintenanceDeltaVMpsPerYear'], 'le', '5.6 m/s'),
      requirement('REQ-OMP-002', 'Re-entry within the 25-year disposal rule by natural decay alone (lifetime from the reference altitude at high solar activity); otherwise a disposal burn is needed.', ['dragHigh', 'lifetimeYears'], 'le', '25 yr'),
      h(1, 'Frozen-orbit keeping'),
      calc('frozen', 'frozen-orbit', 'Frozen eccentricity', { altitudeKm: from('orbit', 'altitudeKm'), inclinationDeg: from('orbit', 'inclinationDeg') }),
      p('Eccentricity is held near ', value('frozen', 'eccentricity'), ' with perigee at ', value('frozen', 'argPerigeeDeg'), '.'),
      h(1, 'Node local-time control'),
      calc('inject', 'injection-sensitivity', 'Drift from injection errors', { altitudeKm: from('orbit', 'altitudeKm'), inclinationDeg: from('orbit', 'inclinationDeg'), inclinationErrorDeg: typed('0.03 deg'), altitudeErrorKm: typed('3 km') }),
      p('Left uncorrected, the combined injection errors drift the node local time by ', value('inject', 'localTimeDriftMinPerYear'), '.'),
      h(1, 'Manoeuvre policy'),
      bullets(
        ['Altitude make-up burns when the ground track drifts more than ±1 km from the reference at the equator.'],
        ['One inclination trim in the first month if the injected inclination error exceeds 0.02°.'],
      ),
      h(1, 'Requirements compliance'),
      complianceTable(),
    ),
};
