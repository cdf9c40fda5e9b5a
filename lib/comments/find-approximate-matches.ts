/** A place in `text` whose content is within `distance` edits of the pattern. */
export interface ApproximateMatch {
  from: number;
  to: number;
  distance: number;
}

/**
 * Every substring of `text` within `maxErrors` edits (Levenshtein) of
 * `pattern`, one per cluster of neighbouring end positions (the one with
 * the fewest edits).
 *
 * Method: the dynamic programme of P. H. Sellers, "The theory and
 * computation of evolutionary distances: pattern recognition", J.
 * Algorithms 1(4), 1980, pp. 359–373 (edit distance with a free start in
 * the text), with the cut-off of E. Ukkonen, "Finding approximate
 * patterns in strings", J. Algorithms 6(1), 1985, pp. 132–137, that only
 * evaluates rows which can still be within `maxErrors` — O(maxErrors · |text|)
 * expected time. Each cell carries the text offset where its alignment
 * started, so a match's start comes with its end.
 */
export function findApproximateMatches(text: string, pattern: string, maxErrors: number): ApproximateMatch[] {
  const m = pattern.length;
  const n = text.length;
  const k = Math.max(0, Math.floor(maxErrors));
  if (m === 0 || k >= m) return [];
  const BIG = m + k + 1;
  let prev = new Int32Array(m + 1);
  let prevStart = new Int32Array(m + 1);
  let cur = new Int32Array(m + 1);
  let curStart = new Int32Array(m + 1);
  for (let i = 0; i <= m; i++) prev[i] = i;
  let prevTop = m;
  let lastActive = k;
  const ends: ApproximateMatch[] = [];

  for (let j = 1; j <= n; j++) {
    cur[0] = 0;
    curStart[0] = j;
    const top = Math.min(lastActive + 1, m);
    const tj = text.charCodeAt(j - 1);
    for (let i = 1; i <= top; i++) {
      const diag = (i - 1 <= prevTop ? prev[i - 1] : BIG) + (pattern.charCodeAt(i - 1) === tj ? 0 : 1);
      const fromLeft = (i <= prevTop ? prev[i] : BIG) + 1; // text character not in the pattern
      const fromAbove = cur[i - 1] + 1; // pattern character missing from the text
      if (diag <= fromLeft && diag <= fromAbove) {
        cur[i] = diag;
        curStart[i] = prevStart[i - 1];
      } else if (fromAbove <= fromLeft) {
        cur[i] = fromAbove;
        curStart[i] = curStart[i - 1];
      } else {
        cur[i] = fromLeft;
        curStart[i] = prevStart[i];
      }
    }
    lastActive = top;
    while (lastActive > 0 && cur[lastActive] > k) lastActive--;
    if (top === m && cur[m] <= k) ends.push({ from: curStart[m], to: j, distance: cur[m] });
    [prev, cur] = [cur, prev];
    [prevStart, curStart] = [curStart, prevStart];
    prevTop = top;
  }

  // Neighbouring end positions describe the same place: keep the best of each run.
  const best: ApproximateMatch[] = [];
  for (const e of ends) {
    const last = best[best.length - 1];
    if (last && e.from <= last.to) {
      if (e.distance < last.distance) best[best.length - 1] = e;
    } else best.push(e);
  }
  return best;
}
