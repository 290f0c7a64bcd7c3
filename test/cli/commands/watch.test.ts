import {describe, expect, it} from 'vitest';
import {UsageError} from '../../../src/cli/command.js';
import {takeServe} from '../../../src/cli/commands/watch.js';
import {defaultPort} from '../../../src/serve/serve-out.js';
import {cli} from '../../helpers/workspace.js';

describe('the arguments of stet watch', () => {
  it('reads --serve with no port, a port after it, or --serve=PORT', () => {
    expect(takeServe(['r.md', '--serve'])).toEqual({rest: ['r.md'], serve: defaultPort});
    expect(takeServe(['--serve', 'r.md'])).toEqual({rest: ['r.md'], serve: defaultPort});
    expect(takeServe(['--serve', '0', 'r.md'])).toEqual({rest: ['r.md'], serve: 0});
    expect(takeServe(['r.md', '--serve=8080', '--out', 'o'])).toEqual({rest: ['r.md', '--out', 'o'], serve: 8080});
    expect(takeServe(['r.md'])).toEqual({rest: ['r.md'], serve: undefined});
  });

  it('refuses a port that is not one', () => {
    expect(() => takeServe(['--serve=http'])).toThrow(UsageError);
    expect(() => takeServe(['--serve=70000'])).toThrow(/0 to 65535/);
  });

  it('is a usage error without exactly one report, or with an unknown option', async () => {
    expect(await cli('watch')).toMatchObject({code: 2, stderr: expect.stringContaining('exactly one report')});
    expect(await cli('watch', 'a.md', 'b.md')).toMatchObject({code: 2});
    expect(await cli('watch', 'a.md', '--serve=x')).toMatchObject({code: 2, stderr: expect.stringContaining('--serve')});
    expect(await cli('watch', 'a.md', '--frobnicate')).toMatchObject({code: 2});
  });

  it('is listed in --help', async () => {
    const help = await cli('--help');
    expect(help.stdout).toContain('stet watch REPORT.md [--out DIR] [--serve [PORT]]');
  });
});
