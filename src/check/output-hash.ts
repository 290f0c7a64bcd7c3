import {sha256} from '../spec/spec-fingerprint.js';

/** The build time in the HTML provenance footer: the one part that differs between identical builds. */
const builtAt = /<time datetime="[^"]*">[^<]*<\/time>/g;

export function withoutBuildTime(content: string): string {
  return content.replace(builtAt, '<time></time>');
}

/**
 * sha256 of an output file as the build record keeps it: without the build
 * time, so identical builds leave identical records (an edit of the time
 * alone goes unnoticed, and changes nothing a reader relies on).
 */
export function outputHash(content: string): string {
  return sha256(withoutBuildTime(content));
}
