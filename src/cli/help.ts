import {commands} from './commands/index.js';

/** Text of `stet --help`, listing every command from the registry. */
export function helpText(): string {
  const list = [...commands].map(([name, command]) => `  ${name.padEnd(8)} ${command.summary}`).join('\n');
  const usages = [...commands.values()].map((command) => `  stet ${command.usage}`).join('\n');
  return `stet — compile a Markdown report whose statistics are declared, not typed

Usage:
${usages}
  stet --help
  stet --version

Commands:
${list}

Outputs (DIR defaults to out/ beside the report): DIR/NAME.md, DIR/NAME.html,
DIR/NAME.results.json, DIR/NAME.appendix.md, DIR/NAME.appendix.html,
DIR/charts/ID.svg and DIR/tables/ID.csv; with tex also DIR/tables/ID.tex and
DIR/NAME.values.tex.

Options:
  --out DIR          output folder
  --to FORMATS       comma-separated: md, html, json, tex (default md,html,json)
  --template FILE    HTML template with <!--stet:body--> and <!--stet:caution--> slots
  --allow-html       keep the report's raw HTML as written (default: sanitised)
  --allow-outside    allow data files outside the report's folder
  --show             lock: print the locked plan and the report's differences
  --force            lock: replace a lock the report differs from
  --serve [PORT]     watch: serve the output on 127.0.0.1 with live reload
                     (default port 4817; 0 picks a free one)
  -h, --help         show this help
  -v, --version      show stet's version

Exit codes: 0 success; 1 the report or its data has errors (nothing written),
or check found the output stale; 2 the command line is wrong.
Set NO_COLOR to turn colour off; colour is only used on a terminal.
`;
}
