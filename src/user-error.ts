/**
 * A mistake in an author's document or data: shown as
 * `file:line:column: message` with a hint, never as a stack trace.
 * Programmer misuse of the API throws ordinary errors instead.
 */
export interface Place {
  /** 1-based line. */
  line: number;
  /** 1-based column. */
  column: number;
}

export interface UserErrorOptions {
  /** File the place refers to, when it is not the report itself (a CSV file). */
  file?: string;
  place?: Place;
  /** What the author can do about it. */
  hint?: string;
  /** Stable identifier of the kind of problem, e.g. `unknown-column`. */
  ruleId: string;
}

export class UserError extends Error {
  readonly file: string | undefined;
  readonly place: Place | undefined;
  readonly hint: string | undefined;
  readonly ruleId: string;

  constructor(message: string, options: UserErrorOptions) {
    super(message);
    this.name = 'UserError';
    this.file = options.file;
    this.place = options.place;
    this.hint = options.hint;
    this.ruleId = options.ruleId;
  }
}

export function isUserError(value: unknown): value is UserError {
  return value instanceof UserError;
}
