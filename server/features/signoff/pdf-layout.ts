import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';

/*
 * The certificate's page furniture: its face, colours and margins, and the two layouts it is
 * built from (a titled block of label/value lines, and a table row that breaks to a new page).
 */

// pdfkit embeds TrueType fonts (it cannot read woff2): the static TTFs of the app's own face.
const require = createRequire(import.meta.url);
const FONT_DIR = '@expo-google-fonts/atkinson-hyperlegible-next';
const FONTS = {
  body: require.resolve(`${FONT_DIR}/400Regular/AtkinsonHyperlegibleNext_400Regular.ttf`),
  bold: require.resolve(`${FONT_DIR}/700Bold/AtkinsonHyperlegibleNext_700Bold.ttf`),
};

export const INK = '#1b1813';
export const MUTED = '#4a4131';
export const ACCENT = '#7b4f14';
export const MARGIN = 50;

export type Doc = InstanceType<typeof PDFDocument>;

/** An A4 document with the app's face registered as 'body' and 'bold'. */
export function a4Document(info: PDFKit.DocumentInfo): Doc {
  const doc = new PDFDocument({ size: 'A4', margin: MARGIN, info });
  doc.registerFont('body', FONTS.body);
  doc.registerFont('bold', FONTS.bold);
  return doc;
}

/**
 * Ends the document and returns its bytes. pdfkit writes synchronously into its readable buffer,
 * so the whole PDF is there to read out at once.
 */
export function finishDocument(doc: Doc): Buffer {
  doc.end();
  const chunks: Buffer[] = [];
  for (let chunk = doc.read(); chunk !== null; chunk = doc.read()) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

export const width = (doc: Doc) => doc.page.width - 2 * MARGIN;

/** A titled column of label/value lines at (x, y); returns where it ends. */
export function factBlock(
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

/** One table row across the page, columns sized as shares of its width; a new page when it would not fit. */
export function tableRow(doc: Doc, columns: Array<{ w: number }>, cells: string[], bold: boolean) {
  const total = width(doc);
  doc.font(bold ? 'bold' : 'body').fontSize(9);
  const height =
    Math.max(
      ...cells.map((text, i) => doc.heightOfString(text, { width: columns[i].w * total - 6 })),
    ) + 8;
  if (doc.y + height > doc.page.height - MARGIN) doc.addPage();
  const y = doc.y;
  let x = MARGIN;
  cells.forEach((text, i) => {
    doc.fillColor(INK).text(text, x + 3, y + 4, { width: columns[i].w * total - 6 });
    x += columns[i].w * total;
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
