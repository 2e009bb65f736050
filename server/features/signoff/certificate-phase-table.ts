import type {
  CertificateContent,
  CertificatePhase,
} from '../../../shared/review/certificate-content.js';
import { CEILING_WORDS, dayWords, minutesWords } from '../../../shared/review/certificate-words.js';
import { VERDICT_WORDS } from '../../../shared/review/run-words.js';
import { INK, tableRow, type Doc } from './pdf-layout.js';

const COLUMNS = [
  { title: 'Phase', w: 0.27 },
  { title: 'Band', w: 0.2 },
  { title: 'Required', w: 0.1 },
  { title: 'In band', w: 0.1 },
  { title: 'Over / under', w: 0.11 },
  { title: 'Run between', w: 0.12 },
  { title: 'Verdict', w: 0.1 },
];

function phaseCells(p: CertificatePhase, zone: string): string[] {
  const when =
    p.firstAt && p.lastAt
      ? `${dayWords(p.firstAt, zone)} – ${dayWords(p.lastAt, zone)}`
      : 'not run';
  return [
    `${p.name}\n(${p.performedBy === 'workshop' ? 'by the workshop' : 'by the skipper'})`,
    `${p.band.rpmMin}–${p.band.rpmMax} rpm, ${CEILING_WORDS[p.throttleCeiling]}`,
    minutesWords(p.requiredMinutes),
    minutesWords(p.inBandMinutes),
    `${minutesWords(p.overMinutes)} / ${minutesWords(p.underMinutes)}`,
    when,
    VERDICT_WORDS[p.verdict],
  ];
}

/** Each phase's band, required time and time logged, then every reason the log gives. */
export function phaseTable(doc: Doc, c: CertificateContent) {
  tableRow(
    doc,
    COLUMNS,
    COLUMNS.map((col) => col.title),
    true,
  );
  for (const phase of c.phases) tableRow(doc, COLUMNS, phaseCells(phase, c.timezone), false);
  const reasons = c.phases.flatMap((p) => [
    ...p.reasons.map((r) => `${p.name}: ${r}`),
    ...(p.setAsideMinutes
      ? [
          `${p.name}: run again after a return; ${minutesWords(p.setAsideMinutes)} logged before the return kept in the record but not counted.`,
        ]
      : []),
  ]);
  if (c.voidedCount)
    reasons.push(
      `${c.voidedCount} ${c.voidedCount === 1 ? 'entry' : 'entries'} voided before sign-off, each with its reason: kept in the record, not counted.`,
    );
  doc.moveDown(0.6);
  if (reasons.length > 0) {
    doc.font('bold').fontSize(10).fillColor(INK).text('What the log shows');
    doc
      .font('body')
      .fontSize(9.5)
      .fillColor(INK)
      .list(reasons, { bulletRadius: 1.5, textIndent: 10 });
    doc.moveDown(0.6);
  }
}
