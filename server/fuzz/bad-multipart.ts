import fc from 'fast-check';
import type { BadBody } from './bad-values.js';

/*
 * Multipart bodies, the upload's format: mostly well formed, so the form reader gets past the
 * boundary to field names with brackets (read as nested objects and arrays), odd file names and
 * types, repeated and missing parts; sometimes cut off. No value names a real record, so an
 * upload built from them finds nothing to attach to.
 */

const BOUNDARY = 'ringseat-fuzz-boundary';

const fieldName = fc.oneof(
  fc.constantFrom(
    'file',
    'recordType',
    'recordId',
    'id',
    'caption',
    'file[]',
    'recordType[]',
    'recordId[0]',
    'a[b][c]',
    'file[99999999]',
    '__proto__[polluted]',
    'constructor[prototype][x]',
    '',
  ),
  fc.stringMatching(/^[A-Za-z0-9_[\]-]{1,20}$/),
);

const fieldValue = fc.oneof(
  fc.constantFrom('engine', 'run', 'checklist', 'service', '', 'x'.repeat(3000)),
  fc.uuid(),
  fc.string({ unit: 'grapheme', maxLength: 60 }),
);

const filePart = fc.record({
  filename: fc.oneof(
    fc.constantFrom('photo.jpg', 'Skrue-\u00f8.jpg', '../../etc/passwd', '', '"quoted".pdf'),
    fc.string({ unit: 'grapheme', maxLength: 40 }).map((name) => name.replace(/["\r\n]/g, '_')),
  ),
  type: fc.constantFrom('image/jpeg', 'image/png', 'application/pdf', 'text/html', 'x/y'),
  content: fc.oneof(
    fc.constantFrom('\u00ff\u00d8\u00ff\u00e0', '%PDF-1.7', '\u0089PNG\r\n\u001a\n', ''),
    fc.string({ unit: 'binary-ascii', maxLength: 200 }),
  ),
});

const part = fc.record({
  name: fieldName,
  value: fieldValue,
  file: fc.option(filePart, { nil: undefined }),
});

type Part = typeof part extends fc.Arbitrary<infer T> ? T : never;

function partText({ name, value, file }: Part): string {
  const disposition = `form-data; name="${name.replace(/"/g, '')}"`;
  if (!file) return `--${BOUNDARY}\r\nContent-Disposition: ${disposition}\r\n\r\n${value}\r\n`;
  return (
    `--${BOUNDARY}\r\nContent-Disposition: ${disposition}; filename="${file.filename}"\r\n` +
    `Content-Type: ${file.type}\r\n\r\n${file.content}\r\n`
  );
}

/** A multipart form of up to a dozen parts (past the upload's limit of ten), whole or cut short. */
export const multipartBody: fc.Arbitrary<BadBody> = fc
  .record({
    parts: fc.array(part, { maxLength: 12 }),
    ending: fc.constantFrom(`--${BOUNDARY}--\r\n`, '', `--${BOUNDARY}`, 'garbage'),
    boundary: fc.constantFrom(BOUNDARY, BOUNDARY, BOUNDARY, '', 'other'),
  })
  .map(({ parts, ending, boundary }) => ({
    text: parts.map(partText).join('') + ending || '\r\n',
    contentType: `multipart/form-data${boundary ? `; boundary=${boundary}` : ''}`,
  }));
