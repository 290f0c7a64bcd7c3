import {describe, expect, it} from 'vitest';
import {parseSettings} from '../../src/spec/parse-settings.js';
import {UserError} from '../../src/user-error.js';

const origin = {line: 2, column: 1};

describe('style', () => {
  it('defaults to science and accepts engineering', () => {
    expect(parseSettings('title: A', origin).style).toBe('science');
    expect(parseSettings('stet:\n  style: engineering', origin).style).toBe('engineering');
  });

  it('rejects an unknown style with a did-you-mean at its place', () => {
    let error: unknown;
    try {
      parseSettings('stet:\n  style: enginering', origin);
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(UserError);
    const userError = error as UserError;
    expect(userError.message).toBe('unknown style `enginering`');
    expect(userError.ruleId).toBe('invalid-value');
    expect(userError.hint).toMatch(/Did you mean `engineering`\?/);
    expect(userError.place?.line).toBe(3);
  });
});
