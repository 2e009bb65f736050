import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ensureChromium } from './chromium.js';
import { ensureClientBuilt } from './client-build.js';

// `npm test`: every test (unit, API, component, browser) in one vitest run, after making sure the
// browser tests have Debian's chromium and a current client build. Extra arguments go to vitest.
try {
  ensureChromium();
  ensureClientBuilt();
} catch (error) {
  console.error(`\n${(error as Error).message}\n`);
  process.exit(1);
}

const report = path.join('test-results', 'vitest.json');
fs.mkdirSync(path.dirname(report), { recursive: true });
fs.rmSync(report, { force: true });
const run = spawnSync(
  process.execPath,
  [
    path.join('node_modules', 'vitest', 'vitest.mjs'),
    'run',
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${report}`,
    ...process.argv.slice(2),
  ],
  { stdio: 'inherit' },
);

if (fs.existsSync(report)) {
  const result = JSON.parse(fs.readFileSync(report, 'utf8')) as {
    numPassedTests: number;
    numFailedTests: number;
    numPendingTests: number;
    numTodoTests: number;
  };
  const skipped = result.numPendingTests + result.numTodoTests;
  console.log(
    `\nTests: ${result.numPassedTests} passed, ${result.numFailedTests} failed${skipped ? `, ${skipped} skipped` : ''}`,
  );
}
process.exit(run.status ?? 1);
