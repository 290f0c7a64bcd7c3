/**
 * stet's visual identity for charts, as one vega-lite `config`: quiet ink on
 * white, light horizontal grid only, no frame, one sans-serif font stack whose
 * metrics match the text-width table in `text-metrics.ts`.
 */
import type {Config} from 'vega-lite';

/**
 * Category colours. Derived from the Okabe & Ito (2008) colour-universal-design
 * set: yellow dropped (too light on white), and the others moved within 15° of
 * their hue so that (a) each has at least 3:1 contrast on white (WCAG 2.x
 * non-text contrast, so it survives greyscale print) and (b) every pair stays
 * apart under simulated protanopia, deuteranopia and tritanopia (Machado et
 * al. 2009, severity 1): smallest CIEDE2000 difference 13, against 11 for the
 * original set. `test/charts/theme.test.ts` recomputes both checks.
 */
export const palette = ['#265EA9', '#BE7B24', '#008A60', '#94436B', '#1F96E4', '#6F5E02'] as const;

/** Neutral inks, darkest first. */
export const ink = {
  /** Titles and axis titles. */
  text: '#222222',
  /** Axis labels and legend text. */
  label: '#4A4A4A',
  /** Axis lines and ticks. */
  rule: '#8C8C8C',
  /** Lines joining paired observations: present but behind the data. */
  pair: '#A6A6A6',
  grid: '#E8E8E8',
} as const;

/**
 * Helvetica and its metric-compatible clones (Arial on Windows, Liberation
 * Sans and Nimbus Sans on Linux) before the generic family. Unquoted names
 * are valid CSS and keep the SVG attribute free of escaped quotes.
 */
export const fontStack = 'Helvetica, Arial, Liberation Sans, Nimbus Sans, Nimbus Sans L, sans-serif';

/**
 * Sizes in px. The plotting area is 420 × 230, so with axes and legend a
 * chart is about 480 × 300: the A4 text width (160 mm ≈ 605 px at 96 dpi)
 * holds it at full size.
 */
export const sizes = {
  plotWidth: 420,
  plotHeight: 230,
  label: 11,
  axisTitle: 12,
  title: 13,
  point: 30,
  meanSymbol: 70,
} as const;

/** The vega-lite schema every written `.vl.json` names, so editors can check it. */
export const schema = 'https://vega.github.io/schema/vega-lite/v6.json';

export const stetConfig: Config = {
  font: fontStack,
  background: 'white',
  padding: 8,
  // Per-mark ARIA labels would repeat every data value; the chart as a whole
  // carries a <title> and <desc> instead (render-svg.ts).
  aria: false,
  view: {stroke: null},
  axis: {
    labelFontSize: sizes.label,
    labelColor: ink.label,
    titleFontSize: sizes.axisTitle,
    titleFontWeight: 'normal',
    titleColor: ink.text,
    titlePadding: 10,
    labelPadding: 4,
    domainColor: ink.rule,
    tickColor: ink.rule,
    tickSize: 4,
    gridColor: ink.grid,
    labelFlush: false,
  },
  axisX: {labelAngle: 0, grid: false},
  axisY: {grid: true, domain: false, ticks: false, tickCount: 6},
  axisBand: {ticks: false},
  title: {fontSize: sizes.title, fontWeight: 'bold', color: ink.text, anchor: 'start', offset: 10},
  legend: {
    labelFontSize: sizes.label,
    labelColor: ink.label,
    titleFontSize: sizes.label,
    titleColor: ink.text,
    titleFontWeight: 'normal',
  },
  range: {category: [...palette]},
  mark: {color: palette[0]},
};
