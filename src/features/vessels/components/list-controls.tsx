import type { ReactNode } from 'react';
import type { ListStatus } from '../../../../shared/vessels/vessel.schema';
import { SelectField, TextField } from '../../../components/ui/field';

/** Search and filters above a list. Changes apply as they are made; nothing to submit. */
export function ListControls({
  label,
  hint,
  q,
  onSearch,
  status,
  onStatus,
  children,
}: {
  label: string;
  hint: string;
  q: string;
  onSearch: (q: string) => void;
  status: ListStatus;
  onStatus: (status: ListStatus) => void;
  children?: ReactNode;
}) {
  return (
    <search className="grid gap-3 sm:grid-cols-[2fr_1fr_1fr] sm:items-end" aria-label={label}>
      {/* type="text": the browser's own clear button for type="search" is drawn blue, which breaks the night palette. */}
      <TextField
        label="Search"
        type="text"
        enterKeyHint="search"
        value={q}
        autoComplete="off"
        spellCheck={false}
        onChange={(e) => onSearch(e.target.value)}
        hint={hint}
      />
      <SelectField
        label="Show"
        value={status}
        onChange={(e) => onStatus(e.target.value as ListStatus)}
      >
        <option value="active">In use</option>
        <option value="archived">Archived</option>
        <option value="all">All</option>
      </SelectField>
      {children}
    </search>
  );
}
