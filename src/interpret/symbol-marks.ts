/**
 * Statistic symbols (t, F, p, r, n) travel through the interpretation as
 * marked text, so one sentence serves every output: Markdown and HTML set
 * the Latin ones in italics when the style asks, JSON gets plain text.
 * The marks are two private-use characters, which no data or phrase uses.
 */
const open = '\uE000';
const close = '\uE001';
const marked = /\uE000([^\uE001]*)\uE001/g;

export interface SentenceSegment {
  readonly text: string;
  /** A statistic symbol: italic in the styles that italicise symbols. */
  readonly symbol?: true;
}

/** `t`, `F`, `p`, `χ²` as a statistic symbol. */
export function symbol(text: string): string {
  return `${open}${text}${close}`;
}

/** Text without marks, for JSON and plain-text consumers. */
export function plainText(text: string): string {
  return text.replace(/[\uE000\uE001]/g, '');
}

/**
 * Segments of marked text. Only symbols that begin with a Latin letter are
 * marked as such: Greek symbols (χ², η², ρ, α) stay upright by convention.
 */
export function segmentsOf(text: string): SentenceSegment[] {
  const segments: SentenceSegment[] = [];
  let last = 0;
  const push = (value: string, isSymbol: boolean) => {
    if (!value) return;
    const previous = segments.at(-1);
    if (!isSymbol && previous && !previous.symbol) segments[segments.length - 1] = {text: previous.text + value};
    else segments.push(isSymbol ? {text: value, symbol: true} : {text: value});
  };
  for (const match of text.matchAll(marked)) {
    push(text.slice(last, match.index), false);
    const value = match[1] ?? '';
    push(value, /^[A-Za-z]/.test(value));
    last = match.index + match[0].length;
  }
  push(text.slice(last), false);
  return segments;
}

/** Segments back into marked text (the inverse of `segmentsOf`). */
export function markedOf(segments: readonly SentenceSegment[]): string {
  return segments.map((segment) => (segment.symbol ? symbol(segment.text) : segment.text)).join('');
}
