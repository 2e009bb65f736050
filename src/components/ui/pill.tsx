import type { ReactNode } from 'react';
import { cx } from './cx';

type Tone = 'solid' | 'outline' | 'quiet';

const tones: Record<Tone, string> = {
  solid: 'bg-ink text-paper border-ink',
  outline: 'border-ink text-ink',
  quiet: 'border-line text-muted',
};

/** A short label for a state. Tone is a shape as well as a colour, so it also reads in glare. */
export function Pill({
  tone = 'outline',
  children,
  className,
}: {
  tone?: Tone;
  children: ReactNode;
  className?: string;
}) {
  return (
    <span
      className={cx(
        'inline-flex items-center gap-1 rounded-full border-2 px-2.5 py-0.5 text-sm font-semibold',
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
