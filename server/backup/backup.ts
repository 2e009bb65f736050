import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import * as tar from 'tar';
import {
  checkUnpacked,
  copyDatabase,
  DATABASE_NAME,
  FILE_FOLDERS,
  filesUnder,
  manifestOf,
  MANIFEST_NAME,
  type Manifest,
} from './archive.js';

type Place = { databasePath: string; dataDir: string };

/** Puts a file's content on disk before the command says it is done. */
function flush(file: string) {
  const handle = fs.openSync(file, 'r');
  try {
    fs.fsyncSync(handle);
  } finally {
    fs.closeSync(handle);
  }
}

const stamp = () => new Date().toISOString().replace(/[:.]/g, '-');

/** Writes one archive into `outDir` and returns its path and manifest. */
export async function createBackup(place: Place, outDir: string) {
  const staged = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-backup-'));
  try {
    const latest = await copyDatabase(place.databasePath, path.join(staged, DATABASE_NAME));
    for (const folder of FILE_FOLDERS) {
      const from = path.join(place.dataDir, folder);
      if (fs.existsSync(from)) fs.cpSync(from, path.join(staged, folder), { recursive: true });
    }
    const manifest = manifestOf(staged, latest);
    fs.writeFileSync(path.join(staged, MANIFEST_NAME), JSON.stringify(manifest, null, 2));
    fs.mkdirSync(outDir, { recursive: true });
    const archive = path.join(outDir, `ringseat-backup-${stamp()}.tar.gz`);
    const partial = `${archive}.part`;
    await tar.c({ gzip: true, file: partial, cwd: staged, portable: true }, filesUnder(staged));
    flush(partial);
    fs.renameSync(partial, archive);
    return { archive, manifest };
  } finally {
    fs.rmSync(staged, { recursive: true, force: true });
  }
}

export class RestoreRefused extends Error {}

/**
 * Unpacks and checks an archive before anything is replaced. With `replace`, what is there now
 * is moved aside (`*.before-restore-<time>`), never deleted; without it, a database already in
 * place is refused.
 */
export async function restoreBackup(archive: string, place: Place, replace: boolean) {
  if (!fs.existsSync(archive)) throw new RestoreRefused(`No archive at ${archive}.`);
  const unpacked = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-restore-'));
  try {
    await tar.x({ file: archive, cwd: unpacked, strict: true });
    const problems = checkUnpacked(unpacked);
    if (problems.length > 0)
      throw new RestoreRefused(
        `The archive is not whole; nothing was replaced.\n${problems.join('\n')}`,
      );
    const present = fs.existsSync(place.databasePath) && fs.statSync(place.databasePath).size > 0;
    if (present && !replace)
      throw new RestoreRefused(
        `A database is already at ${place.databasePath}. Stop the server, then run again with --replace: what is there now is kept beside it, renamed .before-restore-….`,
      );
    const aside = `.before-restore-${stamp()}`;
    for (const suffix of ['', '-wal', '-shm'])
      if (fs.existsSync(place.databasePath + suffix))
        fs.renameSync(place.databasePath + suffix, place.databasePath + suffix + aside);
    fs.mkdirSync(path.dirname(path.resolve(place.databasePath)), { recursive: true });
    fs.copyFileSync(path.join(unpacked, DATABASE_NAME), place.databasePath);
    flush(place.databasePath);
    for (const folder of FILE_FOLDERS) {
      const target = path.join(place.dataDir, folder);
      if (fs.existsSync(target)) fs.renameSync(target, target + aside);
      const from = path.join(unpacked, folder);
      if (fs.existsSync(from)) fs.cpSync(from, target, { recursive: true });
    }
    return JSON.parse(fs.readFileSync(path.join(unpacked, MANIFEST_NAME), 'utf8')) as Manifest;
  } finally {
    fs.rmSync(unpacked, { recursive: true, force: true });
  }
}
