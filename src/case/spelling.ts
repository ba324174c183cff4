/**
 * Spelling help for messages: "did you mean thickness?". Levenshtein edit distance (insertions, deletions and
 * substitutions each cost 1), case-insensitive.
 */

export function editDistance(a: string, b: string): number {
  const x = a.toLowerCase();
  const y = b.toLowerCase();
  let previous = Array.from({ length: y.length + 1 }, (_, j) => j);
  for (let i = 1; i <= x.length; i++) {
    const current = [i];
    for (let j = 1; j <= y.length; j++) {
      const substitution = (previous[j - 1] ?? 0) + (x[i - 1] === y[j - 1] ? 0 : 1);
      current.push(Math.min((previous[j] ?? 0) + 1, (current[j - 1] ?? 0) + 1, substitution));
    }
    previous = current;
  }
  return previous[y.length] ?? 0;
}

/** The candidates within `maxDistance` edits of `word`, nearest first. */
export function nearWords(word: string, candidates: readonly string[], maxDistance: number): string[] {
  return candidates
    .map((candidate) => ({ candidate, distance: editDistance(word, candidate) }))
    .filter(({ distance }) => distance <= maxDistance)
    .sort((p, q) => p.distance - q.distance)
    .map(({ candidate }) => candidate);
}
