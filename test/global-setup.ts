import {execFileSync} from 'node:child_process';

/** Compile once, so tests that run the real `stet` binary run current code. */
export default function setup(): void {
  const root = new URL('..', import.meta.url).pathname;
  execFileSync(process.execPath, [`${root}node_modules/typescript/bin/tsc`, '-p', `${root}tsconfig.json`], {stdio: 'inherit'});
}
