import Database from 'better-sqlite3';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/*
 * A backup is one .tar.gz holding `ringseat.sqlite` (a consistent copy made with SQLite's online
 * backup, so a running server may keep writing), the data folder's `uploads/` and
 * `certificates/`, and `manifest.json` listing every file with its size and SHA-256.
 */

export const DATABASE_NAME = 'ringseat.sqlite';
export const FILE_FOLDERS = ['uploads', 'certificates'] as const;
export const MANIFEST_NAME = 'manifest.json';

export type ManifestFile = { path: string; size: number; sha256: string };
export type Manifest = {
  kind: 'ringseat-backup';
  version: 1;
  createdAt: string;
  latestMigration: string | null;
  files: ManifestFile[];
};

export const sha256Of = (file: string) =>
  createHash('sha256').update(fs.readFileSync(file)).digest('hex');

/** Every file under `root`, as paths relative to it with forward slashes, sorted. */
export function filesUnder(root: string): string[] {
  if (!fs.existsSync(root)) return [];
  return fs
    .readdirSync(root, { recursive: true, withFileTypes: true })
    .filter((d) => d.isFile())
    .map((d) => path.relative(root, path.join(d.parentPath, d.name)).split(path.sep).join('/'))
    .sort();
}

/** Copies the live database into `target` through SQLite's online backup. */
export async function copyDatabase(databasePath: string, target: string): Promise<string | null> {
  const source = new Database(databasePath, { fileMustExist: true });
  try {
    source.pragma('busy_timeout = 5000');
    // After the first step, everything at once: a step holds a read snapshot (writers go on under
    // WAL), while small steps would start over each time the server writes, and never end.
    await source.backup(target, { progress: ({ totalPages }) => totalPages + 1000 });
  } finally {
    source.close();
  }
  const copy = new Database(target, { fileMustExist: true });
  try {
    // The copy stands alone: no WAL beside it.
    copy.pragma('journal_mode = DELETE');
    const row = copy.prepare('SELECT name FROM migrations ORDER BY id DESC LIMIT 1').get() as
      { name: string } | undefined;
    return row?.name ?? null;
  } finally {
    copy.close();
  }
}

/** The manifest of a staged folder: every file but the manifest itself. */
export function manifestOf(staged: string, latestMigration: string | null): Manifest {
  const files = filesUnder(staged)
    .filter((f) => f !== MANIFEST_NAME)
    .map((f) => {
      const full = path.join(staged, f);
      return { path: f, size: fs.statSync(full).size, sha256: sha256Of(full) };
    });
  return {
    kind: 'ringseat-backup',
    version: 1,
    createdAt: new Date().toISOString(),
    latestMigration,
    files,
  };
}

/** What is wrong with an unpacked backup, in words; empty when it is whole. */
export function checkUnpacked(folder: string): string[] {
  const manifestPath = path.join(folder, MANIFEST_NAME);
  if (!fs.existsSync(manifestPath))
    return ['The archive holds no manifest.json: it is not a Ringseat backup.'];
  const manifest = JSON.parse(fs.readFileSync(manifestPath, 'utf8')) as Manifest;
  if (manifest.kind !== 'ringseat-backup' || manifest.version !== 1)
    return ['The manifest is not that of a Ringseat backup this version can restore.'];
  const problems: string[] = [];
  const listed = new Set(manifest.files.map((f) => f.path));
  for (const file of manifest.files) {
    const full = path.join(folder, file.path);
    if (!fs.existsSync(full)) problems.push(`${file.path} is listed but missing.`);
    else if (fs.statSync(full).size !== file.size || sha256Of(full) !== file.sha256)
      problems.push(`${file.path} does not match its checksum.`);
  }
  for (const file of filesUnder(folder))
    if (file !== MANIFEST_NAME && !listed.has(file))
      problems.push(`${file} is not in the manifest.`);
  if (!listed.has(DATABASE_NAME)) problems.push(`The archive holds no ${DATABASE_NAME}.`);
  else if (problems.length === 0) {
    const db = new Database(path.join(folder, DATABASE_NAME), { readonly: true });
    try {
      const [{ integrity_check }] = db.pragma('integrity_check') as Array<{
        integrity_check: string;
      }>;
      if (integrity_check !== 'ok')
        problems.push(`The database copy fails SQLite's integrity check: ${integrity_check}.`);
    } finally {
      db.close();
    }
  }
  return problems;
}
