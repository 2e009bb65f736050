import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/** Flushes a folder's entries (a rename in it) to disk. */
async function syncFolder(folder: string): Promise<void> {
  const handle = await fs.promises.open(folder, 'r');
  try {
    await handle.sync();
  } finally {
    await handle.close();
  }
}

/**
 * Files on disk under `<dataDir>/uploads`, outside the web root: they are only ever served through
 * the attachments route, which checks who is asking. Names are made by the server, never taken
 * from the upload, so no path the client sends can reach the disk.
 */
export class AttachmentStorage {
  readonly root: string;

  constructor(dataDir: string) {
    this.root = path.resolve(dataDir, 'uploads');
  }

  /** Absolute path of a stored name, refusing anything that would leave the uploads folder. */
  pathOf(storedName: string): string {
    const full = path.resolve(this.root, storedName);
    if (!full.startsWith(this.root + path.sep))
      throw new Error(`Stored name escapes the uploads folder: ${storedName}`);
    return full;
  }

  /**
   * Writes to a temporary name first and renames, so a crash never leaves half a file under the
   * real name; the file and its folder are flushed to disk before this returns, so a row that
   * commits afterwards never points at a file the disk has not kept.
   */
  async write(storedName: string, content: Buffer): Promise<void> {
    const target = this.pathOf(storedName);
    const folder = path.dirname(target);
    await fs.promises.mkdir(folder, { recursive: true });
    const temporary = `${target}.${randomUUID()}.part`;
    try {
      const handle = await fs.promises.open(temporary, 'wx', 0o640);
      try {
        await handle.writeFile(content);
        await handle.sync();
      } finally {
        await handle.close();
      }
      await fs.promises.rename(temporary, target);
      await syncFolder(folder);
    } catch (error) {
      await fs.promises.rm(temporary, { force: true });
      throw error;
    }
  }

  async remove(storedName: string): Promise<void> {
    await fs.promises.rm(this.pathOf(storedName), { force: true });
  }

  /** Size on disk, or null when the file is missing. */
  async sizeOf(storedName: string): Promise<number | null> {
    try {
      return (await fs.promises.stat(this.pathOf(storedName))).size;
    } catch {
      return null;
    }
  }

  open(storedName: string): fs.ReadStream {
    return fs.createReadStream(this.pathOf(storedName));
  }
}
