/**
 * Edit distance: the fewest one-letter insertions, deletions, substitutions
 * and swaps of two neighbours from a to b (optimal string alignment).
 */
export function editDistance(a: string, b: string): number {
  let before: number[] = [];
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = [i];
    for (let j = 1; j <= b.length; j++) {
      let d = Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d = Math.min(d, before[j - 2] + 1);
      row.push(d);
    }
    before = prev;
    prev = row;
  }
  return prev[b.length];
}

/**
 * The candidate nearest to what was typed, if it is near enough to be what
 * was meant: a few letters off (one in three), or one a prefix of the other.
 * Ties go to the earlier candidate.
 */
export function nearest(typed: string, candidates: readonly string[]): string | undefined {
  let best: { name: string; d: number } | undefined;
  for (const name of candidates) {
    const d = editDistance(typed, name);
    const near = d <= Math.max(1, Math.floor(typed.length / 3)) || name.startsWith(typed) || typed.startsWith(name);
    if (near && (!best || d < best.d)) best = { name, d };
  }
  return best?.name;
}
