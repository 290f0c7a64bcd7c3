import path from 'node:path';
import type {VFile} from 'vfile';
import {UserError} from '../user-error.js';

/**
 * Put an author's mistake on the file as an error message (fatal, so the
 * build writes nothing) with its place, rule id and hint. Anything that is
 * not a UserError is a bug in stet and is rethrown.
 */
export function reportError(file: VFile, error: unknown): void {
  if (!(error instanceof UserError)) throw error;
  const message = file.message(error.message, {
    ruleId: error.ruleId,
    source: 'stet',
    ...(error.place ? {place: error.place} : {}),
  });
  message.fatal = true;
  if (error.hint) message.note = error.hint;
  // Data files are named relative to the report; print them as openable paths.
  if (error.file) message.file = path.join(file.dirname ?? '', error.file);
}
