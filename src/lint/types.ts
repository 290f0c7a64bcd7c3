import type {InterpretedBlock} from '../interpret/result-record.js';
import type {BlockSpec} from '../spec/block-spec.js';
import type {DocumentSettings} from '../spec/parse-settings.js';
import type {Place} from '../user-error.js';

export type LintSeverity = 'warning' | 'error';

/** A `{{id.path}}` written in prose, by offset in its sentence. */
export interface ProseReference {
  readonly id: string;
  readonly path: readonly string[];
  readonly start: number;
  readonly end: number;
}

/**
 * One sentence of the author's prose. `masked` has the same length as
 * `text`, with references, quoted phrases and inline code blanked out (`#`),
 * so rules never read numbers stet fills in or words the author only mentions.
 */
export interface ProseSentence {
  readonly text: string;
  readonly masked: string;
  readonly references: readonly ProseReference[];
  /** Blocks the sentence speaks about: referenced ids, or the block that wrote it. */
  readonly blockIds: readonly string[];
  /** Report position of a character of `text`. */
  readonly placeOf: (offset: number) => Place;
  /** Rule ids switched off here by `<!-- stet-lint-disable … -->`. */
  readonly disabled: ReadonlySet<string>;
}

/** What rules may read about the document and its computed results. */
export interface LintContext {
  readonly settings: DocumentSettings;
  readonly blocks: ReadonlyMap<string, InterpretedBlock>;
  /** Block specs in document order. */
  readonly specs: readonly BlockSpec[];
  /** The report's source text, for rules that read YAML comments. */
  readonly source: string;
}

/** A finding inside a sentence (offsets into `text`). */
export interface SentenceFinding {
  readonly start: number;
  readonly end: number;
  readonly message: string;
  /** A rewrite; the rule's general suggestion when absent. */
  readonly suggestion?: string;
}

/** A finding about the document as a whole, at a place. */
export interface DocumentFinding {
  readonly place: Place;
  readonly message: string;
  readonly suggestion?: string;
}

/** One lint rule: its own file under `src/lint/rules/`. */
export interface LintRule {
  /** Stable kebab-case id, printed in brackets and used in `lint: {off: […]}`. */
  readonly id: string;
  readonly severity: LintSeverity;
  /** One line: what is wrong with the flagged wording. */
  readonly explanation: string;
  /** The general rewrite, printed as the hint. */
  readonly suggestion: string;
  readonly checkSentence?: (sentence: ProseSentence, context: LintContext) => readonly SentenceFinding[];
  readonly checkDocument?: (context: LintContext) => readonly DocumentFinding[];
}
