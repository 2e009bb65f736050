import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

// `npm run bench`: runs every bench/*.bench.ts in turn; each prints its figures and exits 1 when it misses its target.
const files = fs
  .readdirSync('bench')
  .filter((f) => f.endsWith('.bench.ts'))
  .sort();
const only = process.argv.slice(2);
let failed = 0;
for (const file of files.filter((f) => only.length === 0 || only.some((o) => f.includes(o)))) {
  console.log(`\n== ${file}`);
  const run = spawnSync(
    process.execPath,
    [path.join('node_modules', 'tsx', 'dist', 'cli.mjs'), path.join('bench', file)],
    { stdio: 'inherit' },
  );
  if (run.status !== 0) failed++;
}
console.log(
  failed === 0
    ? '\nAll benchmarks met their targets.'
    : `\n${failed} benchmark(s) missed their targets.`,
);
process.exit(failed === 0 ? 0 : 1);
