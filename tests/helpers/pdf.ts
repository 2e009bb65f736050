import { PDFParse } from 'pdf-parse';
import type TestAgent from 'supertest/lib/agent.js';

/** A run's certificate as bytes (supertest would otherwise try to read the PDF as text). */
export function certificatePdf(agent: TestAgent, runId: string) {
  return agent
    .get(`/api/runs/${runId}/certificate`)
    .buffer(true)
    .parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });
}

/** The PDF's text with every run of white space as one space. */
export async function pdfText(pdf: Buffer): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}
