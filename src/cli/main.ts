#!/usr/bin/env node
import {runCli} from './run-cli.js';
import {wantsColour} from './wants-colour.js';

const code = await runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  colour: wantsColour(process.stderr, process.env),
});
process.exitCode = code;
