export interface Stretch {
  fromMs: number;
  toMs: number;
}

export const stretchMs = (s: Stretch): number => s.toMs - s.fromMs;

/**
 * Follows one kind of stretch (full throttle, idling, over the band) through a phase's
 * segments fed in time order. Back-to-back segments (one ends where the next starts) that
 * belong join up; a gap, such as a session stop or an expired hold, ends the stretch. Only
 * stretches longer than `longerThanMs` are kept, so a long run allocates next to nothing.
 */
export class StretchTracker {
  readonly kept: Stretch[] = [];
  private fromMs = 0;
  private toMs = Number.NaN; // NaN: nothing open, and never equal to a segment's start

  constructor(private readonly longerThanMs = 0) {}

  add(fromMs: number, toMs: number, belongs: boolean): void {
    if (belongs && this.toMs === fromMs) {
      this.toMs = toMs;
      return;
    }
    this.close();
    if (belongs) {
      this.fromMs = fromMs;
      this.toMs = toMs;
    }
  }

  close(): void {
    if (this.toMs - this.fromMs > this.longerThanMs)
      this.kept.push({ fromMs: this.fromMs, toMs: this.toMs });
    this.toMs = Number.NaN;
  }
}

/**
 * A change of at least 200 rpm counts as a change of speed (common practice, no single
 * source). Smaller wobbles from waves or a hand on the lever do not.
 */
export const SPEED_CHANGE_MIN_RPM = 200;

export interface SteadyStretch extends Stretch {
  /** The rpm the stretch started at; every reading in it stayed within the threshold of it. */
  rpm: number;
}

/**
 * Follows stretches with no change of speed. Each is measured against the rpm it began at,
 * so a slow drift still ends it once it adds up to a real change.
 */
export class SteadyTracker {
  readonly kept: SteadyStretch[] = [];
  private fromMs = 0;
  private toMs = Number.NaN;
  private rpm = 0;

  constructor(
    private readonly longerThanMs = 0,
    private readonly minChangeRpm = SPEED_CHANGE_MIN_RPM,
  ) {}

  add(fromMs: number, toMs: number, rpm: number, counts: boolean): void {
    if (counts && this.toMs === fromMs && Math.abs(rpm - this.rpm) < this.minChangeRpm) {
      this.toMs = toMs;
      return;
    }
    this.close();
    if (counts) {
      this.fromMs = fromMs;
      this.toMs = toMs;
      this.rpm = rpm;
    }
  }

  close(): void {
    if (this.toMs - this.fromMs > this.longerThanMs)
      this.kept.push({ fromMs: this.fromMs, toMs: this.toMs, rpm: this.rpm });
    this.toMs = Number.NaN;
  }
}

export interface WindowTotal extends Stretch {
  totalMs: number;
}

/**
 * The most stretch time inside any window of `windowMs`, e.g. full throttle in any rolling
 * hour. The best window always starts where some stretch starts, so only those starts are
 * tried, with two pointers: O(n) over stretches sorted by time and not overlapping.
 */
export function maxTotalInWindow(stretches: readonly Stretch[], windowMs: number): WindowTotal {
  let best: WindowTotal = { fromMs: 0, toMs: 0, totalMs: 0 };
  let whole = 0; // total of stretches [i, j), which end inside the window
  let j = 0;
  for (let i = 0; i < stretches.length; i++) {
    if (j < i) {
      j = i;
      whole = 0;
    }
    const windowEnd = stretches[i].fromMs + windowMs;
    while (j < stretches.length && stretches[j].toMs <= windowEnd)
      whole += stretchMs(stretches[j++]);
    const partial = j < stretches.length ? Math.max(0, windowEnd - stretches[j].fromMs) : 0;
    if (whole + partial > best.totalMs)
      best = { fromMs: stretches[i].fromMs, toMs: windowEnd, totalMs: whole + partial };
    if (j > i) whole -= stretchMs(stretches[i]);
  }
  return best;
}
