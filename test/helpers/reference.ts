import {readFileSync} from 'node:fs';
import path from 'node:path';

/**
 * Readers for the shared reference material beside the repository:
 * `../shared/reference/examples/*.json` (published worked examples) and
 * `../shared/reference/nist-strd/*.dat` (NIST StRD, certified values).
 */
const root = path.resolve(new URL('../..', import.meta.url).pathname, '../shared/reference');

export function example<T = Record<string, unknown>>(file: string): T {
  return JSON.parse(readFileSync(path.join(root, 'examples', file), 'utf8')) as T;
}

export interface NistUnivariate {
  /** The data as printed, one number per line. */
  readonly texts: readonly string[];
  /** Certified lag-1 autocorrelation r(1). */
  readonly lag1: number;
  /** The same read as the nearest doubles. */
  readonly values: Float64Array;
  readonly mean: number;
  readonly sd: number;
}

/** A NIST StRD univariate file: data below `Data: Y`, certified ybar and s. */
export function nistUnivariate(name: string): NistUnivariate {
  const lines = readFileSync(path.join(root, 'nist-strd', `${name}.dat`), 'latin1').split(/\r?\n/);
  const certified = (label: RegExp) => {
    const line = lines.find((l) => label.test(l));
    if (!line) throw new Error(`${name}: no certified value for ${label}`);
    return Number(/:\s*(-?[\d.Ee+-]+)/.exec(line.slice(line.search(label)))![1]);
  };
  const start = lines.findIndex((l) => /^Data:\s+Y/.test(l)) + 2;
  const texts = lines.slice(start).map((l) => l.trim()).filter(Boolean);
  return {texts, values: Float64Array.from(texts, Number), mean: certified(/ybar:/), sd: certified(/\s s:/), lag1: certified(/r\(1\):/)};
}
