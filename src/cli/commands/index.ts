import type {Command} from '../command.js';
import {buildCommand} from './build.js';
import {lintCommand} from './lint.js';

/** Every `stet COMMAND`, in the order `--help` lists them. */
export const commands: ReadonlyMap<string, Command> = new Map([
  ['build', buildCommand],
  ['lint', lintCommand],
]);
