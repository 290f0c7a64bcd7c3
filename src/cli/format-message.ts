import type {VFileMessage} from 'vfile-message';
import type {UserError} from '../user-error.js';

/**
 * `file:line:column: severity: message [rule]` then the hint, indented; the
 * form editors and CI logs turn into links. Colour only when asked.
 */
export interface Paint {
  readonly error: (text: string) => string;
  readonly warning: (text: string) => string;
  readonly dim: (text: string) => string;
}

export const noPaint: Paint = {error: (t) => t, warning: (t) => t, dim: (t) => t};

export const ansiPaint: Paint = {
  error: (t) => `\u001b[31m${t}\u001b[39m`,
  warning: (t) => `\u001b[33m${t}\u001b[39m`,
  dim: (t) => `\u001b[2m${t}\u001b[22m`,
};

export function formatMessage(message: VFileMessage, paint: Paint): string {
  const where = `${message.file}:${message.line ?? 1}:${message.column ?? 1}`;
  const severity = message.fatal ? paint.error('error') : paint.warning('warning');
  const rule = message.ruleId ? paint.dim(` [${message.ruleId}]`) : '';
  const hint = message.note ? `\n  ${paint.dim('hint:')} ${message.note}` : '';
  return `${where}: ${severity}: ${message.reason}${rule}${hint}`;
}

export function formatUserError(error: UserError, fallbackFile: string, paint: Paint): string {
  const where = `${error.file ?? fallbackFile}:${error.place?.line ?? 1}:${error.place?.column ?? 1}`;
  const hint = error.hint ? `\n  ${paint.dim('hint:')} ${error.hint}` : '';
  return `${where}: ${paint.error('error')}: ${error.message}${paint.dim(` [${error.ruleId}]`)}${hint}`;
}
