/**
 * Typo hints: the closest known word by Levenshtein (edit) distance.
 * Reference: https://en.wikipedia.org/wiki/Levenshtein_distance. O(a·b) per comparison.
 */

/** Edit distance between two strings (insertions, deletions, substitutions each cost 1). */
export function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const substitution = (previous[j - 1] ?? 0) + (a[i - 1] === b[j - 1] ? 0 : 1);
      current.push(Math.min((previous[j] ?? 0) + 1, (current[j - 1] ?? 0) + 1, substitution));
    }
    previous = current;
  }
  return previous[b.length] ?? 0;
}

/**
 * The known word closest to `word`, if it is close enough to be a plausible typo (distance ≤ 2, and less than
 * half the word's length), compared case-insensitively.
 * @example suggest('unti', ['name', 'symbol', 'unit']) // => 'unit'
 */
export function suggest(word: string, known: readonly string[]): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of known) {
    const distance = editDistance(word.toLowerCase(), candidate.toLowerCase());
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return bestDistance <= 2 && bestDistance < Math.max(word.length, 2) / 2 + 0.5 ? best : undefined;
}
