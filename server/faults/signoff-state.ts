import fs from 'node:fs';
import path from 'node:path';
import type Database from 'better-sqlite3';
import { pdfText } from '../../tests/helpers/pdf.js';

/*
 * What a sign-off left in the data folder, read straight from the database file and the disk:
 * all of it (the run signed off, one review, one certificate whose PDF reads, the trail's two
 * entries, the certificate e-mail in the outbox), none of it, or a part, named.
 */

export type SignOffState =
  | { kind: 'signed-off'; number: string }
  | { kind: 'submitted' }
  | { kind: 'partial'; found: string };

type Counts = {
  state: string;
  number: string | null;
  reviews: number;
  certificates: number;
  signedOffTrail: number;
  issuedTrail: number;
  mails: number;
};

const COUNTS_SQL = `SELECT r."state", r."certificateNumber" AS "number",
  (SELECT COUNT(*) FROM "run_review" WHERE "runId" = r."id") AS "reviews",
  (SELECT COUNT(*) FROM "certificate" WHERE "runId" = r."id") AS "certificates",
  (SELECT COUNT(*) FROM "audit_entry" WHERE "recordId" = r."id" AND "action" = 'run-signed-off') AS "signedOffTrail",
  (SELECT COUNT(*) FROM "audit_entry" WHERE "recordId" = r."id" AND "action" = 'certificate-issued') AS "issuedTrail",
  (SELECT COUNT(*) FROM "outgoing_mail" WHERE "recordType" = 'run' AND "recordId" = r."id" AND "what" LIKE 'Certificate %') AS "mails"
  FROM "run" r WHERE r."id" = ?`;

/** The rows a run has of each kind a sign-off writes. */
export function signOffCounts(db: Database.Database, runId: string): Counts {
  return db.prepare(COUNTS_SQL).get(runId) as Counts;
}

/** The certificate's PDF as it lies in the data folder, or null when it is not there. */
export function certificateFile(db: Database.Database, dir: string, runId: string): Buffer | null {
  const row = db.prepare('SELECT "filePath" FROM "certificate" WHERE "runId" = ?').get(runId) as
    { filePath: string } | undefined;
  if (!row) return null;
  const file = path.join(dir, row.filePath);
  return fs.existsSync(file) ? fs.readFileSync(file) : null;
}

/** Classifies what the run holds; `pdf` is the certificate file read beside the rows. */
export async function classify(counts: Counts, pdf: Buffer | null): Promise<SignOffState> {
  const { state, number, ...rows } = counts;
  const found = JSON.stringify(counts);
  if (state === 'submitted' && number === null && Object.values(rows).every((n) => n === 0))
    return { kind: 'submitted' };
  const whole =
    state === 'signed-off' && number !== null && Object.values(rows).every((n) => n === 1);
  if (!whole) return { kind: 'partial', found };
  if (pdf === null) return { kind: 'partial', found: `${found} but no PDF on disk` };
  const text = await pdfText(pdf);
  return text.includes(number)
    ? { kind: 'signed-off', number }
    : { kind: 'partial', found: `${found}; the PDF does not name ${number}` };
}

/** PDFs under certificates/ that no certificate row names (left by a sign-off that never committed). */
export function strayCertificateFiles(db: Database.Database, dir: string): string[] {
  const root = path.join(dir, 'certificates');
  if (!fs.existsSync(root)) return [];
  const named = new Set(
    (db.prepare('SELECT "filePath" FROM "certificate"').all() as Array<{ filePath: string }>).map(
      (r) => path.join(dir, r.filePath),
    ),
  );
  return fs
    .readdirSync(root, { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile())
    .map((entry) => path.join(entry.parentPath, entry.name))
    .filter((file) => !named.has(file));
}
