import path from 'node:path';

/**
 * The file a URL path names inside `root`, or undefined when it would
 * leave it (`..`, encoded `%2e%2e`, backslashes, NUL) or is malformed.
 */
export function resolveInside(root: string, urlPath: string): string | undefined {
  let decoded: string;
  try {
    decoded = decodeURIComponent(urlPath.split('?')[0]!.split('#')[0]!);
  } catch {
    return undefined;
  }
  if (decoded.includes('\0') || decoded.includes('\\')) return undefined;
  const base = path.resolve(root);
  const target = path.resolve(base, `.${path.posix.normalize(`/${decoded}`)}`);
  const relative = path.relative(base, target);
  if (relative.startsWith('..') || path.isAbsolute(relative)) return undefined;
  return target;
}
