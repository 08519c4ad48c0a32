/**
 * Name matching shared by substance, constant and solid-form look-ups: case-insensitive,
 * ignoring spaces, hyphens, underscores and dots, with nearest-name suggestions.
 */

/** Folds a name for comparison: "R-718" → "r718", "Ice Ih" → "iceih". */
export function foldName(name: string): string {
  return name.toLowerCase().replace(/[\s\-_.]+/g, "");
}

/** Edit distance between two strings (Levenshtein). */
export function editDistance(a: string, b: string): number {
  const previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = previous[0]!;
    previous[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = previous[j]!;
      previous[j] = Math.min(above + 1, previous[j - 1]! + 1, diagonal + (a[i - 1] === b[j - 1] ? 0 : 1));
      diagonal = above;
    }
  }
  return previous[b.length]!;
}

/**
 * The candidates nearest to `name` (at most `count`), by edit distance of folded names, also
 * counting a candidate that starts with what was typed as near.
 */
export function nearestNames(name: string, candidates: readonly string[], count = 3): string[] {
  const folded = foldName(name);
  return [...new Set(candidates)]
    .map((candidate) => {
      const other = foldName(candidate);
      const distance = other.startsWith(folded) && folded.length >= 2 ? 0.5 : editDistance(folded, other);
      return { candidate, distance };
    })
    .filter((entry) => entry.distance <= Math.max(2, Math.floor(folded.length / 3)))
    .sort((x, y) => x.distance - y.distance)
    .map((entry) => entry.candidate)
    .filter((candidate, index, all) => all.findIndex((other) => foldName(other) === foldName(candidate)) === index)
    .slice(0, count);
}
