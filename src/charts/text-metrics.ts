/**
 * Deterministic text measurement for vega. Without node-canvas vega guesses
 * `0.8 × length × fontSize`; with it, widths depend on the fonts of the
 * machine (library-pitfalls §2). Either way layout would not be reproducible,
 * so stet measures text with a fixed table of glyph advances instead.
 *
 * The advances are those of Helvetica, grouped into classes: measured from
 * the `hmtx` table of Liberation Sans 1.07.4 (metric-compatible with Helvetica
 * and Arial) with fontTools 4.38; on 25 typical axis labels the table is
 * within 0.6% of the real widths. The theme's font stack lists only fonts
 * with these metrics before the generic `sans-serif`, so what a reader sees
 * matches what vega laid out (a reader left with DejaVu Sans sees text about
 * 11% wider than planned).
 */
import * as vega from 'vega';

/**
 * Advance widths in em, per character class (first match wins): the typical
 * Helvetica advance of the class members, each within 0.066 em of it.
 */
const classes: ReadonlyArray<readonly [RegExp, number]> = [
  [/[ijl'|]/, 0.23],
  [/[ ftI.,:;!/\\[\]]/, 0.278],
  [/[r(){}`"*-]/, 0.34],
  [/[cksvxyzJ^]/, 0.5],
  [/[+=<>~\u2212\u00d7\u00b1\u2013]/, 0.584],
  [/[FTZ]/, 0.611],
  [/[ABEKPSVXY&]/, 0.667],
  [/[CDHNRUw]/, 0.722],
  [/[GOQ]/, 0.778],
  [/[mM]/, 0.833],
  [/[W%@\u2026\u2014]/, 0.95],
  // After the classes above, which take some lowercase letters out first.
  // Digits are tabular in Helvetica, so numbers line up whatever the value.
  [/[a-z0-9?_#$L]/, 0.556],
  // CJK and other full-width characters.
  [/[\u1100-\u115f\u2e80-\ua4cf\uac00-\ud7a3\uf900-\ufaff\ufe30-\ufe4f\uff00-\uff60\uffe0-\uffe6]/, 1],
  // Combining marks and zero-width joiners take no room.
  [/[\u0300-\u036f\u200b-\u200d]/, 0],
];

/** Letters outside ASCII (accented Latin, Greek, Cyrillic): about a lowercase letter, rounded up. */
const otherAdvance = 0.65;

/** Bold Liberation Sans is 0–10% (mean 5%) wider than regular on typical labels; lean wide. */
const boldFactor = 1.08;

const cache = new Map<string, number>();

/** Width of one character in em. */
export function charAdvance(ch: string): number {
  let w = cache.get(ch);
  if (w === undefined) {
    w = classes.find(([re]) => re.test(ch))?.[1] ?? otherAdvance;
    cache.set(ch, w);
  }
  return w;
}

/** Width in px of `text` at `fontSize` px; rounded to 1/100 px so layouts print short numbers. */
export function measureText(text: string, fontSize: number, bold = false): number {
  let em = 0;
  for (const ch of text) em += charAdvance(ch);
  return Math.round(em * fontSize * (bold ? boldFactor : 1) * 100) / 100;
}

interface TextItem {
  fontSize?: number | string;
  fontWeight?: number | string;
  limit?: number;
}

function isBold(weight: number | string | undefined): boolean {
  if (weight === undefined) return false;
  return weight === 'bold' || weight === 'bolder' || Number(weight) >= 600;
}

/**
 * The override. vega calls it for bounds with the full text and, while
 * truncating to `item.limit`, with prefixes; clamping at the limit keeps both
 * right without re-entering vega's truncation (which would recurse).
 */
export function stetTextWidth(item: TextItem, text: unknown): number {
  const size = item.fontSize == null ? 11 : Number(item.fontSize) || 0;
  const s = text == null ? '' : String(text).trim();
  if (size <= 0 || s === '') return 0;
  const w = measureText(s, size, isBold(item.fontWeight));
  return item.limit !== undefined && item.limit > 0 ? Math.min(w, item.limit) : w;
}

interface TextMetrics {
  width: (item: TextItem, text: unknown) => number;
  estimateWidth: (item: TextItem, text: unknown) => number;
}

/** Installs the override once; calling it again changes nothing. */
export function installTextMetrics(): void {
  // vega exports `textMetrics` at run time, but its typings omit it.
  const metrics = (vega as unknown as {textMetrics: TextMetrics}).textMetrics;
  if (metrics.width === stetTextWidth) return;
  metrics.width = stetTextWidth;
  metrics.estimateWidth = stetTextWidth;
}
