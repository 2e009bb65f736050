import { lazy, Suspense, useId, useState } from 'react';
import { THROTTLE_POSITIONS } from '../../../../shared/programs/throttle';
import { Button } from '../../../components/ui/button';
import { THROTTLE_LABEL, THROTTLE_WORDS } from '../format';
import { EMPTY_DETAILS } from '../reading-details.schema';
import { pressKey, RPM_STEP, signalWords, stepRpm } from '../reading-input';
import { useReadingPad, type PadSeed, type ReadingPadState } from '../use-reading-pad';
import { ChoiceChips, Keypad } from './keypad';

// The details form (and its form library) loads only when asked for: the pad itself stays light.
const ReadingDetailsForm = lazy(() => import('./reading-details'));

const throttleOptions = THROTTLE_POSITIONS.map((p) => ({
  value: p,
  text: THROTTLE_LABEL[p],
  name: THROTTLE_WORDS[p],
}));
const modeOptions = [
  { value: 'rpm', text: 'RPM', name: 'RPM from the tachometer' },
  { value: 'hz', text: 'Hz', name: 'Measured frequency in hertz' },
] as const;
const ENTRY_FIELDS = ['rpm', 'frequencyHz'];

/** Log a reading in two taps: the speed (stepper or keypad, prefilled from the last one), then Log. */
export function ReadingPad(seed: PadSeed) {
  const pad = useReadingPad(seed);
  const id = useId();
  const [detailsOpen, setDetailsOpen] = useState(false);
  const { engines, problem } = pad;
  return (
    <section
      aria-labelledby={`${id}-title`}
      className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-surface p-3"
    >
      <h2 id={`${id}-title`} className="text-lg font-bold">
        Log a reading
      </h2>
      {engines.length > 1 && (
        <ChoiceChips
          label="Reading for"
          value={pad.target}
          onChange={pad.setTarget}
          options={[
            { value: 'both', text: 'Both', name: 'Both engines' },
            ...engines.map((e) => ({ value: e.engineId, text: e.label })),
          ]}
        />
      )}
      <ChoiceChips
        label="Speed from"
        value={pad.mode}
        onChange={pad.setMode}
        options={modeOptions}
      />
      <SpeedEntry pad={pad} errorId={`${id}-entry-error`} />
      <ChoiceChips
        label="Throttle"
        value={pad.throttle}
        error={problem?.field === 'throttle'}
        onChange={pad.setThrottle}
        options={throttleOptions}
      />
      {problem && !ENTRY_FIELDS.includes(problem.field) && (
        <p role="alert" className="font-semibold text-danger">
          <span aria-hidden="true">⚠ </span>
          {problem.message}
        </p>
      )}
      {detailsOpen ? (
        <Suspense fallback={<p role="status">Opening the details…</p>}>
          <ReadingDetailsForm
            initial={pad.details?.input ?? EMPTY_DETAILS}
            initialPhoto={pad.details?.photo ?? null}
            gps={pad.gps}
            gpsOn={pad.gpsOn}
            onGpsChange={pad.setGpsOn}
            onDone={(next) => {
              pad.setDetails(next);
              setDetailsOpen(false);
            }}
            onCancel={() => setDetailsOpen(false)}
          />
        </Suspense>
      ) : (
        <DetailsSummary pad={pad} onOpen={() => setDetailsOpen(true)} />
      )}
      <LogButton pad={pad} disabled={detailsOpen} />
      <p role="status" className="min-h-6 font-semibold">
        {pad.logged}
      </p>
    </section>
  );
}

