import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import {
  ENGINE_POSITIONS,
  INSTALLATIONS,
  installationLabel,
  positionLabel,
  TACH_SOURCES,
  tachSourceLabel,
  type EngineFormInput,
} from '../../../../shared/engines/engine.schema';
import { SelectField, TextField } from '../../../components/ui/field';
import { toNumberOrNull, toTextOrNull } from '../form-values';

export interface SectionProps {
  register: UseFormRegister<EngineFormInput>;
  errors: FieldErrors<EngineFormInput>;
}

type NumberName =
  | 'ratedPowerKw'
  | 'ratedRpmMin'
  | 'ratedRpmMax'
  | 'gearRatio'
  | 'propBlades'
  | 'propDiameterIn'
  | 'propPitchIn'
  | 'poles'
  | 'pulleyRatio'
  | 'hourMeterAtCommissioning';

function NumberField({
  name,
  label,
  hint,
  whole = false,
  register,
  errors,
}: SectionProps & { name: NumberName; label: string; hint?: string; whole?: boolean }) {
  return (
    <TextField
      label={label}
      hint={hint}
      inputMode={whole ? 'numeric' : 'decimal'}
      autoComplete="off"
      className="figures"
      error={errors[name]?.message}
      {...register(name, { setValueAs: toNumberOrNull })}
    />
  );
}

export function Fieldset({ legend, children }: { legend: string; children: React.ReactNode }) {
  return (
    <fieldset className="grid gap-4 rounded-lg border-2 border-line p-3 sm:grid-cols-2 sm:p-4 lg:grid-cols-3">
      <legend className="px-1 text-lg font-bold">{legend}</legend>
      {children}
    </fieldset>
  );
}

export function IdentityFields({ register, errors }: SectionProps) {
  return (
    <Fieldset legend="Engine">
      <SelectField label="Position" error={errors.position?.message} {...register('position')}>
        {ENGINE_POSITIONS.map((p) => (
          <option key={p} value={p}>
            {positionLabel[p]}
          </option>
        ))}
      </SelectField>
      <SelectField
        label="Installation"
        error={errors.installation?.message}
        {...register('installation')}
      >
        {INSTALLATIONS.map((i) => (
          <option key={i} value={i}>
            {installationLabel[i]}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Maker"
        autoComplete="off"
        error={errors.maker?.message}
        {...register('maker')}
      />
      <TextField
        label="Model"
        autoComplete="off"
        error={errors.model?.message}
        {...register('model')}
      />
      <TextField
        label="Serial number"
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        className="figures"
        error={errors.serialNumber?.message}
        {...register('serialNumber')}
      />
      <NumberField
        name="ratedPowerKw"
        label="Rated power (kW)"
        hint="1 hp = 0.7457 kW"
        register={register}
        errors={errors}
      />
      <SelectField label="Fuel" error={errors.fuel?.message} {...register('fuel')}>
        <option value="petrol">Petrol</option>
        <option value="diesel">Diesel</option>
      </SelectField>
      <SelectField label="Cycle" error={errors.cycle?.message} {...register('cycle')}>
        <option value="four-stroke">Four-stroke</option>
        <option value="two-stroke">Two-stroke</option>
      </SelectField>
    </Fieldset>
  );
}

export function RatingFields({ register, errors }: SectionProps) {
  return (
    <Fieldset legend="Rating and propeller">
      <NumberField
        name="ratedRpmMin"
        label="Rated full-throttle RPM, low end"
        whole
        hint="From the maker's specification"
        register={register}
        errors={errors}
      />
      <NumberField
        name="ratedRpmMax"
        label="Rated full-throttle RPM, high end"
        whole
        register={register}
        errors={errors}
      />
      <NumberField
        name="gearRatio"
        label="Gear ratio (x:1)"
        hint="Gearcase or gearbox reduction, e.g. 2.08"
        register={register}
        errors={errors}
      />
      <NumberField
        name="propBlades"
        label="Propeller blades"
        whole
        register={register}
        errors={errors}
      />
      <NumberField
        name="propDiameterIn"
        label="Propeller diameter (in)"
        register={register}
        errors={errors}
      />
      <NumberField
        name="propPitchIn"
        label="Propeller pitch (in)"
        register={register}
        errors={errors}
      />
    </Fieldset>
  );
}

export function TachFields({
  register,
  errors,
  dialHint,
}: SectionProps & { dialHint: string | null }) {
  return (
    <Fieldset legend="Tachometer signal">
      <SelectField
        label="Signal source"
        error={errors.tachSource?.message}
        {...register('tachSource')}
      >
        {TACH_SOURCES.map((s) => (
          <option key={s} value={s}>
            {tachSourceLabel[s]}
          </option>
        ))}
      </SelectField>
      <NumberField
        name="poles"
        label="Poles of the coil or alternator"
        whole
        hint="Magnet poles, not pole pairs; some tachometers ask for pulses per revolution instead"
        register={register}
        errors={errors}
      />
      <NumberField
        name="pulleyRatio"
        label="Pulley ratio"
        hint="Belt-driven alternators: crank pulley ÷ alternator pulley, e.g. 2.5"
        register={register}
        errors={errors}
      />
      {dialHint && (
        <p className="text-sm sm:col-span-2 lg:col-span-3" aria-live="polite">
          {dialHint}
        </p>
      )}
    </Fieldset>
  );
}

export function CommissioningFields({ register, errors }: SectionProps) {
  return (
    <Fieldset legend="Commissioning">
      <NumberField
        name="hourMeterAtCommissioning"
        label="Hour meter at commissioning (h)"
        register={register}
        errors={errors}
      />
      <TextField
        label="Commissioning date"
        type="date"
        error={errors.commissionedOn?.message}
        {...register('commissionedOn', { setValueAs: toTextOrNull })}
      />
    </Fieldset>
  );
}
