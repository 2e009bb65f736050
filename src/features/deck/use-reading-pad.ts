import { useState } from 'react';
import type { ThrottlePosition } from '../../../shared/programs/throttle';
import type { PhotoInput, ReadingEntry } from './deck-store';
import { useGpsSpeed } from './device';
import { THROTTLE_WORDS } from './format';
import type { ReadingDetails } from './reading-details.schema';
import { buildEntries, type PadEngine } from './reading-entry';

export interface PadSetup {
  engines: PadEngine[];
  lastRpm: number | null;
  lastThrottle: ThrottlePosition | null;
  onLog: (entries: ReadingEntry[], photo: PhotoInput | undefined) => Promise<unknown>;
}

type Problem = { field: string; message: string } | null;

/** What the pad last said: a problem, a question to confirm, or what was logged. */
function usePadMessages() {
  const [problem, setProblem] = useState<Problem>(null);
  const [confirm, setConfirm] = useState<string | null>(null);
  const [logged, setLogged] = useState<string | null>(null);
  const settle = () => {
    setProblem(null);
    setConfirm(null);
    setLogged(null);
  };
  return { problem, setProblem, confirm, setConfirm, logged, setLogged, settle };
}

/** What is typed and chosen on the pad; every change clears what the pad last said. */
function usePadEntry({ engines, lastRpm, lastThrottle }: PadSetup, settle: () => void) {
  const [target, setTarget] = useState<string>(engines.length > 1 ? 'both' : engines[0].engineId);
  const [mode, setMode] = useState<'rpm' | 'hz'>('rpm');
  const [text, setText] = useState(lastRpm === null ? '' : String(lastRpm));
  const [throttle, setThrottle] = useState<ThrottlePosition | null>(lastThrottle);
  const [keypadOpen, setKeypadOpen] = useState(lastRpm === null);
  const edit = (next: string) => {
    setText(next);
    settle();
  };
  return {
    chosen: engines.filter((e) => target === 'both' || e.engineId === target),
    target,
    mode,
    text,
    throttle,
    keypadOpen,
    edit,
    setKeypadOpen,
    setTarget: (next: string) => {
      setTarget(next);
      settle();
    },
    setMode: (next: 'rpm' | 'hz') => {
      setMode(next);
      edit('');
      setKeypadOpen(true);
    },
    setThrottle: (next: ThrottlePosition) => {
      setThrottle(next);
      settle();
    },
  };
}

const loggedWords = (rpms: number[], throttle: ThrottlePosition, chosen: PadEngine[]) =>
  `Logged ${rpms.join(' and ')} rpm at ${THROTTLE_WORDS[throttle]} for ${chosen.map((e) => e.label).join(' and ')}.`;

/** The pad's state: what is typed, for which engine, and logging it all or nothing. */
export function useReadingPad(setup: PadSetup) {
  const messages = usePadMessages();
  const entry = usePadEntry(setup, messages.settle);
  const [details, setDetails] = useState<ReadingDetails | null>(null);
  const [gpsOn, setGpsOn] = useState(false);
  const gps = useGpsSpeed(gpsOn);
  const [saving, setSaving] = useState(false);
  const { chosen, mode, text, throttle } = entry;

  const log = async (confirmed: boolean) => {
    const result = buildEntries(chosen, {
      mode,
      text,
      throttle,
      details: details?.values ?? null,
      gps: gpsOn ? gps : null,
      confirmed,
    });
    if (result.kind === 'invalid')
      return messages.setProblem({ field: result.field, message: result.message });
    if (result.kind === 'confirm') return messages.setConfirm(result.message);
    setSaving(true);
    try {
      await setup.onLog(result.entries, details?.photo ?? undefined);
      messages.setLogged(loggedWords(result.rpms, throttle!, chosen));
      setDetails(null);
      messages.setConfirm(null);
      if (mode === 'rpm') entry.setKeypadOpen(false);
    } catch (error) {
      messages.setProblem({
        field: (error as { field?: string }).field ?? 'reading',
        message: error instanceof Error ? error.message : 'The reading was not saved.',
      });
    } finally {
      setSaving(false);
    }
  };

  return {
    ...entry,
    engines: setup.engines,
    details,
    gpsOn,
    gps,
    problem: messages.problem,
    confirm: messages.confirm,
    saving,
    logged: messages.logged,
    log,
    setDetails,
    setGpsOn,
    dismissConfirm: () => messages.setConfirm(null),
  };
}

export type ReadingPadState = ReturnType<typeof useReadingPad>;
