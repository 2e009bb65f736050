import type { ComponentProps } from 'react';
import { cx } from './cx';

export function Table({ className, ...rest }: ComponentProps<'table'>) {
  return (
    <div className="overflow-x-auto rounded-lg border-2 border-line">
      <table className={cx('w-full border-collapse bg-surface text-left', className)} {...rest} />
    </div>
  );
}

export function Th({ className, ...rest }: ComponentProps<'th'>) {
  return (
    <th
      scope="col"
      className={cx('border-b-2 border-line bg-sunk px-3 py-2 font-bold', className)}
      {...rest}
    />
  );
}

export function Td({ className, ...rest }: ComponentProps<'td'>) {
  return <td className={cx('border-b border-line px-3 py-2 align-top', className)} {...rest} />;
}
