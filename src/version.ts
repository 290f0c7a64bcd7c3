import {readFileSync} from 'node:fs';

/** stet's version, from its package.json (one source of truth). */
export const version: string = (
  JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as {version: string}
).version;
