/** Text of `stet --help`. */
export const helpText = `stet — compile a Markdown report whose statistics are declared, not typed

Usage:
  stet build REPORT.md [--out DIR] [--allow-outside]
  stet --help
  stet --version

Commands:
  build    run every \`\`\`stet block of REPORT.md on its data and write
           DIR/NAME.md, DIR/NAME.html, DIR/NAME.results.json and
           DIR/charts/ID.svg (DIR defaults to out/ beside the report)

Options:
  --out DIR          output folder
  --allow-outside    allow data files outside the report's folder
  -h, --help         show this help
  -v, --version      show stet's version

Exit codes: 0 built; 1 the report or its data has errors (nothing written);
2 the command line is wrong.
Set NO_COLOR to turn colour off; colour is only used on a terminal.
`;
