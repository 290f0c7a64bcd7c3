import {UserError} from '../user-error.js';

/**
 * Decode a data file's bytes: UTF-8 (with or without a byte order mark), or
 * UTF-16 when it starts with a UTF-16 byte order mark (what spreadsheets
 * write as "Unicode text"). The mark is removed. Bytes that are not valid
 * UTF-8 are an error, not replacement characters: a Latin-1 export would
 * otherwise turn `é` into `\uFFFD` silently.
 */
export function decodeText(bytes: Uint8Array, file: string): string {
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder('utf-16le').decode(bytes.subarray(2));
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder('utf-16be').decode(bytes.subarray(2));
  const hasBom = bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf;
  const body = hasBom ? bytes.subarray(3) : bytes;
  try {
    return new TextDecoder('utf-8', {fatal: true, ignoreBOM: true}).decode(body);
  } catch {
    // Locate the first bad byte through the lossy decoding; a genuine U+FFFD
    // earlier in the file would only move the reported place forward.
    const lossy = new TextDecoder('utf-8', {ignoreBOM: true}).decode(body);
    const at = lossy.indexOf('\uFFFD');
    const before = lossy.slice(0, Math.max(at, 0));
    const line = before.split(/\r\n|\r|\n/).length;
    const column = before.length - Math.max(before.lastIndexOf('\n'), before.lastIndexOf('\r'));
    throw new UserError(`${file} is not valid UTF-8 text`, {
      ruleId: 'data-encoding',
      file,
      place: {line, column},
      hint: 'save the file as "CSV UTF-8" (spreadsheets) or convert it, e.g. iconv -f latin1 -t utf-8',
    });
  }
}
