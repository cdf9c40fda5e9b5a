import type { CalcInputField, CalcOutputField } from '@/lib/calc';

/** What a number stands for, read from the field name the registry gives it (names are in the trade's words, unit last). */
const QUANTITIES: [RegExp, string][] = [
  [/semiMajorAxis|Sma/i, 'semi-major axis'],
  [/altitude/i, 'altitude'],
  [/inclination/i, 'inclination'],
  [/sunRightAscension|sunDeclination/i, 'position of the Sun'],
  [/raan|rightAscension/i, 'right ascension of the node'],
  [/ltan|ltdn|localSolarTime|localTime/i, 'local time of the node'],
  [/argPerigee/i, 'argument of perigee'],
  [/meanAnomaly/i, 'mean anomaly'],
  [/latitude/i, 'latitude'],
  [/longitude/i, 'longitude'],
  [/beta/i, 'beta angle'],
  [/period/i, 'period'],
  [/swath/i, 'swath width'],
];
/** Words that make a number a change, spread or tolerance of a quantity rather than the quantity. */
const CHANGE = /difference|change|drift|deviation|sigma|error|bias|tolerance|shift/i;

/** The meaning of a field ("altitude", "change of inclination"), or undefined when its name says nothing the table knows. */
export function quantityMeaningOf(name: string): string | undefined {
  const quantity = QUANTITIES.find(([pattern]) => pattern.test(name))?.[1];
  if (!quantity) return undefined;
  return CHANGE.test(name) ? `change of ${quantity}` : quantity;
}

/**
 * Whether an output may feed an input: a number in the same unit (the value is passed as it is)
 * and, when both names say what they measure, the same meaning. A semi-major axis and an altitude
 * are both kilometres but differ by the Earth's radius; an inclination difference is not an inclination.
 */
export function canFeedInput(
  field: Pick<CalcInputField, 'name' | 'unit'>,
  output: Pick<CalcOutputField, 'name' | 'unit' | 'type'>,
): boolean {
  if ((output.type !== 'number' && output.type !== 'integer') || output.unit !== field.unit) return false;
  const wanted = quantityMeaningOf(field.name);
  return wanted === undefined || quantityMeaningOf(output.name) === wanted;
}
