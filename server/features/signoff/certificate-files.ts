import type { DataSource } from 'typeorm';
import { renderCertificate } from './certificate-pdf.js';
import type { CertificateStore } from './certificate-store.js';
import { Workshop } from '../workshops/workshop.entity.js';
import { Certificate } from './certificate.entity.js';

/**
 * Writes a certificate's PDF from its frozen content. Used for demo certificates (added before
 * the process knows its data folder) and should a file have gone missing from the disk.
 */
export async function writeCertificateFile(
  dataSource: DataSource,
  store: CertificateStore,
  certificate: Certificate,
  now: Date,
): Promise<Buffer> {
  const pdf = renderCertificate(certificate.content);
  store.write(certificate.filePath, pdf);
  await dataSource
    .getRepository(Certificate)
    .update({ id: certificate.id }, { storedAt: now, byteSize: pdf.length });
  return pdf;
}

/** Writes every certificate whose PDF is not on disk yet; returns how many. */
export async function storeMissingCertificates(
  dataSource: DataSource,
  store: CertificateStore,
  now: Date,
): Promise<number> {
  let stored = 0;
  for (const certificate of await dataSource.getRepository(Certificate).find()) {
    if (store.read(certificate.filePath) !== null) continue;
    await writeCertificateFile(dataSource, store, certificate, now);
    stored++;
  }
  return stored;
}

/**
 * Removes the files in each workshop's certificate folder that no certificate names. A sign-off
 * writes its PDF just before its transaction commits (signoff-writes.ts), so a process killed in
 * between leaves the PDF (or its .partial) of a certificate that was never issued, bearing a
 * number the next sign-off issues again. Runs at start, before any sign-off can be under way.
 */
export async function removeUnissuedCertificateFiles(
  dataSource: DataSource,
  store: CertificateStore,
): Promise<string[]> {
  const certificates = await dataSource
    .getRepository(Certificate)
    .find({ select: { filePath: true } });
  const issued = new Set(certificates.map((c) => c.filePath));
  const workshops = await dataSource.getRepository(Workshop).find({ select: { id: true } });
  const unissued = workshops.flatMap((w) => store.filesOf(w.id)).filter((f) => !issued.has(f));
  for (const relative of unissued) store.remove(relative);
  return unissued;
}
