import type { CalcInputField } from '@/lib/calc';
import { quantityMeaningOf } from './can-feed-input';

/**
 * Ranges outside which a value is accepted (the registry's bounds decide validity) but is unusual
 * for a low-Earth-orbit Earth-observation mission, so the editor asks the analyst to check it.
 * Ranges from memory of typical sun-synchronous Earth-observation designs (about 400–1000 km,
 * near-circular); deliberately wide, so only a likely slip (5000 km, an eccentricity of 0.3) is flagged.
 */
const USUAL: Record<string, { min: number; max: number; unit: string; what: string }> = {
  altitude: { min: 200, max: 1500, unit: 'km', what: 'an Earth-observation orbit' },
  'semi-major axis': { min: 6578, max: 7878, unit: 'km', what: 'an Earth-observation orbit' },
};
const USUAL_ECCENTRICITY_MAX = 0.05;

/** A sentence asking to check a valid but unusual value, or null. `value` is in the field's unit. */
export function unusualInputNote(
  field: Pick<CalcInputField, 'name' | 'unit' | 'min' | 'max'>,
  value: number,
): string | null {
  // A value outside the registry's bounds is refused with its own message; no second note about it.
  if (
    !Number.isFinite(value) ||
    (field.min !== undefined && value < field.min) ||
    (field.max !== undefined && value > field.max)
  )
    return null;
  if (field.name === 'eccentricity' && value > USUAL_ECCENTRICITY_MAX) {
    return `An eccentricity of ${value} is unusual for the near-circular orbits of Earth observation (usually below ${USUAL_ECCENTRICITY_MAX}); accepted, but check it.`;
  }
  const meaning = quantityMeaningOf(field.name);
  const usual = meaning ? USUAL[meaning] : undefined;
  if (!usual || field.unit !== usual.unit || (value >= usual.min && value <= usual.max)) return null;
  return `${value} ${usual.unit} is unusual for ${usual.what} (usually ${usual.min}–${usual.max} ${usual.unit}); accepted, but check it.`;
}
