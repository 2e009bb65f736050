import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type {
  CertificateContent,
  CertificatePhase,
} from '../../../shared/review/certificate-content.js';
import {
  CEILING_WORDS,
  certificateStatement,
  dayWords,
  firstServiceWords,
  minutesWords,
  momentWords,
} from '../../../shared/review/certificate-words.js';
import { VERDICT_WORDS } from '../../../shared/review/run-words.js';

// pdfkit embeds TrueType fonts (it cannot read woff2): the static TTFs of the app's own face.
const require = createRequire(import.meta.url);
const FONT_DIR = '@expo-google-fonts/atkinson-hyperlegible-next';
const FONTS = {
  body: require.resolve(`${FONT_DIR}/400Regular/AtkinsonHyperlegibleNext_400Regular.ttf`),
  bold: require.resolve(`${FONT_DIR}/700Bold/AtkinsonHyperlegibleNext_700Bold.ttf`),
};

const INK = '#1b1813';
const MUTED = '#4a4131';
const ACCENT = '#7b4f14';
const MARGIN = 50;

type Doc = InstanceType<typeof PDFDocument>;

/**
 * Renders the certificate. pdfkit writes synchronously into its readable buffer, so the whole
 * PDF is read out before this returns (the sign-off can write it inside its transaction).
 */
export function renderCertificate(c: CertificateContent): Buffer {
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    info: {
      Title: `Break-in certificate ${c.number}`,
      Author: c.workshop.name,
      Subject: `${c.vessel.name}, engine ${c.engine.serialNumber}`,
      CreationDate: new Date(c.issuedAt),
    },
  });
  doc.registerFont('body', FONTS.body);
  doc.registerFont('bold', FONTS.bold);
  heading(doc, c);
  facts(doc, c);
  phaseTable(doc, c);
  decision(doc, c);
  doc.end();
  const chunks: Buffer[] = [];
  for (let chunk = doc.read(); chunk !== null; chunk = doc.read()) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

const width = (doc: Doc) => doc.page.width - 2 * MARGIN;

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

function factBlock(
  doc: Doc,
  x: number,
  y: number,
  w: number,
  title: string,
  lines: Array<[string, string]>,
): number {
  doc.font('bold').fontSize(11).fillColor(ACCENT).text(title.toUpperCase(), x, y, { width: w });
  for (const [label, value] of lines) {
    doc
      .font('body')
      .fontSize(9)
      .fillColor(MUTED)
      .text(label, x, doc.y + 2, { width: w });
    doc
      .font('bold')
      .fontSize(11)
      .fillColor(INK)
      .text(value || '—', x, doc.y, { width: w });
  }
  return doc.y;
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

function tableRow(doc: Doc, cells: string[], bold: boolean) {
  const total = width(doc);
  doc.font(bold ? 'bold' : 'body').fontSize(9);
  const height =
    Math.max(
      ...cells.map((text, i) => doc.heightOfString(text, { width: COLUMNS[i].w * total - 6 })),
    ) + 8;
  if (doc.y + height > doc.page.height - MARGIN) doc.addPage();
  const y = doc.y;
  let x = MARGIN;
  cells.forEach((text, i) => {
    doc.fillColor(INK).text(text, x + 3, y + 4, { width: COLUMNS[i].w * total - 6 });
    x += COLUMNS[i].w * total;
  });
  doc
    .moveTo(MARGIN, y + height)
    .lineTo(MARGIN + total, y + height)
    .lineWidth(0.5)
    .strokeColor(MUTED)
    .stroke();
  doc.x = MARGIN;
  doc.y = y + height;
}

function phaseTable(doc: Doc, c: CertificateContent) {
  tableRow(
    doc,
    COLUMNS.map((col) => col.title),
    true,
  );
  for (const phase of c.phases) tableRow(doc, phaseCells(phase, c.timezone), false);
  const reasons = c.phases.flatMap((p) => p.reasons.map((r) => `${p.name}: ${r}`));
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
  doc.font('body').fontSize(9).fillColor(MUTED).text(certificateStatement(c));
  doc
    .moveDown(0.4)
    .text(
      `The number ${c.number} ends in a check digit, so a mistyped number is caught when it is looked up.`,
    );
}
