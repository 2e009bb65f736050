import { useState } from 'react';
import type { OutingRecord } from '../../../lib/db';
import { Button } from '../../../components/ui/button';
import type { WakeLockStatus } from '../device';
import { clockText } from '../format';

const WAKE_WORDS: Record<WakeLockStatus, string | null> = {
  on: 'Screen kept awake.',
  off: null,
  refused:
    'This device would not keep the screen awake: set a longer screen timeout, or tap the screen now and then.',
  unsupported:
    'This browser cannot keep the screen awake: set a longer screen timeout while you run.',
};

interface OutingBarProps {
  outing: OutingRecord;
  nowMs: number;
  wakeLock: WakeLockStatus;
  onChange: (change: 'pause' | 'resume' | 'end') => void;
  pending: boolean;
}

/** The outing under way: how long, pause or resume, end (asked twice), and the screen-awake note. */
export function OutingBar({ outing, nowMs, wakeLock, onChange, pending }: OutingBarProps) {
  const [ending, setEnding] = useState(false);
  const paused = outing.pausedAt !== null;
  return (
    <section
      aria-label="Outing"
      className="flex flex-col gap-2 rounded-lg border-2 border-ink bg-surface p-3"
    >
      <p className="flex flex-wrap items-baseline gap-x-2 font-bold">
        <span>{paused ? 'Outing paused' : 'Outing under way'}</span>
        <span className="figures">{clockText(nowMs - outing.startedAt)}</span>
      </p>
      <div className="grid grid-cols-2 gap-2">
        {paused ? (
          <Button onClick={() => onChange('resume')} pending={pending}>
            Resume
          </Button>
        ) : (
          <Button variant="secondary" onClick={() => onChange('pause')} pending={pending}>
            Pause
          </Button>
        )}
        <Button variant="secondary" onClick={() => setEnding(true)} disabled={ending}>
          End outing
        </Button>
      </div>
      {paused && <p className="text-sm">Engine time does not count while paused.</p>}
      {WAKE_WORDS[wakeLock] && (
        <p className="text-sm" role={wakeLock === 'on' ? undefined : 'status'}>
          {WAKE_WORDS[wakeLock]}
        </p>
      )}
      {ending && (
        <EndConfirm
          pending={pending}
          onEnd={() => {
            setEnding(false);
            onChange('end');
          }}
          onKeepGoing={() => setEnding(false)}
        />
      )}
    </section>
  );
}

/** Ending is asked twice: it stops engine time for every engine in the outing. */
function EndConfirm({
  pending,
  onEnd,
  onKeepGoing,
}: {
  pending: boolean;
  onEnd: () => void;
  onKeepGoing: () => void;
}) {
  return (
    <div role="alert" className="flex flex-col gap-2 rounded-md border-2 border-ink p-2">
      <p className="font-semibold">
        End the outing? Engine time stops counting for every engine in it.
      </p>
      <div className="flex gap-2">
        <Button onClick={onEnd} pending={pending}>
          Yes, end it
        </Button>
        <Button variant="secondary" onClick={onKeepGoing}>
          Keep going
        </Button>
      </div>
    </div>
  );
}
