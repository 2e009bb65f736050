import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

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

  /** Writes to a temporary name first and renames, so a crash never leaves half a file under the real name. */
  async write(storedName: string, content: Buffer): Promise<void> {
    const target = this.pathOf(storedName);
    await fs.promises.mkdir(path.dirname(target), { recursive: true });
    const temporary = `${target}.${randomUUID()}.part`;
    try {
      await fs.promises.writeFile(temporary, content, { flag: 'wx', mode: 0o640 });
      await fs.promises.rename(temporary, target);
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
