import {parseArgs} from 'node:util';
import {outputFormats, type CompileOptions, type OutputFormat} from '../compile-report.js';
import {UsageError} from './command.js';
import {oneReport} from './one-report.js';

/** What `build` and `watch` share: the report and how to compile it. */
export interface BuildArguments {
  readonly report: string;
  readonly options: Pick<CompileOptions, 'out' | 'allowOutside' | 'template' | 'allowHtml' | 'formats'>;
}

/** Parse `REPORT.md [--out DIR] [--to …] [--template FILE] [--allow-html] [--allow-outside]`. */
export function parseBuildArguments(command: string, args: readonly string[]): BuildArguments {
  const {values, positionals} = parseArgs({
    args: [...args],
    allowPositionals: true,
    options: {
      out: {type: 'string'},
      to: {type: 'string'},
      template: {type: 'string'},
      'allow-html': {type: 'boolean'},
      'allow-outside': {type: 'boolean'},
    },
  });
  return {
    report: oneReport(command, positionals),
    options: {
      out: values.out,
      allowOutside: values['allow-outside'],
      template: values.template,
      allowHtml: values['allow-html'],
      formats: values.to === undefined ? undefined : parseFormats(values.to),
    },
  };
}

/** `--to md,html,tex` → the set; an unknown format is a usage error. */
export function parseFormats(list: string): Set<OutputFormat> {
  const formats = new Set<OutputFormat>();
  for (const item of list.split(',').map((part) => part.trim()).filter(Boolean)) {
    if (!(outputFormats as readonly string[]).includes(item)) {
      throw new UsageError(`unknown format \`${item}\` in --to (formats: ${outputFormats.join(', ')})`);
    }
    formats.add(item as OutputFormat);
  }
  if (formats.size === 0) throw new UsageError('--to needs at least one format, e.g. --to html,tex');
  return formats;
}
