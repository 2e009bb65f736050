import {
  ENGINE_POSITIONS,
  INSTALLATIONS,
  TACH_SOURCES,
} from '../../../../shared/engines/engine.schema';
import {
  CYCLE_WORDS,
  FUEL_WORDS,
  INSTALLATION_WORDS,
  POSITION_WORDS,
  TACH_SOURCE_WORDS,
} from '../../../../shared/engines/engine-words';
import { TextField } from '../../../components/ui/field';
import { toTextOrNull } from '../form-values';
import { ChoiceField, Fieldset, NumberField, type SectionProps } from './engine-field-inputs';

// Shown in this order, the usual choice first.
const FUELS = ['petrol', 'diesel'] as const;
const CYCLES = ['four-stroke', 'two-stroke'] as const;

export function IdentityFields({
  choosePosition = false,
  ...form
}: SectionProps & { choosePosition?: boolean }) {
  const { register, errors } = form;
  return (
    <Fieldset legend="Engine">
      <ChoiceField
        name="position"
        label="Position"
        values={ENGINE_POSITIONS}
        labels={POSITION_WORDS}
        placeholder={choosePosition ? 'Choose the position' : undefined}
        {...form}
      />
      <ChoiceField
        name="installation"
        label="Installation"
        values={INSTALLATIONS}
        labels={INSTALLATION_WORDS}
        {...form}
      />
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
      <ChoiceField name="fuel" label="Fuel" values={FUELS} labels={FUEL_WORDS} {...form} />
      <ChoiceField name="cycle" label="Cycle" values={CYCLES} labels={CYCLE_WORDS} {...form} />
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
      <ChoiceField
        name="tachSource"
        label="Signal source"
        values={TACH_SOURCES}
        labels={TACH_SOURCE_WORDS}
        register={register}
        errors={errors}
      />
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
