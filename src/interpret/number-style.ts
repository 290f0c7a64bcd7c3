/**
 * Number conventions a report may choose with `style:` in its front matter.
 * Names are stet's own; each style is a small table of choices, so adding
 * one is a few lines here and a line in the README.
 *
 * - `science` (default): the reporting style common in the social and life
 *   sciences: no leading zero on quantities bounded by 1 (p, correlations,
 *   proportions), comma thousands separators, italic Latin statistic
 *   symbols (t, F, p, r) in Markdown and HTML.
 * - `engineering`: leading zeros everywhere (`p = 0.010`, `r = 0.45`),
 *   upright symbols, and a narrow no-break space between thousands
 *   (`12 345.6`), as engineering reports commonly print them.
 */
export const styleNames = ['science', 'engineering'] as const;
export type StyleName = (typeof styleNames)[number];

export interface NumberStyle {
  readonly name: StyleName;
  /** Print `.45` rather than `0.45` for quantities bounded by 1 in magnitude. */
  readonly dropBoundedZero: boolean;
  /** Italic Latin statistic symbols in Markdown and HTML (plain in JSON). */
  readonly italicSymbols: boolean;
  /** Between groups of three digits. */
  readonly thousandsSeparator: string;
  /** Group integer parts with at least this many digits (5: from 10,000). */
  readonly groupFromDigits: number;
}

export const numberStyles: Readonly<Record<StyleName, NumberStyle>> = {
  science: {name: 'science', dropBoundedZero: true, italicSymbols: true, thousandsSeparator: ',', groupFromDigits: 5},
  engineering: {name: 'engineering', dropBoundedZero: false, italicSymbols: false, thousandsSeparator: '\u202f', groupFromDigits: 5},
};

export const defaultStyle: NumberStyle = numberStyles.science;

export function styleNamed(name: StyleName | undefined): NumberStyle {
  return name === undefined ? defaultStyle : numberStyles[name];
}
