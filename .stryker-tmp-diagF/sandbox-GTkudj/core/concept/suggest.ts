/**
 * "Did you mean": the nearest known name to a misspelt one.
 */
// @ts-nocheck


/** Edit distance (Levenshtein, 1966): insertions, deletions and substitutions. */
function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      current[j] = Math.min(previous[j] + 1, current[j - 1] + 1, previous[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    previous = current;
  }
  return previous[b.length];
}

/** The candidate closest to `word`, if it is close enough to be a slip of the keyboard. */
export function closestName(word: string, candidates: readonly string[]): string | undefined {
  const lower = word.toLowerCase();
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const d = candidate.toLowerCase() === lower ? 0 : editDistance(lower, candidate.toLowerCase());
    if (d < bestDistance) [best, bestDistance] = [candidate, d];
  }
  const allowed = Math.max(1, Math.min(3, Math.floor(word.length / 3)));
  return bestDistance <= allowed ? best : undefined;
}
