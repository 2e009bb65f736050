import type { ComponentProps, ReactNode } from 'react';
import { cx } from './cx';

interface CardProps extends Omit<ComponentProps<'section'>, 'title'> {
  title?: ReactNode;
  /** Heading level of the title inside the page outline. */
  level?: 2 | 3;
  /** A heavier frame, for cautions. */
  strong?: boolean;
}

export function Card({
  title,
  level = 2,
  strong = false,
  className,
  children,
  ...rest
}: CardProps) {
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <section
      className={cx(
        'rounded-lg bg-surface p-4 sm:p-5',
        strong ? 'border-4 border-ink' : 'border-2 border-line',
        className,
      )}
      {...rest}
    >
      {title && <Heading className="mb-3 text-lg font-bold">{title}</Heading>}
      {children}
    </section>
  );
}
