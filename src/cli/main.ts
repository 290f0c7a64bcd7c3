#!/usr/bin/env node
import {runCli} from './run-cli.js';
import {wantsColour} from './wants-colour.js';

// A reader that closes the pipe early (`stet build r.md | head -1`) is not an error.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw error;
  });
}

try {
  process.exitCode = await runCli(process.argv.slice(2), {
    stdout: (text) => process.stdout.write(text),
    stderr: (text) => process.stderr.write(text),
    colour: wantsColour(process.stderr, process.env),
  });
} catch (error) {
  // Authors' mistakes never get here (they are positioned messages); this is a bug in stet.
  const detail = process.env['STET_DEBUG'] ? `\n${(error as Error).stack}` : '\n(set STET_DEBUG=1 to see where it happened)';
  process.stderr.write(`stet: internal error: ${(error as Error).message}${detail}\nPlease report it with the report and data that caused it.\n`);
  process.exitCode = 1;
}
