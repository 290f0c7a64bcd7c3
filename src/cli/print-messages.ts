import type {VFileMessage} from 'vfile-message';
import type {CliIo} from './command.js';
import {formatMessage, type Paint} from './format-message.js';

/**
 * Print a compilation's messages to stderr, then a count of errors.
 * Returns false when there was any error.
 */
export function printMessages(messages: readonly VFileMessage[], io: CliIo, paint: Paint): boolean {
  for (const message of messages) io.stderr(`${formatMessage(message, paint)}\n`);
  const errors = messages.filter((message) => message.fatal).length;
  if (errors > 0) io.stderr(`${paint.error(`${errors} error${errors === 1 ? '' : 's'}`)}; `);
  return errors === 0;
}
