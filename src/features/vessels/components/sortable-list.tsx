import type { ReactNode } from 'react';
import { Table } from '../../../components/ui/table';
import type { SortState } from '../use-sorting';
import { SortableTh, SortSelect } from './sortable-th';

interface SortableListProps<T extends { id: string }, K extends string> {
  /** What the rows are ("Engines"): names the card list and the table's caption. */
  noun: string;
  rows: T[];
  /** The columns shown, in order. */
  columns: K[];
  labels: Record<K, string>;
  sort: SortState<K>;
  sortBy: (key: K) => void;
  setSort: (sort: SortState<K>) => void;
  /** The cells of one table row. */
  cells: (row: T) => ReactNode;
  card: (row: T) => ReactNode;
}

/** Rows as a sortable table on wide screens and as cards, with a sort select, on phones. */
export function SortableList<T extends { id: string }, K extends string>({
  noun,
  rows,
  columns,
  labels,
  sort,
  sortBy,
  setSort,
  cells,
  card,
}: SortableListProps<T, K>) {
  const options = Object.fromEntries(columns.map((c) => [c, labels[c]])) as Record<K, string>;
  return (
    <>
      {/* display:none keeps the hidden layout out of the accessibility tree. */}
      <div className="hidden sm:block">
        <Table>
          <caption className="sr-only">{noun}, sortable by each column</caption>
          <thead>
            <tr>
              {columns.map((c) => (
                <SortableTh key={c} column={c} label={labels[c]} sort={sort} onSort={sortBy} />
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.id}>{cells(row)}</tr>
            ))}
          </tbody>
        </Table>
      </div>
      <div className="flex flex-col gap-3 sm:hidden">
        <SortSelect options={options} sort={sort} onChange={setSort} />
        <ul className="flex flex-col gap-3" aria-label={noun}>
          {rows.map((row) => (
            <li key={row.id}>{card(row)}</li>
          ))}
        </ul>
      </div>
    </>
  );
}
