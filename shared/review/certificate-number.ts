/*
 * Certificate numbers: workshop initials, year, a running number within the workshop, and a
 * check digit so a number read out over the phone or typed from paper is caught when mistyped.
 * e.g. TMW-2026-0007-8. The check digit is the Luhn mod-10 digit over the year and running
 * number (ISO/IEC 7812-1 Annex B; the same scheme payment cards use).
 */

/** Up to three initials from the workshop's name, letters only; "RS" when there are none. */
export function workshopInitials(name: string): string {
  const words = name
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .replace(/['\u2019]/g, '')
    .replace(/[^A-Za-z\s]/g, ' ')
    .split(/\s+/)
    .filter(Boolean);
  const initials = words
    .slice(0, 3)
    .map((w) => w[0].toUpperCase())
    .join('');
  return initials || 'RS';
}

/** The Luhn check digit for a string of digits. */
export function luhnCheckDigit(digits: string): number {
  let sum = 0;
  // Counting from the right, every second digit (starting with the rightmost) is doubled.
  for (let i = digits.length - 1, double = true; i >= 0; i--, double = !double) {
    let d = Number(digits[i]);
    if (double) {
      d *= 2;
      if (d > 9) d -= 9;
    }
    sum += d;
  }
  return (10 - (sum % 10)) % 10;
}

export function certificateNumber(parts: {
  initials: string;
  year: number;
  sequence: number;
}): string {
  const running = String(parts.sequence).padStart(4, '0');
  return `${parts.initials}-${parts.year}-${running}-${luhnCheckDigit(`${parts.year}${running}`)}`;
}

const NUMBER_PATTERN = /^([A-Z]{1,3})-(\d{4})-(\d{4,})-(\d)$/;

/** True when the text is a certificate number with a matching check digit. */
export function isCertificateNumber(text: string): boolean {
  const match = NUMBER_PATTERN.exec(text.trim().toUpperCase());
  if (!match) return false;
  const [, , year, running, check] = match;
  return luhnCheckDigit(`${year}${running}`) === Number(check);
}
