/** Suggestions for misspelt ids and field names: Levenshtein edit distance. */

/** Edit distance (insertions, deletions, substitutions) between two strings. */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      row[j] = Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    prev = row;
  }
  return prev[b.length];
}

/**
 * The candidate nearest to word, when it is near enough to be a likely typo (distance at most a
 * third of the word's length, at least 1, at most 4). Ties go to the first in code-point order.
 */
export function closest(word: string, candidates: readonly string[]): string | undefined {
  const limit = Math.min(4, Math.max(1, Math.floor(word.length / 3)));
  const ranked = [...candidates]
    .sort()
    .map((c) => ({ c, d: editDistance(word.toLowerCase(), c.toLowerCase()) }))
    .filter((x) => x.d <= limit)
    .sort((x, y) => x.d - y.d);
  return ranked[0]?.c;
}

/** "did you mean X? " prefix, or nothing. */
export function didYouMean(word: string, candidates: readonly string[]): string {
  const best = closest(word, candidates);
  return best === undefined ? '' : `did you mean ${best}? `;
}
