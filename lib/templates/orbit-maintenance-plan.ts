import type { MemoTemplate } from './template-types';
import { bullets, calc, complianceTable, doc, figure, figureRef, from, h, p, requirement, typed, value } from './build-doc';

const START = '2027-09-15T00:00:00Z';
const END_OF_LIFE = '2032-09-15T00:00:00Z';
const SPACECRAFT = { massKg: typed('310 kg'), areaM2: typed('1.6 m^2'), dragCoefficient: typed('2.2') };

/** Orbit maintenance plan for the invented TERNLIGHT-1 mission: the orbit over its five-year life and the ΔV it takes. */
export const orbitMaintenancePlan: MemoTemplate = {
  id: 'orbit-maintenance-plan',
  title: 'Orbit maintenance plan',
  description: 'The orbit over the mission’s life: local time of the node under solar gravity with its tolerance band, decay over the solar cycle, ground-track maintenance, disposal, and the ΔV budget fed from those blocks.',
  build: () =>
    doc(
      h(1, 'Purpose'),
      p('This plan sizes the manoeuvres that keep TERNLIGHT-1 on its reference ground track and node local time over the five-year mission from injection on 15 September 2027, and the disposal at the end of it, and sums them into the ΔV budget.'),
      h(1, 'Reference orbit'),
      calc('orbit', 'repeat-orbit', 'Reference repeat orbit', { revolutions: typed('175'), days: typed('12') }),
      p('The reference orbit is the 175-revolution, 12-day repeat at ', value('orbit', 'altitudeKm'), ' mean altitude and ', value('orbit', 'inclinationDeg'), ' inclination, with the ascending node at 22:30 mean local time.'),
      h(1, 'Injection errors'),
      calc('inject', 'injection-sensitivity', 'Drift from 3σ injection errors', { altitudeKm: from('orbit', 'altitudeKm'), inclinationDeg: from('orbit', 'inclinationDeg'), inclinationErrorDeg: typed('0.03 deg'), altitudeErrorKm: typed('3 km') }),
      p('Left uncorrected, the 3σ injection errors drift the node local time by ', value('inject', 'localTimeDriftMinPerYear'), '; removing the inclination error takes a plane change of ', value('inject', 'planeChangeDeltaVMps'), '.'),
      h(1, 'Node local time under solar gravity'),
      calc('solar', 'solar-inclination-drift', 'Inclination drift and node local time over the mission', {
        altitudeKm: from('orbit', 'altitudeKm'),
        inclinationDeg: from('orbit', 'inclinationDeg'),
        ltanHours: typed('22.5'),
        startEpoch: typed(START),
        years: typed('5 yr'),
        ltanToleranceMin: typed('15 min'),
      }),
      figure('fig-local-time', 'node-local-time-mission', 'solar', 'Node local time over the mission without inclination manoeuvres, with no bias and with the optimal injection bias, against the ±15 min tolerance.'),
      p('Solar gravity changes the inclination by ', value('solar', 'inclinationRateDegPerYear'), ', and through the J2 node rate the local time of the node follows a parabola: injected exactly on the reference it is off by ', value('solar', 'ltanDeviationEndMin'), ' after five years (', figureRef('fig-local-time'), '). Holding the inclination would cost ', value('solar', 'inclinationHoldDeltaVMpsPerYear'), ' per year.'),
      p('Injecting instead with an inclination bias of ', value('solar', 'optimalBiasDeg'), ' keeps the local time within ±15 min for ', value('solar', 'yearsWithinTolerance'), ' without any inclination manoeuvre. The budget below keeps the yearly hold as the inclination line, a reserve should the bias not be accepted by the launcher.'),
      requirement('REQ-OMP-001', 'Node local time within ±15 min of 22:30 over the five-year mission without an inclination manoeuvre, with the planned injection bias.', ['solar', 'yearsWithinTolerance'], 'ge', '5 yr'),
      h(1, 'Drag over the solar cycle'),
      calc('decay', 'drag-decay', 'Decay without manoeuvres over the solar cycles', { altitudeKm: from('orbit', 'altitudeKm'), ...SPACECRAFT, startEpoch: typed(START), ltanHours: typed('22.5') }),
      figure('fig-decay', 'decay-solar-flux', 'decay', 'Mean altitude without manoeuvres from injection, with the 81-day mean solar flux F10.7 of the solar-cycle model that drives it.'),
      p('Without manoeuvres the orbit decays by ', value('decay', 'decayKmPerDay'), ' at injection, near the minimum of the solar cycle; ', figureRef('fig-decay'), ' shows how the decay follows the solar flux over the following cycles.'),
      calc('maint', 'altitude-maintenance', 'Ground-track maintenance at high solar activity', { altitudeKm: from('orbit', 'altitudeKm'), ...SPACECRAFT, deadbandKm: typed('1 km'), startEpoch: typed(START), ltanHours: typed('22.5'), solarActivity: typed('high') }),
      p('Keeping the ground track within ±1 km at the equator takes a raise every ', value('maint', 'manoeuvreIntervalDays'), ' of ', value('maint', 'deltaVPerManoeuvreMps'), ', or ', value('maint', 'deltaVPerYearMps'), ' per year with the solar cycle at its +2σ amplitude.'),
      h(1, 'Frozen-orbit keeping'),
      calc('frozen', 'frozen-orbit', 'Frozen eccentricity', { altitudeKm: from('orbit', 'altitudeKm'), inclinationDeg: from('orbit', 'inclinationDeg') }),
      p('Eccentricity is held near ', value('frozen', 'eccentricity'), ' with perigee at ', value('frozen', 'argPerigeeDeg'), '; the altitude raises are split between perigee and apogee so that they do not disturb it.'),
      h(1, 'Disposal'),
      calc('disposal', 'disposal-compliance', 'Disposal at end of life', { altitudeKm: from('orbit', 'altitudeKm'), ...SPACECRAFT, endOfLifeEpoch: typed(END_OF_LIFE), ruleYears: typed('25 yr') }),
      p('Left at the reference altitude after the end of life on 15 September 2032, TERNLIGHT-1 would stay in orbit for ', value('disposal', 'lifetimeYears'), ' (the calculation stops at 100 years; re-entry within 25 years: ', value('disposal', 'compliant'), '). The highest circular orbit that re-enters within 25 years is at ', value('disposal', 'maxCompliantAltitudeKm'), '; a single retrograde burn of ', value('disposal', 'deorbitDeltaVMps'), ' lowers the perigee to ', value('disposal', 'disposalPerigeeAltitudeKm'), ' and brings re-entry within the rule.'),
      requirement('REQ-OMP-002', 'Re-entry within 25 years of end of life by natural decay alone; where this is not met, the disposal burn above is required.', ['disposal', 'lifetimeYears'], 'le', '25 yr'),
      h(1, 'ΔV budget'),
      calc('budget', 'delta-v-budget', 'Mission ΔV budget', {
        injectionCorrectionMps: from('inject', 'planeChangeDeltaVMps'),
        inclinationHoldMpsPerYear: from('solar', 'inclinationHoldDeltaVMpsPerYear'),
        altitudeMaintenanceMpsPerYear: from('maint', 'deltaVPerYearMps'),
        missionYears: typed('5 yr'),
        disposalMps: from('disposal', 'deorbitDeltaVMps'),
        marginPercent: typed('10'),
      }),
      p('The mission needs ', value('budget', 'totalDeltaVMps'), ' including a 10 % margin of ', value('budget', 'marginMps'), ': ', value('budget', 'injectionCorrectionMps'), ' to correct the injection, ', value('budget', 'inclinationMps'), ' to hold the inclination, ', value('budget', 'altitudeMaintenanceMps'), ' for the ground track and ', value('budget', 'disposalMps'), ' for disposal.'),
      requirement('REQ-OMP-003', 'Mission ΔV with margin within the 100 m/s the propulsion system holds.', ['budget', 'totalDeltaVMps'], 'le', '100 m/s'),
      h(1, 'Manoeuvre policy'),
      bullets(
        ['Altitude make-up burns when the ground track drifts more than ±1 km from the reference at the equator.'],
        ['One inclination trim in the first month removes the injection error beyond the planned bias.'],
        ['The inclination is re-biased when the node local time reaches the edge of its ±15 min band.'],
        ['The disposal burn is performed at the end of life, before the propellant reserve falls below the disposal line of the budget.'],
      ),
      // injection dispersion (Monte-Carlo over the launcher's 1σ errors)
      h(1, 'Injection dispersion'),
      calc('dispersion', 'injection-dispersion', 'Local-time drift over injection errors', { altitudeKm: from('orbit', 'altitudeKm'), inclinationDeg: from('orbit', 'inclinationDeg'), sigmaAltitudeKm: typed('2 km'), sigmaInclinationDeg: typed('0.02 deg'), samples: typed('100000'), seed: typed('2026') }),
      figure('fig-dispersion', 'dispersion-histogram', 'dispersion', 'Local-time drift over 100 000 injections drawn from the launcher’s 1σ errors, with the 99.73 % limits.'),
      p('In 99.73 % of injections the node local time drifts by less than ', value('dispersion', 'ltanDriftP997MinPerYear'), '; correcting that case takes ', value('dispersion', 'correctionDeltaVP997Mps'), ' (plane change and altitude transfer, performed separately).'),
      h(1, 'Requirements compliance'),
      complianceTable(),
    ),
};
