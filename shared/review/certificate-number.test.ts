import { describe, expect, it } from 'vitest';
import {
  certificateNumber,
  isCertificateNumber,
  luhnCheckDigit,
  workshopInitials,
} from './certificate-number';

describe('certificate numbers', () => {
  it('uses the Luhn check digit', () => {
    // 7992739871 → 3: the worked example of the Luhn algorithm (ISO/IEC 7812-1 Annex B; widely reproduced).
    expect(luhnCheckDigit('7992739871')).toBe(3);
    // Hand-worked: 2 0 2 6 0 0 0 7 → doubled from the right 14→5, 0, 12→3, 0 … sum 12 → 8.
    expect(luhnCheckDigit('20260007')).toBe(8);
  });

  it('reads workshop initials, year, running number and check digit', () => {
    expect(workshopInitials('Tidewright Marine Works')).toBe('TMW');
    expect(workshopInitials('Émile\u2019s Boat Yard')).toBe('EBY');
    expect(workshopInitials('!!!')).toBe('RS');
    expect(certificateNumber({ initials: 'TMW', year: 2026, sequence: 7 })).toBe('TMW-2026-0007-8');
  });

  it('catches a mistyped digit and accepts the real number', () => {
    expect(isCertificateNumber('TMW-2026-0007-8')).toBe(true);
    expect(isCertificateNumber('tmw-2026-0007-8')).toBe(true);
    expect(isCertificateNumber('TMW-2026-0001-8')).toBe(false);
    expect(isCertificateNumber('TMW-2062-0007-8')).toBe(false);
    expect(isCertificateNumber('TMW-2026-0007')).toBe(false);
  });
});
