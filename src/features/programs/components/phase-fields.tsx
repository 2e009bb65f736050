import { useFormContext } from 'react-hook-form';
import { CEILING_WORDS, PERFORMED_BY_WORDS } from '../../../../shared/programs/program-words';
import { THROTTLE_CEILINGS } from '../../../../shared/programs/throttle';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { controlClass, Field, SelectField, TextField } from '../../../components/ui/field';
import { errorAt, numberOptions, type ProgramFormValues } from '../form-values';
import { BandFields } from './band-fields';
import { RulesFields } from './rules-fields';

interface PhaseFieldsProps {
  index: number;
  count: number;
  onMove: (from: number, to: number) => void;
  onRemove: (index: number) => void;
}

const PERFORMERS = ['workshop', 'skipper'] as const;

/** Who runs the phase, how long it must run in band, and its throttle ceiling. */
function PhaseBasics({ index }: { index: number }) {
  const { register, formState } = useFormContext<ProgramFormValues>();
  const base = `phases.${index}` as const;
  const error = (name: string) => errorAt(formState.errors, `${base}.${name}`);
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      <SelectField
        label="Performed by"
        error={error('performedBy')}
        {...register(`${base}.performedBy`)}
      >
        {PERFORMERS.map((who) => (
          <option key={who} value={who}>
            {PERFORMED_BY_WORDS[who]}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Required minutes in band"
        inputMode="numeric"
        error={error('requiredMinutes')}
        {...register(`${base}.requiredMinutes`, numberOptions)}
      />
      <SelectField
        label="Throttle ceiling"
        error={error('throttleCeiling')}
        {...register(`${base}.throttleCeiling`)}
      >
        {THROTTLE_CEILINGS.map((ceiling) => (
          <option key={ceiling} value={ceiling}>
            {CEILING_WORDS[ceiling]}
          </option>
        ))}
      </SelectField>
    </div>
  );
}

function PhaseMoves({ index, count, onMove, onRemove }: PhaseFieldsProps) {
  return (
    <div className="flex flex-wrap gap-2">
      <Button variant="secondary" disabled={index === 0} onClick={() => onMove(index, index - 1)}>
        Move up
      </Button>
      <Button
        variant="secondary"
        disabled={index === count - 1}
        onClick={() => onMove(index, index + 1)}
      >
        Move down
      </Button>
      <Button variant="secondary" disabled={count === 1} onClick={() => onRemove(index)}>
        Remove phase
      </Button>
    </div>
  );
}

export function PhaseFields({ index, count, onMove, onRemove }: PhaseFieldsProps) {
  const { register, formState } = useFormContext<ProgramFormValues>();
  const base = `phases.${index}` as const;
  const error = (name: string) => errorAt(formState.errors, `${base}.${name}`);
  return (
    <Card title={`Phase ${index + 1}`} level={3} aria-label={`Phase ${index + 1}`}>
      <div className="flex flex-col gap-4">
        <TextField label="Phase name" error={error('name')} {...register(`${base}.name`)} />
        <PhaseBasics index={index} />
        <BandFields index={index} />
        <RulesFields index={index} />
        <Field label="Instructions" error={error('instructions')}>
          {(control) => (
            <textarea
              {...control}
              rows={3}
              className={`${controlClass} py-2`}
              {...register(`${base}.instructions`)}
            />
          )}
        </Field>
        <PhaseMoves index={index} count={count} onMove={onMove} onRemove={onRemove} />
      </div>
    </Card>
  );
}
