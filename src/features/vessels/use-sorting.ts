import { useMemo, useState } from 'react';

export type SortDirection = 'ascending' | 'descending';
export interface SortState<K extends string> {
  key: K;
  direction: SortDirection;
}
export type SortValue = string | number | null;

const compare = (a: SortValue, b: SortValue) => {
  // Empty values go last whichever way the column is sorted.
  if (a === null || a === '') return b === null || b === '' ? 0 : 1;
  if (b === null || b === '') return -1;
  return typeof a === 'number' && typeof b === 'number'
    ? a - b
    : String(a).localeCompare(String(b), 'en-GB', { numeric: true, sensitivity: 'base' });
};

/** Rows sorted by one column; choosing the same column again flips the direction. */
export function useSorting<T, K extends string>(
  rows: T[],
  columns: Record<K, (row: T) => SortValue>,
  initial: SortState<K>,
) {
  const [sort, setSort] = useState<SortState<K>>(initial);
  const sorted = useMemo(() => {
    const valueOf = columns[sort.key];
    const sign = sort.direction === 'ascending' ? 1 : -1;
    return [...rows].sort((a, b) => {
      const [va, vb] = [valueOf(a), valueOf(b)];
      if (va === null || vb === null || va === '' || vb === '') return compare(va, vb);
      return sign * compare(va, vb);
    });
  }, [rows, columns, sort]);
  const sortBy = (key: K) =>
    setSort((current) => ({
      key,
      direction:
        current.key === key && current.direction === 'ascending' ? 'descending' : 'ascending',
    }));
  return { sorted, sort, sortBy, setSort };
}
