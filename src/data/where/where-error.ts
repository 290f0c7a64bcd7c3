import {UserError} from '../../user-error.js';

/**
 * A mistake in a `where` expression. `place` is relative to the expression
 * text: line 1 and column `offset + 1` for a one-line expression (lines are
 * counted if the YAML value spans several). The caller maps it onto the
 * document; `offset` (0-based, UTF-16 code units into the expression text)
 * and `length` (of the offending text, 0 at the end of input) make that
 * mapping exact for quoted and block YAML scalars alike.
 */
export class WhereError extends UserError {
  readonly offset: number;
  readonly length: number;

  constructor(message: string, source: string, offset: number, length: number, ruleId: string, hint?: string) {
    super(message, {ruleId, place: placeIn(source, offset), ...(hint === undefined ? {} : {hint})});
    this.name = 'WhereError';
    this.offset = offset;
    this.length = length;
  }
}

function placeIn(source: string, offset: number): {line: number; column: number} {
  const before = source.slice(0, offset);
  const breaks = before.match(/\r\n|\r|\n/g);
  const lineStart = Math.max(before.lastIndexOf('\n'), before.lastIndexOf('\r')) + 1;
  return {line: (breaks?.length ?? 0) + 1, column: offset - lineStart + 1};
}
