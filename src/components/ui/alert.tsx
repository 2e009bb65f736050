import type { ReactNode } from 'react';
import { cx } from './cx';

/** A message that is announced as soon as it appears (server errors, sign-in refusals). */
export function Alert({
  title,
  children,
  className,
}: {
  title?: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div
      role="alert"
      className={cx('rounded-md border-2 border-danger bg-surface p-3 text-ink', className)}
    >
      {title && <p className="font-bold text-danger">{title}</p>}
      <div>{children}</div>
    </div>
  );
}
