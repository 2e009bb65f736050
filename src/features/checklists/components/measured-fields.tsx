import type { ChecklistEvaluation } from '../../../../shared/checklists/evaluate-checklist';
import { signalSourceOf } from '../../../../shared/checklists/evaluate-tachometer';
import type { ChecklistEngine } from '../../../../shared/checklists/evaluation';
import { CHEMISTRY_LIMITS, type BatteryChemistry } from '../../../../shared/charging/chemistry';
import { Checkbox } from '../../../components/ui/checkbox';
import { SelectField } from '../../../components/ui/field';
import { toChoiceOrNull } from '../form-values';
import { MeasuredItem, MeasureField, numberOptions, type FieldsProps } from './measured-item';

type ErrorsOf = Record<string, { message?: string } | undefined> | undefined;
const errorsOf = (
  errors: FieldsProps['errors'],
  section: 'tachometer' | 'charging' | 'idleInGear' | 'fullThrottle',
) => errors[section] as ErrorsOf;

export function TachometerFields({
  register,
  errors,
  hasSignal,
}: FieldsProps & { hasSignal: boolean }) {
  const e = errorsOf(errors, 'tachometer');
  return (
    <>
      <MeasureField
        label="Measured frequency (Hz)"
        error={e?.measuredHz?.message}
        registration={register('tachometer.measuredHz', numberOptions)}
        hint={
          hasSignal
            ? 'AC at the coil or alternator tachometer terminal'
            : 'The engine record has no coil or alternator signal: use a hand-held tachometer'
        }
      />
      <MeasureField
        label="Hand-held tachometer (RPM)"
        whole
        hint="Optical or contact tachometer, if used instead"
        error={e?.referenceRpm?.message}
        registration={register('tachometer.referenceRpm', numberOptions)}
      />
      <MeasureField
        label="Helm tachometer showed (RPM)"
        whole
        error={e?.tachReadingRpm?.message}
        registration={register('tachometer.tachReadingRpm', numberOptions)}
      />
    </>
  );
}

export function ChargingFields({ register, errors }: FieldsProps) {
  const e = errorsOf(errors, 'charging');
  return (
    <>
      <SelectField
        label="Battery chemistry"
        error={e?.chemistry?.message}
        {...register('charging.chemistry', { setValueAs: toChoiceOrNull })}
      >
        <option value="">Choose…</option>
        {(Object.keys(CHEMISTRY_LIMITS) as BatteryChemistry[]).map((c) => (
          <option key={c} value={c}>
            {CHEMISTRY_LIMITS[c].label}
          </option>
        ))}
      </SelectField>
      <MeasureField
        label="Voltage at the battery (V)"
        error={e?.measuredV?.message}
        registration={register('charging.measuredV', numberOptions)}
      />
      <MeasureField
        label="Engine RPM during the check"
        whole
        hint="Cruising RPM"
        error={e?.atRpm?.message}
        registration={register('charging.atRpm', numberOptions)}
      />
      <MeasureField
        label="Battery temperature (°C)"
        hint="Leave empty to use 25 °C"
        error={e?.batteryTemperatureC?.message}
        registration={register('charging.batteryTemperatureC', numberOptions)}
      />
      <div className="flex items-end">
        <Checkbox {...register('charging.sustained')}>
          Held for minutes, not a passing spike
        </Checkbox>
      </div>
    </>
  );
}

export function IdleFields({ register, errors }: FieldsProps) {
  const e = errorsOf(errors, 'idleInGear');
  return (
    <>
      <MeasureField
        label="Maker's idle in gear, low (RPM)"
        whole
        hint="From the engine manual"
        error={e?.specMinRpm?.message}
        registration={register('idleInGear.specMinRpm', numberOptions)}
      />
      <MeasureField
        label="Maker's idle in gear, high (RPM)"
        whole
        error={e?.specMaxRpm?.message}
        registration={register('idleInGear.specMaxRpm', numberOptions)}
      />
      <MeasureField
        label="Measured idle in gear (RPM)"
        whole
        error={e?.idleRpm?.message}
        registration={register('idleInGear.idleRpm', numberOptions)}
      />
    </>
  );
}

export function FullThrottleFields({ register, errors }: FieldsProps) {
  const e = errorsOf(errors, 'fullThrottle');
  return (
    <>
      <MeasureField
        label="Full-throttle RPM"
        whole
        error={e?.rpm?.message}
        registration={register('fullThrottle.rpm', numberOptions)}
      />
      <MeasureField
        label="Speed over ground (kn)"
        hint="Optional: gives the propeller slip"
        error={e?.speedKn?.message}
        registration={register('fullThrottle.speedKn', numberOptions)}
      />
    </>
  );
}

/** The four items measured at handover, each with its verdict from the live evaluation. */
export function MeasuredItems({
  fields,
  evaluation,
  engine,
}: {
  fields: FieldsProps;
  evaluation: ChecklistEvaluation;
  engine: ChecklistEngine;
}) {
  const byId = new Map(evaluation.items.map((item) => [item.id, item]));
  return (
    <>
      <MeasuredItem id="tachometer" evaluation={byId.get('tachometer')!} {...fields}>
        <TachometerFields {...fields} hasSignal={signalSourceOf(engine) !== null} />
      </MeasuredItem>
      <MeasuredItem id="charging" evaluation={byId.get('charging')!} {...fields}>
        <ChargingFields {...fields} />
      </MeasuredItem>
      <MeasuredItem id="idleInGear" evaluation={byId.get('idleInGear')!} {...fields}>
        <IdleFields {...fields} />
      </MeasuredItem>
      <MeasuredItem id="fullThrottle" evaluation={byId.get('fullThrottle')!} {...fields}>
        <FullThrottleFields {...fields} />
      </MeasuredItem>
    </>
  );
}
