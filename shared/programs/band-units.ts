/*
 * A share band is stored as a share of rated full-throttle rpm (0 to 1) but entered and shown in
 * percent. Percent keeps one decimal (a tenth of a percent is about 6 rpm on a 6000 rpm engine,
 * below what a helm tachometer shows), so a share keeps three: converting back and forth is exact.
 */

/** 0.5 → 50; 0.3333 → 33.3. */
export const shareToPercent = (share: number): number => Math.round(share * 1000) / 10;

/** 50 → 0.5; 33.33 → 0.333. */
export const percentToShare = (percent: number): number => Math.round(percent * 10) / 1000;
