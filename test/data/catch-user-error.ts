import {expect} from 'vitest';
import {UserError} from '../../src/user-error.js';

/** The UserError that `run` throws or rejects with; fails the test if it throws nothing or something else. */
export async function catchUserError(run: () => unknown): Promise<UserError> {
  try {
    await run();
  } catch (error) {
    expect(error).toBeInstanceOf(UserError);
    return error as UserError;
  }
  return expect.unreachable('expected a UserError');
}
