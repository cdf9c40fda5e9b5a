import type { MemoTemplate } from './template-types';
import { bullets, calc, doc, figure, from, h, p, typed, value } from './build-doc';

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
      // injection dispersion (Monte-Carlo over the launcher's 1σ errors)
      h(1, 'Injection dispersion'),
      calc('dispersion', 'injection-dispersion', 'Local-time drift over injection errors', { altitudeKm: from('orbit', 'altitudeKm'), inclinationDeg: from('orbit', 'inclinationDeg'), sigmaAltitudeKm: typed('2 km'), sigmaInclinationDeg: typed('0.02 deg'), samples: typed('100000'), seed: typed('2026') }),
      figure('fig-dispersion', 'dispersion-histogram', 'dispersion', 'Local-time drift over 100 000 injections drawn from the launcher’s 1σ errors, with the 99.73 % limits.'),
      p('In 99.73 % of injections the node local time drifts by less than ', value('dispersion', 'ltanDriftP997MinPerYear'), '; correcting that case takes ', value('dispersion', 'correctionDeltaVP997Mps'), ' (plane change and altitude transfer, performed separately).'),
    ),
};
