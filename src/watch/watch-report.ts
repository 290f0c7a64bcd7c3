import {watch, type FSWatcher} from 'chokidar';
import {readFile} from 'node:fs/promises';
import path from 'node:path';
import {fileURLToPath} from 'node:url';
import type {VFileMessage} from 'vfile-message';
import {createBlockCache, type BlockCache} from '../cache/block-cache.js';
import {compileReport, type CompiledReport, type CompileOptions} from '../compile-report.js';
import {writeBuild} from '../build-report.js';
import {changedValues, type ResultsDocument} from './changed-values.js';
import {conclusionFlips} from './conclusion-flips.js';
import {filesIn, hashFiles} from './input-hash.js';
import type {RebuildReport} from './rebuild-summary.js';

export interface WatchOptions extends Pick<CompileOptions, 'out' | 'allowOutside' | 'now' | 'formats' | 'template' | 'allowHtml'> {
  /** Quiet time after the last file event before rebuilding (default 120 ms, at least 75 ms). */
  debounceMs?: number | undefined;
  /** Template folders whose files are inputs (default: stet's templates/). */
  templateDirs?: readonly string[] | undefined;
  /** Called after the first build and after every rebuild. */
  onBuild: (outcome: BuildOutcome) => void;
}

export type BuildOutcome =
  | {readonly ok: true; readonly compiled: CompiledReport; readonly report: RebuildReport}
  | {readonly ok: false; readonly messages: readonly VFileMessage[]; readonly error?: unknown};

export interface WatchSession {
  readonly outDir: string;
  /** Builds run so far (the first build counts). */
  readonly builds: number;
  /** Resolves when no build is running or waiting. */
  settled(): Promise<void>;
  close(): Promise<void>;
}

/**
 * chokidar 5 emits the first `change` of a path and drops the others for
 * 50 ms, with no trailing event: reading the inputs only after that window
 * closed sees every write it swallowed.
 */
const minimumQuiet = 75;

const stetTemplates = fileURLToPath(new URL('../../templates/', import.meta.url));

/**
 * Build a report, then rebuild it whenever its inputs change: the report,
 * every dataset it reads (recomputed after each build, so a dataset an
 * edit adds is watched too) and the template files.
 *
 * chokidar 5 drops the last `change` of a burst (its throttle keeps the
 * first), so events only start a trailing-edge debounce; the rebuild then
 * happens only if the sha256 of the inputs differs from the last build's —
 * the final content always wins. Folders are watched, not files, so an
 * editor's rename-over save keeps being seen. After a failed build any
 * event retries, since a failed dataset may not be known as an input yet.
 */
