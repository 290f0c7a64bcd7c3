import {defineConfig} from 'vitest/config';

// Reporters are set explicitly: vitest 4.1 otherwise picks a terse reporter
// in some environments, and CI needs the JSON report for its summary line.
export default defineConfig({
  test: {
    root: new URL('..', import.meta.url).pathname,
    include: ['test/**/*.test.ts'],
    globalSetup: ['test/global-setup.ts'],
    setupFiles: ['test/setup-fast-check.ts'],
    exclude: ['test/bench/**', 'test/fuzz/**', 'node_modules/**'],
    reporters: ['default'],
    // vitest runs cores − 1 workers by default: one on a 2-core machine. Much of
    // the suite waits (watchers, a browser, pdflatex), so two workers halve it.
    maxWorkers: 2,
    // Test files share a worker's module cache instead of re-importing vega,
    // unified and the compiler per file (imports were 115 s of 190 s). Tests
    // keep no module state: spies are restored, caches are per build.
    isolate: false,
    testTimeout: 30_000,
    env: {TZ: 'UTC', NO_COLOR: '1'},
  },
});
