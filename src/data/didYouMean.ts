/** Suggestions for mistyped keys and ids. */

/**
 * Edit distance counting insertions, deletions, substitutions and swaps of
 * two neighbouring characters as 1 each (optimal string alignment), since a
 * swap ("lable" for "label") is the commonest typing slip.
 */
export function editDistance(a: string, b: string): number {
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) => Array.from({ length: b.length + 1 }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)));
  const at = (i: number, j: number): number => d[i]?.[j] ?? 0;
  for (let i = 1; i <= a.length; i++) {
    const row = d[i] ?? [];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let v = Math.min(at(i - 1, j) + 1, at(i, j - 1) + 1, at(i - 1, j - 1) + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) v = Math.min(v, at(i - 2, j - 2) + 1);
      row[j] = v;
    }
  }
  return at(a.length, b.length);
}

/**
 * The closest candidate, if it is close enough to be a likely typo: within
 * a third of the word's length (at least 1, at most 3 edits). Case is ignored
 * when measuring, so `GJ` finds `gJ`.
 */
export function didYouMean(word: string, candidates: readonly string[]): string | null {
  const limit = Math.min(3, Math.max(1, Math.floor(word.length / 3)));
  let best: string | null = null;
  let bestD = Infinity;
  for (const c of candidates) {
    const d = editDistance(word.toLowerCase(), c.toLowerCase());
    if (d < bestD) {
      best = c;
      bestD = d;
    }
  }
  return bestD <= limit ? best : null;
}

/** Up to `n` candidates ordered by closeness to `word`, for "known ids are ..." hints. */
export function nearest(word: string, candidates: readonly string[], n = 5): string[] {
  return [...candidates]
    .map((c) => ({ c, d: editDistance(word.toLowerCase(), c.toLowerCase()) }))
    .sort((x, y) => x.d - y.d || (x.c < y.c ? -1 : x.c > y.c ? 1 : 0))
    .slice(0, n)
    .map((x) => x.c);
}
