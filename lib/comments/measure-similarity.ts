/**
 * Levenshtein edit distance (insertions, deletions and substitutions each
 * cost 1), by the Wagner–Fischer dynamic programme (R. A. Wagner and
 * M. J. Fischer, "The string-to-string correction problem", J. ACM 21(1),
 * 1974, pp. 168–173), in O(|a|·|b|) time and O(|b|) memory.
 */
export function editDistance(a: string, b: string): number {
  if (a === b) return 0;
  if (a.length === 0) return b.length;
  if (b.length === 0) return a.length;
  let prev = new Uint32Array(b.length + 1);
  let cur = new Uint32Array(b.length + 1);
  for (let j = 0; j <= b.length; j++) prev[j] = j;
  for (let i = 1; i <= a.length; i++) {
    cur[0] = i;
    const ai = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j++) {
      const sub = prev[j - 1] + (ai === b.charCodeAt(j - 1) ? 0 : 1);
      cur[j] = Math.min(sub, prev[j] + 1, cur[j - 1] + 1);
    }
    [prev, cur] = [cur, prev];
  }
  return prev[b.length];
}

/** 1 for equal strings, 0 for strings with nothing in common: 1 − distance / longer length. */
export function measureSimilarity(a: string, b: string): number {
  const longer = Math.max(a.length, b.length);
  return longer === 0 ? 1 : 1 - editDistance(a, b) / longer;
}
