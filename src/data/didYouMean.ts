/** Suggestions for mistyped keys and ids. */

/** Levenshtein distance (insert, delete, substitute; each costs 1). */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    for (let j = 1; j <= b.length; j++) {
      const sub = (prev[j - 1] ?? 0) + (a[i - 1] === b[j - 1] ? 0 : 1);
      cur.push(Math.min(sub, (prev[j] ?? 0) + 1, (cur[j - 1] ?? 0) + 1));
    }
    prev = cur;
  }
  return prev[b.length] ?? 0;
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
