import type { SortState } from '../use-sorting';

/** A column header that sorts the table; aria-sort tells screen readers which way. */
export function SortableTh<K extends string>({
  column,
  label,
  sort,
  onSort,
}: {
  column: K;
  label: string;
  sort: SortState<K>;
  onSort: (key: K) => void;
}) {
  const active = sort.key === column;
  const arrow = !active ? '↕' : sort.direction === 'ascending' ? '▲' : '▼';
  return (
    <th
      scope="col"
      aria-sort={active ? sort.direction : 'none'}
      className="border-b-2 border-line bg-sunk p-0 font-bold"
    >
      <button
        type="button"
        onClick={() => onSort(column)}
        className="flex min-h-touch w-full items-center gap-2 px-3 text-left font-bold hover:underline"
      >
        <span>{label}</span>
        <span aria-hidden="true" className={active ? 'text-ink' : 'text-muted'}>
          {arrow}
        </span>
      </button>
    </th>
  );
}

/** The same choice as a select, for the cards on phones where there are no column headers. */
export function SortSelect<K extends string>({
  options,
  sort,
  onChange,
}: {
  options: Record<K, string>;
  sort: SortState<K>;
  onChange: (sort: SortState<K>) => void;
}) {
  const value = `${sort.key}:${sort.direction}`;
  return (
    <label className="flex flex-col gap-1 font-semibold">
      Sort by
      <select
        value={value}
        className="min-h-touch rounded-md border-2 border-line bg-surface px-3 text-ink"
        onChange={(e) => {
          const [key, direction] = e.target.value.split(':') as [K, SortState<K>['direction']];
          onChange({ key, direction });
        }}
      >
        {(Object.entries(options) as Array<[K, string]>).flatMap(([key, label]) => [
          <option key={`${key}:ascending`} value={`${key}:ascending`}>
            {label} (A–Z, low–high)
          </option>,
          <option key={`${key}:descending`} value={`${key}:descending`}>
            {label} (Z–A, high–low)
          </option>,
        ])}
      </select>
    </label>
  );
}
