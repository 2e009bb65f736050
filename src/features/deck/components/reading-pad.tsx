import { lazy, Suspense, useId, useState } from 'react';
import { THROTTLE_POSITIONS } from '../../../../shared/programs/throttle';
import { Button } from '../../../components/ui/button';
import { THROTTLE_LABEL, THROTTLE_WORDS } from '../format';
import { EMPTY_DETAILS } from '../reading-details.schema';
import { useReadingPad, type PadSetup, type ReadingPadState } from '../use-reading-pad';
import { DetailsSummary } from './details-summary';
import { ChoiceChips } from './keypad';
import { ENTRY_FIELDS, SpeedEntry } from './speed-entry';

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

/** Log a reading in two taps: the speed (stepper or keypad, prefilled from the last one), then Log. */
export function ReadingPad(setup: PadSetup) {
  const pad = useReadingPad(setup);
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
      {engines.length > 1 && <TargetChips pad={pad} />}
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
      <PadDetails pad={pad} open={detailsOpen} setOpen={setDetailsOpen} />
      <LogButton pad={pad} disabled={detailsOpen} />
      <p role="status" className="min-h-6 font-semibold">
        {pad.logged}
      </p>
    </section>
  );
}

/** Which engine of a twin the reading is for: both, or one of them. */
function TargetChips({ pad }: { pad: ReadingPadState }) {
  return (
    <ChoiceChips
      label="Reading for"
      value={pad.target}
      onChange={pad.setTarget}
      options={[
        { value: 'both', text: 'Both', name: 'Both engines' },
        ...pad.engines.map((e) => ({ value: e.engineId, text: e.label })),
      ]}
    />
  );
}

/** The details form when open, else a summary of what goes with the next reading. */
function PadDetails({
  pad,
  open,
  setOpen,
}: {
  pad: ReadingPadState;
  open: boolean;
  setOpen: (open: boolean) => void;
}) {
  if (!open) return <DetailsSummary pad={pad} onOpen={() => setOpen(true)} />;
  return (
    <Suspense fallback={<p role="status">Opening the details…</p>}>
      <ReadingDetailsForm
        initial={pad.details?.input ?? EMPTY_DETAILS}
        initialPhoto={pad.details?.photo ?? null}
        gps={pad.gps}
        gpsOn={pad.gpsOn}
        onGpsChange={pad.setGpsOn}
        onDone={(next) => {
          pad.setDetails(next);
          setOpen(false);
        }}
        onCancel={() => setOpen(false)}
      />
    </Suspense>
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
