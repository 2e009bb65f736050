import { parseArgs } from 'node:util';
import { createBackup } from '../backup/backup.js';
import { loadConfig } from '../lib/config.js';

/* npm run db:backup [-- --out <folder>]: one archive of the database, uploads and certificates. */

const { values } = parseArgs({ options: { out: { type: 'string', default: 'backups' } } });
const config = loadConfig();
const { archive, manifest } = await createBackup(config, values.out!);
const bytes = manifest.files.reduce((n, f) => n + f.size, 0);
console.log(
  `${archive}: database (${manifest.latestMigration ?? 'no migrations'}) and ${manifest.files.length - 1} files, ${(bytes / 1e6).toFixed(1)} MB before compression.`,
);
