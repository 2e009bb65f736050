import { Checkbox } from '../../../components/ui/checkbox';

export interface VesselOption {
  id: string;
  name: string;
}

interface VesselChoiceProps {
  vessels: VesselOption[];
  value: string[];
  onChange: (ids: string[]) => void;
  error?: string;
}

/** Checkboxes for the vessels an invited skipper is linked to. */
export function VesselChoice({ vessels, value, onChange, error }: VesselChoiceProps) {
  const toggle = (id: string, checked: boolean) =>
    onChange(checked ? [...value, id] : value.filter((chosen) => chosen !== id));
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="font-semibold">Link to vessels (optional)</legend>
      {vessels.map((vessel) => (
        <Checkbox
          key={vessel.id}
          checked={value.includes(vessel.id)}
          onChange={(event) => toggle(vessel.id, event.target.checked)}
        >
          {vessel.name}
        </Checkbox>
      ))}
      {error && <p className="text-sm font-semibold text-danger">⚠ {error}</p>}
    </fieldset>
  );
}
