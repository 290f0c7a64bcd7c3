/**
 * Text from data and results as LaTeX that compiles with pdflatex and a
 * plain TeX Live (no packages beyond the kernel): the ten special
 * characters become commands, the Unicode stet itself writes (χ², −, ±,
 * en dash, …) becomes the usual LaTeX, accented Latin letters become
 * accent commands, and anything else becomes a visible `[U+XXXX]` rather
 * than a character pdflatex cannot typeset. Control characters and line
 * breaks become spaces, so a value never ends a paragraph or a table row.
 */
export function escapeLatex(text: string): string {
  let out = '';
  for (const char of text.normalize('NFC')) out += escapeChar(char);
  return out;
}

const specials: Record<string, string> = {
  '\\': '\\textbackslash{}',
  '{': '\\{',
  '}': '\\}',
  '#': '\\#',
  $: '\\$',
  '%': '\\%',
  '&': '\\&',
  _: '\\_',
  '^': '\\textasciicircum{}',
  '~': '\\textasciitilde{}',
  // OT1 (the default font encoding) prints these as other glyphs in text.
  '<': '\\textless{}',
  '>': '\\textgreater{}',
  '|': '\\textbar{}',
  '"': "''",
  // Ligatures (`--`, `?``, `!``) and the kerning of quotes are broken up.
  '-': '-{}',
  '`': '\\`{}',
  "'": "'{}",
};

/** Unicode stet's wording and number formatting use, and common neighbours. */
const unicode: Record<string, string> = {
  '\u2212': '\\ensuremath{-}', // minus sign
  '\u2013': '--', // en dash
  '\u2014': '---', // em dash
  '\u2018': '`',
  '\u2019': "'",
  '\u201c': '``',
  '\u201d': "''",
  '\u2026': '\\ldots{}',
  '\u00a0': '~',
  '\u00b1': '\\ensuremath{\\pm}',
  '\u00d7': '\\ensuremath{\\times}',
  '\u00b7': '\\ensuremath{\\cdot}',
  '\u00b0': '\\ensuremath{^\\circ}',
  '\u00a7': '\\ensuremath{\\S}',
  '\u00b2': '\\ensuremath{^2}',
  '\u00b3': '\\ensuremath{^3}',
  '\u2080': '\\ensuremath{_0}',
  '\u2081': '\\ensuremath{_1}',
  '\u2082': '\\ensuremath{_2}',
  '\u221e': '\\ensuremath{\\infty}',
  '\u2264': '\\ensuremath{\\le}',
  '\u2265': '\\ensuremath{\\ge}',
  '\u2260': '\\ensuremath{\\ne}',
  '\u2248': '\\ensuremath{\\approx}',
  '\u03b1': '\\ensuremath{\\alpha}',
  '\u03b2': '\\ensuremath{\\beta}',
  '\u03b5': '\\ensuremath{\\varepsilon}',
  '\u03b7': '\\ensuremath{\\eta}',
  '\u03bc': '\\ensuremath{\\mu}',
  '\u00b5': '\\ensuremath{\\mu}',
  '\u03c0': '\\ensuremath{\\pi}',
  '\u03c1': '\\ensuremath{\\rho}',
  '\u03c3': '\\ensuremath{\\sigma}',
  '\u03c4': '\\ensuremath{\\tau}',
  '\u03c7': '\\ensuremath{\\chi}',
  '\u03c9': '\\ensuremath{\\omega}',
  '\u00df': '{\\ss}',
  '\u00e6': '{\\ae}',
  '\u00c6': '{\\AE}',
  '\u00f8': '{\\o}',
  '\u00d8': '{\\O}',
  '\u0142': '{\\l}',
  '\u0141': '{\\L}',
  '\u00e5': '{\\aa}',
  '\u00c5': '{\\AA}',
  '\u0131': '{\\i}',
};

/** Combining marks of decomposed Latin letters and their accent commands. */
const accents: Record<string, string> = {
  '\u0300': '`',
  '\u0301': "'",
  '\u0302': '^',
  '\u0303': '~',
  '\u0304': '=',
  '\u0306': 'u',
  '\u0307': '.',
  '\u0308': '"',
  '\u030a': 'r',
  '\u030b': 'H',
  '\u030c': 'v',
  '\u0327': 'c',
};

function escapeChar(char: string): string {
  const code = char.codePointAt(0)!;
  if (code < 0x20 || code === 0x7f) return ' ';
  const special = specials[char];
  if (special !== undefined) return special;
  if (code < 0x7f) return char;
  const known = unicode[char];
  if (known !== undefined) return known;
  const accented = accentCommand(char);
  if (accented !== undefined) return accented;
  return `[U+${code.toString(16).toUpperCase().padStart(4, '0')}]`;
}

/** `é` → `\'{e}`: one ASCII letter and one known combining mark. */
function accentCommand(char: string): string | undefined {
  const [base, mark, ...rest] = char.normalize('NFD');
  if (base === undefined || mark === undefined || rest.length > 0 || !/^[A-Za-z]$/.test(base)) return undefined;
  const accent = accents[mark];
  if (accent === undefined) return undefined;
  // Dotless i and j under accents, as LaTeX expects.
  const letter = base === 'i' ? '\\i' : base === 'j' ? '\\j' : base;
  return `\\${accent}{${letter}}`;
}
