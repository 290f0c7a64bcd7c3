import type {PhrasingContent} from 'mdast';
import {segmentsOf} from '../interpret/symbol-marks.js';

/**
 * mdast phrasing for text with marked statistic symbols: Latin symbols in
 * emphasis when the style italicises them, plain text otherwise.
 */
export function markedPhrasing(marked: string, italicSymbols: boolean): PhrasingContent[] {
  const segments = segmentsOf(marked);
  if (!italicSymbols) return [{type: 'text', value: segments.map((segment) => segment.text).join('')}];
  return segments.map((segment) =>
    segment.symbol ? {type: 'emphasis', children: [{type: 'text', value: segment.text}]} : {type: 'text', value: segment.text},
  );
}
