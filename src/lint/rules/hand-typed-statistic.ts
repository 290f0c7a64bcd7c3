import {suggestReference, type StatisticKind} from '../result-values.js';
import type {LintRule, SentenceFinding} from '../types.js';
import {hits} from '../wording-scan.js';

const number = String.raw`[−-]?(?:\d+(?:\.\d+)?|\.\d+)(?:e[−-]?\d+)?`;
const relation = String.raw`(?:<=|>=|=|<|>|≤|≥|≈)`;
/** A number followed by a unit is a measurement (`t = 2.5 h`), not a statistic. */
const unitAfter = /^\s?(?:s|ms|h|hrs?|min|d|days?|hours?|weeks?|months?|years?|°C|K|mm|cm|m|km|kg|g|MPa|kN|N|%)(?![\w])/;

interface Shape {
  readonly kind: StatisticKind;
  readonly pattern: RegExp;
  readonly what: string;
  /** Whether this match really is a statistic (the groups of `pattern`). */
  readonly accept: (match: RegExpMatchArray) => boolean;
}

const hasDecimal = (text: string | undefined) => text !== undefined && /\./.test(text);
const withinOne = (text: string | undefined) => Math.abs(Number(text?.replace('−', '-'))) <= 1;

const shapes: readonly Shape[] = [
  {
    kind: 'p',
    what: 'p-value',
    pattern: new RegExp(String.raw`(?<![\w.])[pP](?:[- ]?values?)?\s*(?:(${relation})|\b(?:was|were|is|of|equals|equalled|came to|stood at|reached)\s+(?:(?:just\s+|well\s+)?(?:above|below|under|over|less than|greater than|smaller than|larger than)\s+)?(?:about\s+|around\s+|roughly\s+)?|(?<=[Vv]alues?\s*)[:(]?)\s*(${number})`),
    accept: (match) => withinOne(match[2]),
  },
  {
    // "a significance of 0.003" reports a p-value; "at a significance (level) of 0.05" is alpha.
    kind: 'p',
    what: 'p-value',
    pattern: new RegExp(String.raw`(?<!\bat\s+(?:a\s+|the\s+)?(?:statistical\s+)?)\b(?:[Ss]ignificance|[Ss]ig\.)\s+(?:of|was|is|=|:)\s*()(${number})`),
    accept: (match) => withinOne(match[2]),
  },
  {
    kind: 'statistic',
    what: 'test statistic',
    pattern: new RegExp(String.raw`(?<![\w.])(t|F|z|U|W|H|χ²|χ2|X²|chi2|chi²|chi-squared?)\s*(\([^()]{1,30}\))?\s*(${relation})\s*(${number})`),
    accept: (match) => /^(?:χ|X|chi)/.test(match[1]!) || match[2] !== undefined || hasDecimal(match[4]),
  },
  {
    // "a t statistic of 2.31", "the chi-square value was 5.1".
    kind: 'statistic',
    what: 'test statistic',
    pattern: new RegExp(String.raw`\b(?:(?:t|F|z|U|W|H)[- ](?:statistic|value|ratio|score)|[Cc]hi[- ]squared?(?:\s+(?:statistic|value))?|[Tt]est statistic)\s*(?:[:=]\s*|\s(?:of|was|is|equals|equalled|came to|reached)\s+)(?:about\s+|around\s+)?()()(${number})`),
    accept: (match) => hasDecimal(match[3]),
  },
  {
    kind: 'effect',
    what: 'effect size',
    pattern: new RegExp(String.raw`(?<![\w.'’])(r|ρ|rho|τ|tau|R²|R2|r²|d|g|η²|ηp²|ω²|ε²|φ|V|h)\s*(\(\d+\))?\s*(${relation})\s*(${number})`),
    accept: (match) => hasDecimal(match[4]) && (!/^(?:r|ρ|rho|τ|tau|φ|V)$/.test(match[1]!) || withinOne(match[4])),
  },
  {
    kind: 'effect',
    what: 'effect size',
    // "the correlation between A and B was −0.41", "odds ratio 2.4".
    pattern: new RegExp(String.raw`\b(?:Cohen['’]s d|Hedges['’]s? g|[Ee]ffect size|[Cc]orrelation(?: coefficient)?|Pearson['’]s r|Spearman['’]s rho|(?:[Oo]dds|[Rr]isk|[Hh]azard|[Rr]ate) ratio)(?:\s+(?:between|of|for)\s+[^.;,()=<>]{1,40}?)?(?:\s*[:=]\s*|\s+(?:(?:of|was|were|is|equals|equalled|came to|reached)\s+)?)(?:about\s+|around\s+|roughly\s+)?()()(${number})`),
    accept: (match) => hasDecimal(match[3]),
  },
  {
    kind: 'interval',
    what: 'confidence interval',
    pattern: new RegExp(String.raw`\b(?:CI|[Cc]onfidence [Ii]nterval)\b\s*(?:[:=]\s*|(?:[a-z]+\s+){0,3}?(?:of|from|was|is|between)\s+)?[\[(]?\s*(${number})\s*%?\s*(?:,|;|to|and|–|—|-)\s*(${number})\s*%?\s*[\])]?`),
    accept: () => true,
  },
];

export const handTypedStatistic: LintRule = {
  id: 'hand-typed-statistic',
  severity: 'warning',
  explanation: 'a statistic typed by hand can drift from the data; a `{{}}` reference cannot',
  suggestion: 'Write a reference such as `{{ID.p}}` or `{{ID}}`; stet fills in the value at build time.',
  checkSentence(sentence, context) {
    const findings: SentenceFinding[] = [];
    const taken: Array<[number, number]> = [];
    for (const shape of shapes) {
      for (const hit of hits(sentence.masked, shape.pattern, true)) {
        const {match} = hit;
        if (!shape.accept(match) || (shape.kind !== 'interval' && unitAfter.test(sentence.masked.slice(hit.end)))) continue;
        if (taken.some(([start, end]) => hit.start < end && start < hit.end)) continue;
        // A closing bracket belongs to the interval only when it opened one.
        const end = /[\])]$/.test(match[0]) && !/[\[(]/.test(match[0]) ? hit.end - 1 : hit.end;
        taken.push([hit.start, end]);
        const typed = shape.kind === 'interval' ? [match[1]!, match[2]!] : [match.at(-1)!];
        const rel = shape.kind === 'interval' ? '=' : (match[shape.kind === 'p' ? 1 : 3] ?? '=');
        const {reference, matched} = suggestReference(shape.kind, typed, rel, sentence, context);
        const written = sentence.text.slice(hit.start, end);
        findings.push({
          start: hit.start,
          end,
          message: `hand-typed ${shape.what} \`${written}\` does not come from a block result and could drift from the data`,
          suggestion: matched
            ? `Write \`${reference}\` instead: that block's result has this value, and stet fills it in at build time.`
            : `Write a reference such as \`${reference}\` instead; stet fills in the value at build time.`,
        });
      }
    }
    return findings.sort((a, b) => a.start - b.start);
  },
};
