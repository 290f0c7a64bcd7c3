/**
 * "Did you mean …?" for misspelt keys, methods and columns: the closest
 * candidate by Levenshtein distance, if it is close enough to be a typo.
 */
export function suggest(input: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined;
  let bestDistance = Infinity;
  for (const candidate of candidates) {
    const distance = levenshtein(input.toLowerCase(), candidate.toLowerCase());
    if (distance < bestDistance) {
      best = candidate;
      bestDistance = distance;
    }
  }
  return best !== undefined && bestDistance <= Math.max(2, Math.floor(input.length / 3)) ? best : undefined;
}

export function didYouMean(input: string, candidates: Iterable<string>, fallback: string): string {
  const close = suggest(input, candidates);
  return close === undefined ? fallback : `Did you mean \`${close}\`? ${fallback}`;
}

function levenshtein(a: string, b: string): number {
  let previous = Array.from({length: b.length + 1}, (_, i) => i);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
    }
    previous = current;
  }
  return previous[b.length]!;
}
