/**
 * Text fields to the numbers the shared schemas check. Empty means "not entered" (null); a comma
 * counts as the decimal point, as many workshops type it; anything else becomes NaN, which the
 * schema answers with "… must be a number." naming the field.
 */
export const toNumberOrNull = (value: unknown): number | null => {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number') return value;
  const text = String(value).trim().replace(',', '.');
  return text === '' ? null : Number(text);
};

export const toTextOrNull = (value: unknown): string | null => {
  const text = value === null || value === undefined ? '' : String(value).trim();
  return text === '' ? null : text;
};
