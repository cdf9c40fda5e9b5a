import { defineKind } from '../registry';
import { THEORY_OUTPUT, theoryNotes } from './common';
import { osculatingToMean } from '../topics/mean-osculating';
import {
  elementInputs,
  elementOutputs,
  elementValues,
  elementWarnings,
  MEAN_OSCULATING_ASSUMPTIONS,
  MEAN_OSCULATING_REFERENCES,
  toElements,
} from './mean-to-osculating';

export const osculatingToMeanKind = defineKind({
  kind: 'osculating-to-mean',
  title: 'Osculating to mean elements',
  summary:
    "Mean elements of an osculating orbit (e.g. a launcher's delivered state), the inverse of mean-to-osculating.",
  inputs: elementInputs('Osculating'),
  outputs: [...elementOutputs('mean', 'Mean'), THEORY_OUTPUT],
  model: {
    method:
      'Fixed-point iteration x̄ ← x̄ + (x_osc − osc(x̄)) on the first-order J2 short-period map of mean-to-osculating (Kozai 1959; Brouwer 1959; Lyddane 1963), to 1e-6 km in a and 1e-10 in the other elements.',
    assumptions: MEAN_OSCULATING_ASSUMPTIONS,
    references: MEAN_OSCULATING_REFERENCES,
  },
  compute(v) {
    const osc = toElements(v);
    const mean = osculatingToMean(osc);
    return {
      outputs: { ...elementValues('mean', mean), theory: v.theory },
      warnings: elementWarnings(mean),
      modelNotes: theoryNotes(v.theory),
    };
  },
});