function SpeedEntry({ pad, errorId }: { pad: ReadingPadState; errorId: string }) {
  const error =
    pad.problem && ENTRY_FIELDS.includes(pad.problem.field) ? pad.problem.message : null;
  const single = pad.chosen.length === 1 ? pad.chosen[0].signal : null;
  const rpm = pad.mode === 'rpm';
  const stepper = (delta: number) => (
    <Button
      variant="secondary"
      className="min-h-16 px-3 text-xl"
      aria-label={`${RPM_STEP} rpm ${delta < 0 ? 'less' : 'more'}`}
      onClick={() => pad.edit(stepRpm(pad.text, delta))}
    >
      {delta < 0 ? '−' : '+'}
      {RPM_STEP}
    </Button>
  );
  return (
    <>
      {!rpm && (
        <p className="text-sm">
          {single
            ? `Converted with the ${signalWords(single)}.`
            : pad.chosen.length > 1
              ? 'Each engine is converted with its own poles and pulley ratio.'
              : 'This engine has no poles recorded: use RPM.'}
        </p>
      )}
      <div className="flex items-stretch gap-2">
        {rpm && stepper(-RPM_STEP)}
        <label className="flex min-w-0 flex-1 flex-col">
          <span className="sr-only">{rpm ? 'Engine speed (RPM)' : 'Measured frequency (Hz)'}</span>
          <input
            value={pad.text}
            onChange={(e) => pad.edit(e.target.value)}
            inputMode={rpm ? 'numeric' : 'decimal'}
            autoComplete="off"
            aria-invalid={Boolean(error)}
            aria-describedby={error ? errorId : undefined}
            placeholder={rpm ? 'rpm' : 'Hz'}
            className="figures min-h-16 w-full min-w-0 rounded-md border-4 border-ink bg-paper px-2 text-center text-4xl font-extrabold aria-[invalid=true]:border-danger"
          />
        </label>
        {rpm && stepper(RPM_STEP)}
      </div>
      {error && (
        <p id={errorId} className="font-semibold text-danger">
          <span aria-hidden="true">⚠ </span>
          {error}
        </p>
      )}
      <Button
        variant="quiet"
        aria-expanded={pad.keypadOpen}
        onClick={() => pad.setKeypadOpen(!pad.keypadOpen)}
      >
        {pad.keypadOpen ? 'Hide keypad' : 'Show keypad'}
      </Button>
      {pad.keypadOpen && (
        <Keypad allowDecimal={!rpm} onKey={(key) => pad.edit(pressKey(pad.text, key))} />
      )}
    </>
  );
}

function LogButton({ pad, disabled }: { pad: ReadingPadState; disabled: boolean }) {
  if (!pad.confirm) {
    return (
      <Button
        className="deck-primary min-h-16 text-xl"
        onClick={() => void pad.log(false)}
        pending={pad.saving}
        pendingLabel="Saving…"
        disabled={disabled}
      >
        Log reading
      </Button>
    );
  }
  return (
    <div role="alert" className="flex flex-col gap-2 rounded-md border-4 border-danger p-2">
      <p className="font-semibold">{pad.confirm}</p>
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => void pad.log(true)} pending={pad.saving}>
          Yes, log it
        </Button>
        <Button
          variant="secondary"
          onClick={() => {
            pad.dismissConfirm();
            pad.setKeypadOpen(true);
          }}
        >
          Change it
        </Button>
      </div>
    </div>
  );
}

function DetailsSummary({ pad, onOpen }: { pad: ReadingPadState; onOpen: () => void }) {
  const v = pad.details?.values;
  const speed = pad.gpsOn
    ? pad.gps.speedKn === null
      ? 'GPS speed (no fix yet)'
      : `${pad.gps.speedKn} kn GPS`
    : v?.speedKn !== undefined
      ? `${v.speedKn} kn`
      : null;
  const parts = [
    speed,
    v?.fuelLph !== undefined ? `${v.fuelLph} L/h` : null,
    v?.hourMeter !== undefined ? `${v.hourMeter} h` : null,
    v?.note ? 'note' : null,
    pad.details?.photo ? 'photo' : null,
  ].filter(Boolean);
  return (
    <div className="flex items-center justify-between gap-2">
      <p className="text-sm">
        {parts.length
          ? `With: ${parts.join(' · ')}`
          : 'Speed, fuel flow, hour meter, note, photo: optional.'}
      </p>
      <Button variant="secondary" onClick={onOpen}>
        Details
      </Button>
    </div>
  );
}
