import {createHash} from 'node:crypto';
import {readdir, readFile} from 'node:fs/promises';
import {basename, dirname, resolve} from 'node:path';
import {UserError} from '../user-error.js';
import type {Column, Dataset} from './column.js';
import type {DatasetOptions} from './dataset-options.js';
import {decodeText} from './decode-text.js';
import {inferTypes} from './infer-types.js';
import {readCsv} from './read-csv.js';
import {resolveDelimiter} from './resolve-delimiter.js';

/**
 * Load one dataset:
 *
 *   bytes ─┬─ sha256 ──────────────────────────────────────┐
 *          └─ decode ─ delimiter ─ readCsv ─ inferTypes ─ Dataset
 *
 * `options.file` resolves against `baseDir` (the document's folder). Whether
 * the path may leave that folder is the caller's decision, made before this.
 */
export async function loadDataset(name: string, options: DatasetOptions, baseDir: string): Promise<Dataset> {
  const absolutePath = resolve(baseDir, options.file);
  // 1. Read the bytes once: the hash and the parse see the same content.
  const bytes = await readBytes(absolutePath, options.file);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  // 2. Decode, pick the delimiter, split into raw columns.
  const text = decodeText(bytes, options.file);
  const {delimiter, source} = resolveDelimiter(options.file, text, options.delimiter, options.decimal);
  const table = await readCsv(text, {file: options.file, delimiter, delimiterSource: source});
  // 3. Type the columns.
  const columns = inferTypes(table, options);
  checkUnits(options, columns);
  return {
    name,
    file: options.file,
    absolutePath,
    sha256,
    rowCount: table.rowCount,
    columns: new Map(columns.map((c) => [c.name, c])),
    units: {...options.units},
    labels: {...options.labels},
  };
}

async function readBytes(absolutePath: string, file: string): Promise<Buffer> {
  try {
    return await readFile(absolutePath);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT' || code === 'ENOTDIR') {
      throw new UserError(`data file ${file} not found`, {
        ruleId: 'data-file-missing',
        file,
        hint: `looked for ${absolutePath}; paths resolve relative to the document's folder${await nearbyFiles(absolutePath)}`,
      });
    }
    throw new UserError(`cannot read data file ${file} (${code ?? 'unknown error'})`, {
      ruleId: 'data-file-unreadable',
      file,
      hint: code === 'EISDIR' ? 'the path names a folder; name the data file inside it' : `check the permissions of ${absolutePath}`,
    });
  }
}

/** A case-insensitive match, or the data files that are there, to spot typos. */
async function nearbyFiles(absolutePath: string): Promise<string> {
  let entries: string[];
  try {
    entries = await readdir(dirname(absolutePath));
  } catch {
    return '';
  }
  const wanted = basename(absolutePath).toLowerCase();
  const sameName = entries.find((e) => e.toLowerCase() === wanted);
  if (sameName !== undefined) return `; the folder has ${sameName} (names are case-sensitive)`;
  const data = entries.filter((e) => /\.(csv|tsv|tab|txt)$/i.test(e)).sort().slice(0, 8);
  return data.length > 0 ? `; data files in that folder: ${data.join(', ')}` : '';
}

function checkUnits(options: DatasetOptions, columns: readonly Column[]): void {
  const names = columns.map((c) => c.name);
  for (const [key, column] of [...Object.keys(options.units).map((c) => ['units', c]), ...Object.keys(options.labels).map((c) => ['labels', c])]) {
    if (!names.includes(column!)) {
      throw new UserError(`${key} names a column "${column}" that ${options.file} does not have`, {
        ruleId: 'unknown-column',
        file: options.file,
        hint: `columns of ${options.file}: ${names.map((n) => JSON.stringify(n)).join(', ')}`,
      });
    }
  }
}
