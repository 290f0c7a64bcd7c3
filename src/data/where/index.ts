/**
 * The `where` row-filter language: parse once, check the columns, evaluate
 * against a dataset. Nothing in it executes code.
 */
export type {WhereExpression, WhereNode} from './ast.js';
export {evaluateWhere} from './evaluate.js';
export {parseWhere} from './parse.js';
export {WhereError} from './where-error.js';
export {whereColumns} from './where-columns.js';
