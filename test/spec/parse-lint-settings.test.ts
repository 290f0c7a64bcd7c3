import {describe, expect, it} from 'vitest';
import {parseSettings} from '../../src/spec/parse-settings.js';
import {UserError} from '../../src/user-error.js';

const origin = {line: 2, column: 1};

describe('lint settings in the front matter', () => {
  it('reads the rules switched off, as a list or a single id', () => {
    expect([...parseSettings('stet:\n  lint: {off: [accept-null, observed-power]}\n', origin).lintOff]).toEqual(['accept-null', 'observed-power']);
    expect([...parseSettings('stet:\n  lint:\n    off: near-significance\n', origin).lintOff]).toEqual(['near-significance']);
    expect(parseSettings('title: x\n', origin).lintOff.size).toBe(0);
  });

  it('refuses unknown rule ids and keys with a suggestion and a place', () => {
    const error = catchError(() => parseSettings('stet:\n  lint: {off: [observed-powr]}\n', origin));
    expect(error).toMatchObject({ruleId: 'unknown-lint-rule', place: {line: 3, column: 16}});
    expect(error.hint).toMatch(/^Did you mean `observed-power`\?/);
    expect(catchError(() => parseSettings('stet:\n  lint: {of: [accept-null]}\n', origin))).toMatchObject({ruleId: 'unknown-setting'});
  });
});

function catchError(run: () => unknown): UserError {
  try {
    run();
  } catch (error) {
    if (error instanceof UserError) return error;
    throw error;
  }
  throw new Error('expected a UserError');
}
