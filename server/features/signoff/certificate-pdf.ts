import type { CertificateContent } from '../../../shared/review/certificate-content.js';
import {
  certificateStatement,
  dayWords,
  firstServiceWords,
  momentWords,
} from '../../../shared/review/certificate-words.js';
import { VERDICT_WORDS } from '../../../shared/review/run-words.js';
import { phaseTable } from './certificate-phase-table.js';
import {
  a4Document,
  ACCENT,
  factBlock,
  finishDocument,
  INK,
  MARGIN,
  MUTED,
  width,
  type Doc,
} from './pdf-layout.js';

/**
 * Renders the certificate. The whole PDF is read out before this returns (the sign-off can write
 * it inside its transaction).
 */
export function renderCertificate(c: CertificateContent): Buffer {
  const doc = a4Document({
    Title: `Break-in certificate ${c.number}`,
    Author: c.workshop.name,
    Subject: `${c.vessel.name}, engine ${c.engine.serialNumber}`,
    CreationDate: new Date(c.issuedAt),
  });
  heading(doc, c);
  facts(doc, c);
  phaseTable(doc, c);
  decision(doc, c);
  firstServiceDue(doc, c);
  statement(doc, c);
  return finishDocument(doc);
}

function heading(doc: Doc, c: CertificateContent) {
  doc.font('bold').fontSize(22).fillColor(INK).text('Break-in certificate');
  doc
    .font('body')
    .fontSize(11)
    .fillColor(MUTED)
    .text(`Certificate number ${c.number}  ·  issued ${dayWords(c.issuedAt, c.timezone)}`);
  doc.moveDown(0.4);
  doc
    .moveTo(MARGIN, doc.y)
    .lineTo(MARGIN + width(doc), doc.y)
    .lineWidth(2)
    .strokeColor(ACCENT)
    .stroke();
  doc.moveDown(0.6);
  doc.font('bold').fontSize(12).fillColor(INK).text(c.workshop.name);
  doc
    .font('body')
    .fontSize(10)
    .fillColor(MUTED)
    .text([c.workshop.address, c.workshop.email].filter(Boolean).join('  ·  '));
  doc.moveDown(0.8);
}

function facts(doc: Doc, c: CertificateContent) {
  const col = (width(doc) - 20) / 2;
  const top = doc.y;
  const e = c.engine;
  const leftEnd = factBlock(doc, MARGIN, top, col, 'Vessel', [
    ['Name', c.vessel.name],
    ['Hull identification number', c.vessel.hin],
    ['Home port', c.vessel.homePort],
    ['Skipper', c.skippers.join(', ')],
  ]);
  const rightEnd = factBlock(doc, MARGIN + col + 20, top, col, 'Engine', [
    ['Engine', `${e.maker} ${e.model} (${e.position})`],
    ['Serial number', e.serialNumber],
    ['Rated full-throttle speed', `${e.ratedRpmMin}–${e.ratedRpmMax} rpm`],
    [
      'Commissioned',
      [
        e.commissionedOn ? dayWords(e.commissionedOn) : '',
        e.hourMeterAtCommissioning !== null ? `at ${e.hourMeterAtCommissioning.toFixed(1)} h` : '',
      ]
        .filter(Boolean)
        .join(', '),
    ],
  ]);
  doc.x = MARGIN;
  doc.y = Math.max(leftEnd, rightEnd) + 14;
  doc.font('bold').fontSize(11).fillColor(ACCENT).text('BREAK-IN PROGRAM');
  doc.font('bold').fontSize(12).fillColor(INK).text(c.program.name);
  doc.moveDown(0.6);
}

/** The computed verdict beside the workshop's decision and comments. */
function decision(doc: Doc, c: CertificateContent) {
  doc.x = MARGIN;
  doc
    .font('bold')
    .fontSize(12)
    .fillColor(INK)
    .text(`Computed verdict: ${VERDICT_WORDS[c.verdict]}`);
  doc
    .font('bold')
    .fontSize(12)
    .text(
      `Workshop decision: confirmed and signed off by ${c.technician.name} (${c.technician.role}), ${momentWords(c.issuedAt, c.timezone)}`,
    );
  if (c.comments) doc.font('body').fontSize(10.5).text(`Comments: ${c.comments}`);
  doc.moveDown(0.6);
}

/** When the first service falls due, the engine hours it was judged from, and a warning if it already has. */
function firstServiceDue(doc: Doc, c: CertificateContent) {
  doc.font('bold').fontSize(11).fillColor(ACCENT).text('FIRST SERVICE DUE');
  const due = c.firstService
    ? firstServiceWords(c.firstService)
    : 'commissioning hour meter and date not recorded';
  doc.font('bold').fontSize(12).fillColor(INK).text(due);
  if (c.firstService) {
    const source =
      c.firstService.hoursSource === 'logged'
        ? 'last logged hour meter'
        : 'estimated from logged running time';
    const f = c.firstService;
    const due =
      (f.dueAtHours !== null && f.hoursNow >= f.dueAtHours) ||
      (f.dueOn !== null && c.issuedOn >= f.dueOn);
    doc
      .font('body')
      .fontSize(10)
      .fillColor(MUTED)
      .text(`Engine hours at sign-off: ${f.hoursNow.toFixed(1)} h (${source}).`);
    if (due)
      doc
        .font('bold')
        .fontSize(10.5)
        .fillColor(INK)
        .text('The first service was already due at sign-off: book it now.');
  }
  doc.moveDown(1);
}

function statement(doc: Doc, c: CertificateContent) {
  doc.font('body').fontSize(9).fillColor(MUTED).text(certificateStatement(c));
  doc
    .moveDown(0.4)
    .text(
      `The number ${c.number} ends in a check digit, so a mistyped number is caught when it is looked up.`,
    );
}
