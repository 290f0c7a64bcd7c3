/**
 * Small readers of English the rules share: where a clause starts, whether
 * a phrase is negated, which matches of a pattern a sentence holds. They
 * work on a sentence's masked text, so offsets are offsets into `text`.
 */

/** Where a clause may start: punctuation or a conjunction that turns the argument. */
const clauseBoundary = /[;:,()—–]|\b(?:but|so|therefore|thus|hence|whereas|while|although|though|because|and|yet)\b/gi;

/** Words that negate what follows them in the same clause. */
const negator = /\b(?:not|never|no|nor|neither|cannot|without|rather than|instead of|avoid|avoids|avoided|refrain from|(?:wrong|incorrect|mistaken|misleading|a mistake|an error)\s+to)\b|n['’]t\b/i;

/** Offset where the clause holding `index` starts. */
export function clauseStart(text: string, index: number): number {
  let start = 0;
  for (const match of text.slice(0, index).matchAll(clauseBoundary)) start = match.index + match[0].length;
  return start;
}

/** Offset where the clause holding `index` ends. */
export function clauseEnd(text: string, index: number): number {
  const rest = text.slice(index);
  const match = new RegExp(clauseBoundary.source, 'i').exec(rest);
  return match ? index + match.index : text.length;
}

/**
 * Whether the phrase at `index` is negated: a negator among the last `words`
 * words of its clause before it ("does not show that the means are equal").
 */
export function isNegated(text: string, index: number, words = 8): boolean {
  if (words <= 0) return false;
  const before = text.slice(clauseStart(text, index), index).trim().split(/\s+/).slice(-words).join(' ');
  return negator.test(before);
}

export interface Hit {
  readonly start: number;
  readonly end: number;
  readonly match: RegExpMatchArray;
}

/** Every match of `pattern` (made global and case-insensitive) in `text`. */
export function hits(text: string, pattern: RegExp, caseSensitive = false): Hit[] {
  const flags = `g${caseSensitive ? '' : 'i'}${pattern.flags.includes('u') ? 'u' : ''}`;
  return [...text.matchAll(new RegExp(pattern.source, flags))].map((match) => ({
    start: match.index ?? 0,
    end: (match.index ?? 0) + match[0].length,
    match,
  }));
}

/** Matches of `pattern` that are not negated in their clause. */
export function affirmedHits(text: string, pattern: RegExp, words = 8): Hit[] {
  return hits(text, pattern).filter((hit) => !isNegated(text, hit.start, words));
}

/** Words that make the rest of their clause a supposition, not a claim. */
const supposition = /\b(?:if|unless|whether|suppose|supposing|assuming|assume)\b|\bunder\s+(?:the\s+)?(?:null|H0|H₀)/i;

/** Whether the phrase at `index` sits in a conditional clause ("if the null hypothesis holds"). */
export function isSupposed(text: string, index: number): boolean {
  return supposition.test(text.slice(clauseStart(text, index), index));
}

/** What follows a phrase to deny it: "a highly significant p-value says nothing about size". */
const denial = /^[^.;,]{0,40}?\b(?:(?:says?|tells?|means?|shows?|implies|indicates?)\s+nothing|(?:does|do|did)\s*(?:not|n['’]t)\s+(?:mean|measure|show|indicate|imply|tell|make|prove)|is\s+not\s+(?:a|an|the)\s+(?:measure|sign|proof))\b/i;

/** Whether the clause after `end` denies the phrase before it. */
export function isDeniedAfter(text: string, end: number): boolean {
  return denial.test(text.slice(end));
}
