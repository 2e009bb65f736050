import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { percentToShare, shareToPercent } from './band-units';
import { bandWords } from './program-words';

describe('band units', () => {
  it('turns shares into percent with one decimal', () => {
    expect(shareToPercent(0.5)).toBe(50); // half of rated rpm (the half-throttle phase, common practice)
    expect(shareToPercent(0.75)).toBe(75); // three-quarter (common practice)
    expect(shareToPercent(1 / 3)).toBe(33.3);
    expect(shareToPercent(0.29)).toBe(29); // 0.29 × 100 is 28.999… in floating point
    expect(shareToPercent(0)).toBe(0);
    expect(shareToPercent(1)).toBe(100);
  });

  it('turns percent into a share with three decimals', () => {
    expect(percentToShare(50)).toBe(0.5);
    expect(percentToShare(33.33)).toBe(0.333);
    expect(percentToShare(57)).toBe(0.57);
    expect(percentToShare(100)).toBe(1);
  });

  it('gives back the same percent after a round trip through the stored share', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1000 }), (tenths) => {
        const percent = tenths / 10;
        expect(shareToPercent(percentToShare(percent))).toBe(percent);
      }),
    );
  });

  it('writes a share band in percent, never as a 0–1 share', () => {
    expect(bandWords({ kind: 'share-of-rated', shareMin: 0.3, shareMax: 0.57 })).toBe(
      '30–57 % of rated full-throttle rpm',
    );
    expect(bandWords({ kind: 'absolute', rpmMin: 2000, rpmMax: 4500 })).toBe('2000–4500 rpm');
  });
});
