/**
 * Unit-aware arithmetic over named quantities with a restricted mathjs instance.
 * Following the mathjs "Security" documentation, import, createUnit, evaluate, parse, simplify,
 * derivative, resolve, compile and reviver are replaced inside expressions by functions that throw;
 * in addition every parsed tree is checked against an allow-list of node types and functions before it
 * is evaluated (no assignments, no function definitions, no matrices, no property access).
 * Inputs: expression text; values as strings with units ("7078.137 km"); optional result unit.
 */
import { all, create, type MathNode, type Unit } from 'mathjs';
import { CalcInputError } from '../types';

const math = create(all);
const parse = math.parse;
const isUnit = math.isUnit;
const unitOf = math.unit;

function disabled(name: string): () => never {
  return () => {
    throw new Error(`function ${name} is disabled`);
  };
}

math.import(
  Object.fromEntries(
    ['import', 'createUnit', 'evaluate', 'parse', 'simplify', 'derivative', 'resolve', 'compile', 'reviver'].map(
      (n) => [n, disabled(n)],
    ),
  ),
  { override: true },
);

const ALLOWED_FUNCTIONS = new Set([
  'sqrt',
  'cbrt',
  'exp',
  'log',
  'log10',
  'log2',
  'abs',
  'sin',
  'cos',
  'tan',
  'asin',
  'acos',
  'atan',
  'atan2',
  'sinh',
  'cosh',
  'tanh',
  'pow',
  'min',
  'max',
  'floor',
  'ceil',
  'round',
  'hypot',
  'sign',
  'mod',
]);
const ALLOWED_NODES = new Set(['ConstantNode', 'SymbolNode', 'OperatorNode', 'ParenthesisNode', 'FunctionNode']);

export const MAX_EXPRESSION_LENGTH = 500;

/** Parsed and checked trees by text (parsing dominates the cost of a call); bounded. */
const PARSED = new Map<string, MathNode>();
const MAX_PARSED = 500;

/** Parse text and check it against the allow-list (cached); throws CalcInputError on `field`. */
function parseRestricted(text: string, field: string): MathNode {
  const cached = PARSED.get(text);
  if (cached) return cached;
  const node = parseAndCheck(text, field);
  if (PARSED.size >= MAX_PARSED) PARSED.clear();
  PARSED.set(text, node);
  return node;
}

function parseAndCheck(text: string, field: string): MathNode {
  if (text.length > MAX_EXPRESSION_LENGTH)
    throw new CalcInputError(field, `longer than ${MAX_EXPRESSION_LENGTH} characters`);
  let node: MathNode;
  try {
    node = parse(text);
  } catch (err) {
    throw new CalcInputError(field, `cannot be parsed: ${err instanceof Error ? err.message : String(err)}`);
  }
  node.traverse((n: MathNode) => {
    if (!ALLOWED_NODES.has(n.type))
      throw new CalcInputError(
        field,
        `uses ${n.type.replace(/Node$/, '').toLowerCase()} syntax, which is not allowed (only arithmetic, units and functions)`,
      );
    if (math.isFunctionNode(n) && !ALLOWED_FUNCTIONS.has(n.fn.name)) {
      throw new CalcInputError(
        field,
        `uses the function "${n.fn.name}", which is not allowed (allowed: ${[...ALLOWED_FUNCTIONS].join(', ')})`,
      );
    }
  });
  return node;
}

type Quantity = number | Unit;

function evaluateNode(node: MathNode, scope: Map<string, Quantity>, field: string): Quantity {
  let value: unknown;
  try {
    value = node.evaluate(scope);
  } catch (err) {
    throw new CalcInputError(field, `cannot be evaluated: ${err instanceof Error ? err.message : String(err)}`);
  }
  if (typeof value === 'number' || isUnit(value)) {
    const magnitude = typeof value === 'number' ? value : value.value;
    if (magnitude !== null && !Number.isFinite(magnitude))
      throw new CalcInputError(field, 'gives a non-finite value (division by zero or overflow)');
    return value;
  }
  throw new CalcInputError(field, 'does not give a real number or quantity');
}

export interface ExpressionResult {
  value: number;
  unit: string;
  text: string;
}

/** Evaluate `expression` over named quantities, converting to `unit` when given. */
export function evaluateExpression(
  expression: string,
  values: Record<string, string>,
  unit?: string,
): ExpressionResult {
  const scope = new Map<string, Quantity>();
  for (const [name, text] of Object.entries(values)) {
    scope.set(name, evaluateNode(parseRestricted(text, 'values'), new Map(), 'values'));
  }
  const result = evaluateNode(parseRestricted(expression, 'expression'), scope, 'expression');
  if (unit !== undefined) {
    let target: Unit;
    try {
      target = unitOf(unit);
    } catch (err) {
      throw new CalcInputError('unit', `"${unit}" is not a unit: ${err instanceof Error ? err.message : String(err)}`);
    }
    if (typeof result === 'number' || !result.equalBase(target)) {
      throw new CalcInputError(
        'unit',
        `the result ${math.format(result, { precision: 8 })} cannot be expressed in ${unit}`,
      );
    }
    const value = result.toNumber(unit);
    return { value, unit, text: `${math.format(value, { precision: 12 })} ${unit}` };
  }
  if (typeof result === 'number') return { value: result, unit: '', text: math.format(result, { precision: 12 }) };
  // compound units such as (km^1.5 s) / km^1.5 are simplified; a single unit is kept as written
  const simple = result.units.length > 1 ? result.simplify() : result;
  const own = simple.formatUnits();
  const value = own === '' ? simple.toNumber() : simple.toNumber(own);
  return { value, unit: own, text: `${math.format(value, { precision: 12 })}${own ? ` ${own}` : ''}` };
}
