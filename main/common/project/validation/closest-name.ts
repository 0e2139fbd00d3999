/**
 * "Did you mean" for misspelt property names: the known name with the smallest Levenshtein
 * edit distance (Levenshtein 1966; classic dynamic-programming form), if it is close enough.
 */

/** Levenshtein distance between two strings (insertions, deletions, substitutions each cost 1). */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      row.push(Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + cost));
    }
    prev = row;
  }
  return prev[b.length];
}

/**
 * The candidate closest to `name`, compared case-insensitively, when at most a third of the
 * longer name differs (at least 1, at most 3 edits); otherwise undefined.
 */
export function closestName(name: string, candidates: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const c of candidates) {
    const d = editDistance(name.toLowerCase(), c.toLowerCase());
    if (d < bestDistance) {
      best = c;
      bestDistance = d;
    }
  }
  const allowed = Math.min(3, Math.max(1, Math.floor(Math.max(name.length, best?.length ?? 0) / 3)));
  return bestDistance <= allowed ? best : undefined;
}
