import path from 'node:path';
import {describe, expect, it} from 'vitest';
import {resolveInside} from '../../src/serve/safe-path.js';

const root = '/srv/out';

describe('resolving a URL path inside the output folder', () => {
  it('finds files and folders inside', () => {
    expect(resolveInside(root, '/report.html')).toBe(path.join(root, 'report.html'));
    expect(resolveInside(root, '/charts/a%20b.svg?x=1#top')).toBe(path.join(root, 'charts', 'a b.svg'));
    expect(resolveInside(root, '/charts/../report.html')).toBe(path.join(root, 'report.html'));
  });

  it('never leaves the folder, however the path is spelled', () => {
    for (const attempt of ['/../etc/passwd', '/..%2f..%2fetc/passwd', '/%2e%2e/%2e%2e/etc/passwd', '/charts/../../secret', '//etc/passwd', '/..']) {
      const resolved = resolveInside(root, attempt);
      expect(resolved === undefined || resolved === root || resolved.startsWith(root + path.sep), attempt).toBe(true);
    }
    expect(resolveInside(root, '/../out-other/x')).not.toBe('/srv/out-other/x');
  });

  it('refuses backslashes, NUL and malformed escapes', () => {
    expect(resolveInside(root, '/..\\..\\x')).toBeUndefined();
    expect(resolveInside(root, '/a%00b')).toBeUndefined();
    expect(resolveInside(root, '/%E0%A4%A')).toBeUndefined();
  });
});
