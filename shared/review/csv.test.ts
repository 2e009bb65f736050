import { describe, expect, it } from 'vitest';
import { csvCell, csvLine } from './csv';

describe('CSV export cells', () => {
  it('quotes commas, quotes and line breaks as RFC 4180 asks and ends lines with CRLF', () => {
    expect(csvLine(['plain', 'a, b', 'say "ok"', 'two\nlines'])).toBe(
      'plain,"a, b","say ""ok""","two\nlines"\r\n',
    );
  });

  it('writes numbers bare, yes/no for booleans and nothing for missing values', () => {
    expect(csvLine([3150, 12.5, true, false, null, undefined, Number.NaN])).toBe(
      '3150,12.5,yes,no,,,\r\n',
    );
  });

  it('keeps a note that looks like a formula from running in a spreadsheet', () => {
    expect(csvCell('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvCell('+1 knot')).toBe("'+1 knot");
    expect(csvCell('@home')).toBe("'@home");
    expect(csvCell(-3)).toBe('-3');
  });
});
