import {oneSampleT} from './one-sample-t.js';
import {pairedT} from './paired-t.js';
import {studentT} from './student-t.js';
import type {Design, MethodDefinition} from './types.js';
import {welchT} from './welch-t.js';

/**
 * Every test a block may declare, by id. `describe` is not a test and is
 * handled by the block stage. Adding a method: one file, one line here.
 */
const definitions = [register(oneSampleT), register(pairedT), register(studentT), register(welchT)];

export const methods: ReadonlyMap<string, MethodDefinition<Design>> = new Map(
  definitions.map((definition) => [definition.id, definition]),
);

/** The design stage hands each method the design kind it declares. */
function register<D extends Design>(definition: MethodDefinition<D>): MethodDefinition<Design> {
  return definition as unknown as MethodDefinition<Design>;
}

/** Every id a block's `test:` accepts, for validation and hints. */
export const methodIds: readonly string[] = ['describe', ...methods.keys()];
