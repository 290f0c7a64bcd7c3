import {readFile} from 'node:fs/promises';
import path from 'node:path';
import type {CompiledReport, OutputFormat} from '../compile-report.js';
import type {Disclosure} from '../interpret/disclosure.js';
import {blockSpecHash, canonicalJson, planHash, sha256, specificationHash} from '../spec/spec-fingerprint.js';
import {version} from '../version.js';
import {outputHash} from './output-hash.js';
import {proseHash} from './prose-hash.js';

/**
 * `OUT/.stet-manifest.json`: what a build was made from and what it wrote.
 * `stet check` compares hashes of the inputs and outputs with it before it
 * recompiles anything, and names what changed when something did.
 */
export interface BuildManifest {
  readonly 'stet-manifest': 1;
  readonly stet: string;
  readonly report: {readonly file: string; readonly sha256: string; readonly prose: string};
  readonly formats: readonly OutputFormat[];
  readonly allow_outside: boolean;
  /** `--template` (relative to the report; null for stet's own) and `--allow-html`, which shape the HTML. */
  readonly page: {readonly template: string | null; readonly allow_html: boolean};
  /** sha256 of each template file the HTML page was made from. */
  readonly templates: Readonly<Record<string, string>>;
  /** Data files by dataset name; `file` as written, relative to the report. */
  readonly datasets: Readonly<Record<string, {readonly file: string; readonly sha256: string}>>;
  readonly blocks: Readonly<Record<string, ManifestBlock>>;
  /** `outputHash` (sha256 without the HTML build time) of every file written, by path relative to the output folder. */
  readonly outputs: Readonly<Record<string, string>>;
}

export interface ManifestBlock {
  readonly data: string;
  /** `blockSpecHash`: every declared field, presentation included. */
  readonly spec: string;
  /** What its sentence disclosed; absent for describe blocks. */
  readonly disclosure?: ManifestDisclosure;
}

export interface ManifestDisclosure {
  /** null without a lock. */
  readonly plan: string | null;
  readonly specifications: number;
  /** `planHash` and `specificationHash` of the block, to recount without parsing the report. */
  readonly plan_hash: string;
  readonly specification: string;
}

export const manifestName = '.stet-manifest.json';
export const templateDir = new URL('../../templates/', import.meta.url);
export const templateFiles = ['report.html', 'report.css'] as const;

export interface ManifestOptions {
  readonly formats: ReadonlySet<OutputFormat>;
  readonly allowOutside: boolean;
  /** The user's template file, absolute or relative to the working folder. */
  readonly template?: string | undefined;
  readonly allowHtml: boolean;
}

export async function createManifest(compiled: CompiledReport, options: ManifestOptions): Promise<string> {
  const {formats, allowOutside} = options;
  const template = options.template === undefined ? null : path.relative(path.dirname(compiled.reportPath), path.resolve(options.template));
  const data = compiled.data;
  if (!data) throw new Error('createManifest needs a compiled report with data');
  const text = await readFile(compiled.reportPath, 'utf8');
  const blocks: Record<string, ManifestBlock> = {};
  for (const [id, spec] of data.specs) {
    const disclosure = compiled.history?.disclose(spec, data.settings);
    const adjust = data.settings.adjust;
    const record = disclosure && {...disclosureRecord(disclosure), plan_hash: planHash(spec, adjust), specification: specificationHash(spec, adjust)};
    blocks[id] = {data: spec.data, spec: blockSpecHash(spec, adjust), ...(record ? {disclosure: record} : {})};
  }
  const manifest: BuildManifest = {
    'stet-manifest': 1,
    stet: version,
    report: {file: path.basename(compiled.reportPath), sha256: sha256(text), prose: proseHash(text)},
    formats: [...formats].sort(),
    allow_outside: allowOutside,
    page: {template, allow_html: options.allowHtml},
    templates: formats.has('html') ? await hashTemplates(templateFile(compiled.reportPath, template)) : {},
    datasets: Object.fromEntries([...data.datasets].map(([name, d]) => [name, {file: d.file, sha256: d.sha256}])),
    blocks,
    outputs: Object.fromEntries([...compiled.files].map(([file, content]) => [file, outputHash(content)])),
  };
  return `${canonicalJson(manifest, 2)}\n`;
}

export function disclosureRecord(disclosure: Disclosure): {plan: string | null; specifications: number} {
  return {plan: disclosure.plan ?? null, specifications: disclosure.specifications};
}

/** The user's template from the manifest's `page.template`: its path relative to the report, and where it is. */
export interface UserTemplate {
  readonly label: string;
  readonly file: string;
}

export function templateFile(reportPath: string, template: string | null): UserTemplate | undefined {
  return template === null ? undefined : {label: template, file: path.resolve(path.dirname(reportPath), template)};
}

/** sha256 of stet's template files and of the user's template, if any (a missing one hashes as ''). */
export async function hashTemplates(user?: UserTemplate): Promise<Record<string, string>> {
  const entries = await Promise.all(templateFiles.map(async (name) => [name, sha256(await readFile(new URL(name, templateDir)))] as const));
  const own = user === undefined ? [] : [[user.label, await readFile(user.file).then(sha256, () => '')] as const];
  return Object.fromEntries([...entries, ...own]);
}

/** The manifest in `outDir`; undefined when missing or unreadable (then everything is compared). */
export async function readManifest(outDir: string): Promise<BuildManifest | undefined> {
  try {
    const value = JSON.parse(await readFile(path.join(outDir, manifestName), 'utf8')) as Partial<BuildManifest>;
    return value['stet-manifest'] === 1 && value.outputs && value.blocks && value.datasets && value.report && value.page ? (value as BuildManifest) : undefined;
  } catch {
    return undefined;
  }
}
