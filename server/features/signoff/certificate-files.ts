import type { DataSource } from 'typeorm';
import { renderCertificate } from './certificate-pdf.js';
import type { CertificateStore } from './certificate-store.js';
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
