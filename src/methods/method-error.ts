/**
 * Data that make a method impossible to compute (a constant sample, a table
 * with an empty row, too few observations for an exact distribution). The
 * block stage turns it into a positioned error for the author, so the
 * message names the problem in the author's terms and the hint what to do.
 * One failure contract for every method.
 */
export class MethodError extends Error {
  readonly hint: string;

  constructor(message: string, hint: string) {
    super(message);
    this.name = 'MethodError';
    this.hint = hint;
  }
}
