import { z } from 'zod';
import { recordField, stringField } from '../fields';
import { REF } from '../references';
import { defineKind } from '../registry';
import { evaluateExpression, MAX_EXPRESSION_LENGTH } from '../topics/expression';
import { numOut } from './common';

export const expressionKind = defineKind({
  kind: 'expression',
  title: 'Expression with units',
  summary: 'Evaluates an arithmetic expression over named quantities with units (mathjs syntax, restricted).',
  inputs: {
    expression: stringField('Expression', { maxLength: MAX_EXPRESSION_LENGTH, help: 'e.g. 2 pi sqrt(a^3 / mu)' }),
    values: recordField('Named values', {
      maxEntries: 50,
      maxLength: 200,
      help: 'name → quantity text, e.g. a: "7078.137 km"',
    }),
    unit: z
      .string()
      .min(1)
      .max(40)
      .optional()
      .meta({ label: 'Result unit', unit: null, type: 'string', optional: true, help: 'e.g. min' }),
  },
  outputs: [
    numOut('value', 'Value', null, 6),
    { name: 'unit', label: 'Unit', unit: null, precision: 0, type: 'string' },
    { name: 'text', label: 'Result', unit: null, precision: 0, type: 'string' },
  ],
  model: {
    method:
      'mathjs expression evaluation with units; functions limited to an allow-list, no assignments, imports or unit definitions.',
    assumptions: [
      'Units and conversions are those of mathjs 15.2.0.',
      'Values are evaluated first and may only contain numbers, units and arithmetic.',
      'No orbit model is involved: the result is as valid as the expression typed, in double precision.',
    ],
    references: [REF.mathjsSecurity],
  },
  compute(v) {
    const r = evaluateExpression(v.expression, v.values, v.unit);
    return { outputs: { value: r.value, unit: r.unit, text: r.text }, warnings: [] };
  },
});
