import type {Command} from '../command.js';

/**
 * Every `stet COMMAND`, in the order `--help` lists them. A command's module
 * is loaded only when it runs, so `stet --help` (and `stet check` on fresh
 * output) start without loading the compiler.
 */
export const commands: ReadonlyMap<string, Command> = new Map<string, Command>([
  ['build', {
    usage: 'build REPORT.md [--out DIR] [--to md,html,json,tex] [--template FILE] [--allow-html] [--allow-outside]',
    summary: 'run every ```stet block on its data and write the outputs',
    load: async () => (await import('./build.js')).run,
  }],
  ['check', {
    usage: 'check REPORT.md [--out DIR] [--allow-outside]',
    summary: 'exit 1 if the built output is stale against the report, its data or a hand edit',
    load: async () => (await import('./check.js')).run,
  }],
  ['lint', {
    usage: 'lint REPORT.md [--format text|json] [--allow-outside]',
    summary: 'check the prose for hand-typed numbers, misread results and contradictions',
    load: async () => (await import('./lint.js')).run,
  }],
  ['lock', {
    usage: 'lock REPORT.md [--show] [--force]',
    summary: "record each test block's hypothesis in stet.lock; builds then label blocks confirmatory or exploratory",
    load: async () => (await import('./lock.js')).run,
  }],
  ['watch', {
    usage: 'watch REPORT.md [--out DIR] [--serve [PORT]] [--to FORMATS] [--template FILE] [--allow-html] [--allow-outside]',
    summary: 'build, then rebuild whenever the report, its data or the templates change',
    load: async () => (await import('./watch.js')).run,
  }],
]);
