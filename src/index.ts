/**
 * stet: compile Markdown reports whose statistics are declared, not typed.
 *
 * `remarkStet` is the unified plugin; `buildReport` is the whole build that
 * `stet build` runs.
 */
export {default as remarkStet} from './remark-stet.js';
export type {RemarkStetOptions, StetData} from './remark-stet.js';
export {buildReport} from './build-report.js';
export type {BuildOptions, BuildResult} from './build-report.js';
export type {BlockResult} from './compute/block-result.js';
export {UserError} from './user-error.js';
export {compileReport, outputFormats} from './compile-report.js';
export type {CompileOptions, CompiledReport, OutputFormat} from './compile-report.js';
export {lintReport, lintSource} from './lint/lint-report.js';
export {lintRules} from './lint/rules/index.js';
export type {LintRule} from './lint/types.js';
