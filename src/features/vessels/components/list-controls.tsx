import type { ReactNode } from 'react';
import { VESSEL_TYPES, type ListStatus } from '../../../../shared/vessels/vessel.schema';
import { VESSEL_TYPE_WORDS } from '../../../../shared/vessels/vessel-words';
import { SelectField, TextField } from '../../../components/ui/field';
import type { ChecklistState } from './status-pills';

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

/** The vessel list's extra filter: one type, or any. */
export function VesselTypeFilter({
  value,
  onChange,
}: {
  value: string;
  onChange: (type: string) => void;
}) {
  return (
    <SelectField label="Type" value={value} onChange={(e) => onChange(e.target.value)}>
      <option value="">Any type</option>
      {VESSEL_TYPES.map((t) => (
        <option key={t} value={t}>
          {VESSEL_TYPE_WORDS[t]}
        </option>
      ))}
    </SelectField>
  );
}

/** The engine list's extra filter: how far the commissioning checklist has got, or any. */
export function ChecklistFilter({
  value,
  onChange,
}: {
  value: string;
  onChange: (state: ChecklistState | '') => void;
}) {
  return (
    <SelectField
      label="Checklist"
      value={value}
      onChange={(e) => onChange(e.target.value as ChecklistState | '')}
    >
      <option value="">Any state</option>
      <option value="not-started">Not started</option>
      <option value="in-progress">Started, not completed</option>
      <option value="completed">Completed</option>
    </SelectField>
  );
}
