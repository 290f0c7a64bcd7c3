import type {Command} from '../command.js';
import {buildCommand} from './build.js';
import {checkCommand} from './check.js';
import {lintCommand} from './lint.js';
import {lockCommand} from './lock.js';
import {watchCommand} from './watch.js';

/** Every `stet COMMAND`, in the order `--help` lists them. */
export const commands: ReadonlyMap<string, Command> = new Map([
  ['build', buildCommand],
  ['check', checkCommand],
  ['lint', lintCommand],
  ['lock', lockCommand],
  ['watch', watchCommand],
]);
