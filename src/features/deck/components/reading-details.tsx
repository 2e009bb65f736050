import { useState } from 'react';
import { useForm, type UseFormReturn } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { TextField } from '../../../components/ui/field';
import type { PhotoInput } from '../deck-store';
import type { GpsFix } from '../device';
import { PhotoError, preparePhoto } from '../photo';
import {
  ReadingDetailsSchema,
  type ReadingDetails,
  type ReadingDetailsInput,
  type ReadingDetailsValues,
} from '../reading-details.schema';

interface ReadingDetailsFormProps {
  initial: ReadingDetailsInput;
  initialPhoto: PhotoInput | null;
  gps: GpsFix;
  gpsOn: boolean;
  onGpsChange: (on: boolean) => void;
  onDone: (details: ReadingDetails) => void;
  onCancel: () => void;
}

type DetailsForm = UseFormReturn<ReadingDetailsInput, unknown, ReadingDetailsValues>;

const OTHER_FIELDS = [
  { name: 'fuelLph', label: 'Fuel flow (L/h)', inputMode: 'decimal' },
  { name: 'hourMeter', label: 'Hour meter (h)', inputMode: 'decimal' },
  { name: 'note', label: 'Note', inputMode: undefined },
] as const;

const GPS_WORDS: Record<GpsFix['status'], string> = {
  off: '',
  waiting: 'Waiting for a position fix…',
  ok: '',
  denied: 'Location is not allowed for Ringseat on this device: type the speed instead.',
  unsupported: 'This device gives no location: type the speed instead.',
};

/** A photo chosen for the reading, made smaller on the phone first. */
function usePhotoChoice(initialPhoto: PhotoInput | null) {
  const [photo, setPhoto] = useState<PhotoInput | null>(initialPhoto);
  const [photoError, setPhotoError] = useState<string | null>(null);
  const [photoBusy, setPhotoBusy] = useState(false);
  const choosePhoto = async (file: File | undefined) => {
    setPhotoError(null);
    if (!file) return;
    setPhotoBusy(true);
    try {
      setPhoto(await preparePhoto(file));
    } catch (error) {
      setPhoto(null);
      setPhotoError(error instanceof PhotoError ? error.message : 'This photo could not be used.');
    } finally {
      setPhotoBusy(false);
    }
  };
  return { photo, photoError, photoBusy, choosePhoto };
}

function PhotoField({ choice }: { choice: ReturnType<typeof usePhotoChoice> }) {
  const { photo, photoError, photoBusy, choosePhoto } = choice;
  return (
    <>
      <label className="flex flex-col gap-1 font-semibold">
        Photo (hour meter, tachometer…)
        <input
          type="file"
          accept="image/*"
          capture="environment"
          className="min-h-touch font-normal"
          onChange={(e) => void choosePhoto(e.target.files?.[0])}
          aria-describedby={photoError ? 'photo-error' : undefined}
        />
      </label>
      {photoBusy && (
        <p role="status" className="text-sm">
          Making the photo smaller…
        </p>
      )}
      {photo && !photoBusy && (
        <p className="text-sm">
          Photo ready: {photo.width}×{photo.height}, kept on this phone until it can be sent.
        </p>
      )}
      {photoError && (
        <p id="photo-error" className="text-sm font-semibold text-danger">
          <span aria-hidden="true">⚠ </span>
          {photoError}
        </p>
      )}
    </>
  );
}

/** Speed over ground: from the GPS when switched on, else typed. */
function SpeedField({
  gps,
  gpsOn,
  onGpsChange,
  form,
}: Pick<ReadingDetailsFormProps, 'gps' | 'gpsOn' | 'onGpsChange'> & { form: DetailsForm }) {
  const gpsSpeed =
    gpsOn && gps.speedKn !== null ? `${gps.speedKn} kn from GPS` : GPS_WORDS[gps.status];
  return (
    <>
      <Checkbox checked={gpsOn} onChange={(e) => onGpsChange(e.target.checked)}>
        Speed over ground from GPS
      </Checkbox>
      {gpsOn ? (
        <p className="text-sm" role="status">
          {gpsSpeed}
        </p>
      ) : (
        <TextField
          label="Speed over ground (kn)"
          inputMode="decimal"
          autoComplete="off"
          error={form.formState.errors.speedKn?.message}
          {...form.register('speedKn')}
        />
      )}
    </>
  );
}

/** Speed, fuel flow, hour meter, note and photo: one tap away from the pad, kept for the next reading. */
export default function ReadingDetailsForm({
  initial,
  initialPhoto,
  gps,
  gpsOn,
  onGpsChange,
  onDone,
  onCancel,
}: ReadingDetailsFormProps) {
  const photoChoice = usePhotoChoice(initialPhoto);
  const form = useForm<ReadingDetailsInput, unknown, ReadingDetailsValues>({
    resolver: zodResolver(ReadingDetailsSchema),
    defaultValues: initial,
  });
  const { register, handleSubmit, formState, getValues } = form;
  const { photo, photoBusy } = photoChoice;
  return (
    <form
      noValidate
      aria-label="Reading details"
      className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-surface p-3"
      onSubmit={handleSubmit((values) => onDone({ values, input: getValues(), photo }))}
    >
      <SpeedField gps={gps} gpsOn={gpsOn} onGpsChange={onGpsChange} form={form} />
      {OTHER_FIELDS.map(({ name, label, inputMode }) => (
        <TextField
          key={name}
          label={label}
          inputMode={inputMode}
          autoComplete="off"
          error={formState.errors[name]?.message}
          {...register(name)}
        />
      ))}
      <PhotoField choice={photoChoice} />
      <p className="text-sm text-muted">These details go with the next reading you log.</p>
      <div className="flex gap-2">
        <Button type="submit" disabled={photoBusy}>
          Keep details
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
