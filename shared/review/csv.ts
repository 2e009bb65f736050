/*
 * CSV as RFC 4180 describes it: comma-separated, CRLF line ends, a field quoted when it holds a
 * comma, quote or line break, quotes doubled inside. Text that a spreadsheet would run as a
 * formula (starting with = + - @ or a tab) gets a leading apostrophe (OWASP "CSV Injection").
 */
export type CsvCell = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: CsvCell): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export const csvLine = (cells: readonly CsvCell[]): string => `${cells.map(csvCell).join(',')}\r\n`;
