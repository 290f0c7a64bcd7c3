import {sha256} from '../spec/spec-fingerprint.js';

/** A ```stet (or ~~~stet) fence through its closing fence of the same kind and length or more. */
const stetBlock = /^ {0,3}(`{3,}|~{3,})[ \t]*stet\b[^\n]*\n[\s\S]*?^ {0,3}\1[`~]*[ \t]*$/gm;

/**
 * sha256 of the report with its ```stet blocks cut out: the prose and front
 * matter. Lets `check` say "the prose changed" apart from "a block changed".
 */
export function proseHash(report: string): string {
  return sha256(report.replace(/\r\n?/g, '\n').replace(stetBlock, '```stet```'));
}