export async function watchReport(reportPath: string, options: WatchOptions): Promise<WatchSession> {
  const report = path.resolve(reportPath);
  const reportDir = path.dirname(report);
  const outDir = path.resolve(options.out ?? path.join(reportDir, 'out'));
  const stetDir = path.join(reportDir, '.stet');
  const templateDirs = options.templateDirs ?? [stetTemplates];
  const cache: BlockCache = createBlockCache({dir: path.join(stetDir, 'cache')});
  const {allowOutside, now, formats, template, allowHtml} = options;
  const compileOptions: CompileOptions = {out: outDir, allowOutside, now, formats, template, allowHtml, cache};
  // A user's template is an input of its own; its folder is watched, not read whole.
  const templateFile = template === undefined ? [] : [path.resolve(template)];

  let datasetFiles: string[] = [];
  /** Content hash of each input as the last build read it. */
  let built = new Map<string, string>();
  let lastFailed = false;
  let previous: ResultsDocument | undefined;
  let builds = 0;
  let timer: NodeJS.Timeout | undefined;
  let running: Promise<void> | undefined;
  let again = false;
  let closed = false;
  let watcher: FSWatcher | undefined;

  const inputs = async () => [report, ...datasetFiles, ...templateFile, ...(await Promise.all(templateDirs.map(filesIn))).flat()];
  const folders = () => [...new Set([reportDir, ...templateDirs, ...templateFile.map((file) => path.dirname(file)), ...datasetFiles.map((file) => path.dirname(file))])];

  /**
   * Whether some input's bytes differ from what the last build read. After
   * a failure any event retries (`strict` false), since a dataset that
   * failed to load may not be known as an input yet.
   */
  async function changed(strict: boolean): Promise<boolean> {
    if (builds === 0 || (lastFailed && !strict)) return true;
    const now = await hashFiles(await inputs());
    return [...now].some(([file, hash]) => built.get(file) !== hash);
  }

  async function build(strict: boolean): Promise<void> {
    if (!(await changed(strict))) return;
    // Hashed before compiling: a change during the build makes the next check differ.
    const before = await hashFiles(await inputs());
    builds++;
    const started = process.hrtime.bigint();
    cache.beginBuild();
    let compiled: CompiledReport;
    try {
      compiled = await compileReport(report, compileOptions);
    } catch (error) {
      await cache.endBuild();
      built = before;
      lastFailed = true;
      options.onBuild({ok: false, messages: [], error});
      return;
    }
    const counts = await cache.endBuild();
    rememberDatasets(compiled);
    built = before;
    // Datasets count as the bytes the build actually read.
    for (const dataset of compiled.data?.datasets.values() ?? []) built.set(dataset.absolutePath, dataset.sha256);
    for (const [file, hash] of await hashFiles((await inputs()).filter((file) => !built.has(file)))) built.set(file, hash);
    if (!compiled.ok) {
      lastFailed = true;
      options.onBuild({ok: false, messages: compiled.messages});
      return;
    }
    try {
      await writeBuild(compiled, compileOptions);
    } catch (error) {
      // Nothing was renamed into place: the previous output stays; retry on the next event.
      lastFailed = true;
      options.onBuild({ok: false, messages: [], error});
      return;
    }
    lastFailed = false;
    const results = JSON.parse(compiled.files.get(`${compiled.name}.results.json`) ?? '{}') as ResultsDocument;
    const prose = await readFile(report, 'utf8').catch(() => '');
    const oldIds = Object.keys(previous?.blocks ?? {});
    const newIds = Object.keys(results.blocks ?? {});
    const summary: RebuildReport = {
      first: !previous,
      milliseconds: Number(process.hrtime.bigint() - started) / 1e6,
      counts,
      changed: previous ? changedValues(previous, results, prose) : [],
      flips: previous ? newIds.flatMap((id) => (previous!.blocks?.[id] ? conclusionFlips(id, previous!.blocks[id]!, results.blocks![id]!) : [])) : [],
      added: previous ? newIds.filter((id) => !oldIds.includes(id)) : [],
      removed: previous ? oldIds.filter((id) => !newIds.includes(id)) : [],
    };
    previous = results;
    options.onBuild({ok: true, compiled, report: summary});
  }

  /** Datasets read or declared become inputs; after a failure none is dropped. */
  function rememberDatasets(compiled: CompiledReport): void {
    const data = compiled.data;
    const read = [...(data?.datasets.values() ?? [])].map((dataset) => dataset.absolutePath);
    const declared = [...(data?.settings.datasets.values() ?? [])].map((d) => path.resolve(reportDir, d.options.file));
    const known = [...read, ...declared];
    datasetFiles = [...new Set(compiled.ok ? known : [...datasetFiles, ...known])];
  }

  /** Run builds one at a time; a request during a build runs once after it. */
  function requestBuild(strict = false): void {
    if (closed) return;
    if (running) {
      again = true;
      return;
    }
    running = build(strict)
      .catch((error: unknown) => options.onBuild({ok: false, messages: [], error}))
      .finally(async () => {
        running = undefined;
        if (closed) return;
        if (watcher) await syncFolders();
        if (again) {
          again = false;
          requestBuild();
        }
      });
  }

  // The first build finds the datasets, so their folders are watched from the start.
  requestBuild();
  await running;

  const inside = (file: string, dir: string) => file === dir || file.startsWith(dir + path.sep);
  // An output folder that holds the report (`--out .`) cannot be ignored whole;
  // its writes then only cost a hash check, since outputs are not inputs.
  const ignoredDirs = inside(reportDir, outDir) ? [stetDir] : [outDir, stetDir];
  const isIgnored = (file: string) => ignoredDirs.some((dir) => inside(file, dir)) ||
    /(^|[\\/])(node_modules|\.git)([\\/]|$)/.test(file);
  let watched = new Set<string>(folders());
  watcher = watch([...watched], {ignoreInitial: true, depth: 0, ignored: isIgnored});
  async function syncFolders(): Promise<void> {
    const wanted = new Set(folders());
    const added = [...wanted].filter((folder) => !watched.has(folder));
    const gone = [...watched].filter((folder) => !wanted.has(folder));
    if (added.length) watcher?.add(added);
    if (gone.length) await watcher?.unwatch(gone);
    watched = wanted;
  }
  watcher.on('all', () => {
    clearTimeout(timer);
    timer = setTimeout(() => {
      timer = undefined;
      requestBuild();
    }, Math.max(options.debounceMs ?? 120, minimumQuiet));
  });
  watcher.on('error', () => {
    // chokidar reports folders that vanished; the next event or build resyncs.
  });
  await new Promise<void>((resolve) => watcher.once('ready', () => resolve()));
  // An edit during the first build, before the watcher was ready, is not lost.
  requestBuild(true);
  await running;

  const session: WatchSession = {
    outDir,
    get builds() {
      return builds;
    },
    async settled() {
      while (running || timer) {
        if (running) await running;
        else await new Promise((resolve) => setTimeout(resolve, 10));
      }
    },
    async close() {
      closed = true;
      clearTimeout(timer);
      await running;
      await watcher?.close();
    },
  };
  return session;
}
