import fs from 'node:fs';
import path from 'node:path';

/** Where a certificate's PDF goes, relative to the data folder. */
export const certificateFilePath = (workshopId: string, certificateId: string): string =>
  path.posix.join('certificates', workshopId, `${certificateId}.pdf`);

/**
 * Certificates live under the data folder, outside the web root, one folder per workshop:
 * data/certificates/<workshopId>/<certificateId>.pdf. Only the sign-off routes hand them out.
 */
export class CertificateStore {
  constructor(private readonly dataDir: string) {}

  private absolute(relative: string): string {
    const full = path.resolve(this.dataDir, relative);
    // A stored path can never reach outside the data folder.
    if (!full.startsWith(path.resolve(this.dataDir) + path.sep))
      throw new Error(`certificate path outside the data folder: ${relative}`);
    return full;
  }

  /** Writes through a temporary file and a rename, so a reader never sees half a PDF. Returns the full path. */
  write(relative: string, pdf: Buffer): string {
    const full = this.absolute(relative);
    fs.mkdirSync(path.dirname(full), { recursive: true });
    const partial = `${full}.${process.pid}.partial`;
    fs.writeFileSync(partial, pdf);
    fs.renameSync(partial, full);
    return full;
  }

  read(relative: string): Buffer | null {
    try {
      return fs.readFileSync(this.absolute(relative));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
  }

  /** The files in a workshop's certificate folder, relative to the data folder. */
  filesOf(workshopId: string): string[] {
    const folder = path.posix.join('certificates', workshopId);
    try {
      return fs
        .readdirSync(this.absolute(folder), { withFileTypes: true })
        .filter((entry) => entry.isFile())
        .map((entry) => path.posix.join(folder, entry.name));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return [];
      throw error;
    }
  }

  remove(relative: string): void {
    fs.rmSync(this.absolute(relative), { force: true });
  }
}
