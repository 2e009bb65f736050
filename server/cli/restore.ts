import { parseArgs } from 'node:util';
import { restoreBackup, RestoreRefused } from '../backup/backup.js';
import { loadConfig } from '../lib/config.js';

/* npm run db:restore -- <archive> [--replace]: checks the archive whole before replacing anything. */

const { values, positionals } = parseArgs({
  options: { replace: { type: 'boolean', default: false } },
  allowPositionals: true,
});
if (positionals.length !== 1) {
  console.error('Usage: npm run db:restore -- <archive.tar.gz> [--replace]');
  process.exit(2);
}
try {
  const manifest = await restoreBackup(positionals[0], loadConfig(), values.replace!);
  console.log(
    `Restored the backup of ${manifest.createdAt} (${manifest.files.length} files checked). Start the server as usual.`,
  );
} catch (error) {
  if (!(error instanceof RestoreRefused)) throw error;
  console.error(error.message);
  process.exit(1);
}
