import { Button } from '../../../components/ui/button';
import { pressKey, RPM_STEP, signalWords, stepRpm } from '../reading-input';
import type { ReadingPadState } from '../use-reading-pad';
import { Keypad } from './keypad';

/** The pad fields whose problems show under the speed entry rather than below the pad. */
export const ENTRY_FIELDS = ['rpm', 'frequencyHz'];

function RpmStepper({ pad, delta }: { pad: ReadingPadState; delta: number }) {
  return (
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
}

/** How a typed frequency becomes RPM for the engines chosen. */
function conversionWords(pad: ReadingPadState): string {
  const single = pad.chosen.length === 1 ? pad.chosen[0].signal : null;
  if (single) return `Converted with the ${signalWords(single)}.`;
  return pad.chosen.length > 1
    ? 'Each engine is converted with its own poles and pulley ratio.'
    : 'This engine has no poles recorded: use RPM.';
}

/** The engine speed, typed or stepped in RPM, or a measured frequency in Hz. */
export function SpeedEntry({ pad, errorId }: { pad: ReadingPadState; errorId: string }) {
  const error =
    pad.problem && ENTRY_FIELDS.includes(pad.problem.field) ? pad.problem.message : null;
  const rpm = pad.mode === 'rpm';
  return (
    <>
      {!rpm && <p className="text-sm">{conversionWords(pad)}</p>}
      <div className="flex items-stretch gap-2">
        {rpm && <RpmStepper pad={pad} delta={-RPM_STEP} />}
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
        {rpm && <RpmStepper pad={pad} delta={RPM_STEP} />}
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
