/**
 * Revision letters: A, B, … Z, then AA, AB, … AZ, BA … (bijective base 26,
 * as in spreadsheet column names). Letters I and O are not skipped.
 */
export function revisionLetter(index: number): string {
  if (!Number.isInteger(index) || index < 0) throw new Error('revision index must be a whole number ≥ 0');
  let n = index + 1;
  let out = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    out = String.fromCharCode(65 + r) + out;
    n = Math.floor((n - 1) / 26);
  }
  return out;
}

export const isRevisionLetter = (s: string): boolean => /^[A-Z]{1,3}$/.test(s);
