import { useState, type Dispatch, type SetStateAction } from 'react';
import { CautionCard } from '../../../components/caution-card';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';

export interface StartChoice {
  runId: string;
  engineId: string;
  label: string;
  /** Why this engine cannot go out now, if it cannot. */
  blocked: string | null;
}

interface OutingStartProps {
  choices: StartChoice[];
  onStart: (runIds: string[]) => void;
  pending: boolean;
  error: string | null;
}

/** The engines that can go out (ticked), and why any other cannot. */
function EngineChoices({
  choices,
  picked,
  setPicked,
}: {
  choices: StartChoice[];
  picked: string[];
  setPicked: Dispatch<SetStateAction<string[]>>;
}) {
  const toggle = (runId: string, on: boolean) =>
    setPicked((now) => (on ? [...now, runId] : now.filter((id) => id !== runId)));
  return (
    <fieldset className="flex flex-col">
      <legend className="font-semibold">Engines</legend>
      {choices.map((choice) =>
        choice.blocked === null ? (
          <Checkbox
            key={choice.runId}
            checked={picked.includes(choice.runId)}
            onChange={(e) => toggle(choice.runId, e.target.checked)}
          >
            {choice.label}
          </Checkbox>
        ) : (
          <p key={choice.runId} className="flex min-h-touch items-center text-muted">
            {choice.label}: {choice.blocked}
          </p>
        ),
      )}
    </fieldset>
  );
}

/** Choose the engines (both of a twin by default), read the cautions, start. */
export function OutingStart({ choices, onStart, pending, error }: OutingStartProps) {
  const open = choices.filter((c) => c.blocked === null);
  const [picked, setPicked] = useState<string[]>(open.map((c) => c.runId));
  const [read, setRead] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  const start = () => {
    if (picked.length === 0) return setProblem('Choose at least one engine for the outing.');
    if (!read) return setProblem('Tick that you have read the cautions before starting.');
    setProblem(null);
    onStart(picked);
  };

  return (
    <section
      aria-labelledby="outing-start"
      className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-surface p-3"
    >
      <h2 id="outing-start" className="text-xl font-bold">
        Start an outing
      </h2>
      {choices.length > 1 && (
        <p>Twin engines are usually run together: both are chosen. Untick one to run it alone.</p>
      )}
      <EngineChoices choices={choices} picked={picked} setPicked={setPicked} />
      <CautionCard />
      <Checkbox checked={read} onChange={(e) => setRead(e.target.checked)}>
        I have read the cautions
      </Checkbox>
      {(problem ?? error) && (
        <p role="alert" className="font-semibold text-danger">
          <span aria-hidden="true">⚠ </span>
          {problem ?? error}
        </p>
      )}
      <Button
        className="min-h-16 text-xl"
        onClick={start}
        pending={pending}
        pendingLabel="Starting…"
        disabled={open.length === 0}
      >
        Start outing
      </Button>
    </section>
  );
}
