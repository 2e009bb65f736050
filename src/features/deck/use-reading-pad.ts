import { useState } from 'react';
import type { ThrottlePosition } from '../../../shared/programs/throttle';
import type { PhotoInput, ReadingEntry } from './deck-store';
import { useGpsSpeed } from './device';
import { THROTTLE_WORDS } from './format';
import type { ReadingDetails } from './reading-details.schema';
import { buildEntries, type PadEngine } from './reading-entry';

export interface PadSeed {
  engines: PadEngine[];
  lastRpm: number | null;
  lastThrottle: ThrottlePosition | null;
  onLog: (entries: ReadingEntry[], photo: PhotoInput | undefined) => Promise<unknown>;
}

type Problem = { field: string; message: string } | null;

/** The pad's state: what is typed, for which engine, and logging it all or nothing. */
export function useReadingPad({ engines, lastRpm, lastThrottle, onLog }: PadSeed) {
  const [target, setTargetState] = useState<string>(
    engines.length > 1 ? 'both' : engines[0].engineId,
  );
  const [mode, setModeState] = useState<'rpm' | 'hz'>('rpm');
  const [text, setText] = useState(lastRpm === null ? '' : String(lastRpm));
  const [throttle, setThrottleState] = useState<ThrottlePosition | null>(lastThrottle);
  const [keypadOpen, setKeypadOpen] = useState(lastRpm === null);
  const [details, setDetails] = useState<ReadingDetails | null>(null);
  const [gpsOn, setGpsOn] = useState(false);
  const gps = useGpsSpeed(gpsOn);
  const [problem, setProblem] = useState<Problem>(null);
  const [confirm, setConfirm] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);
  const [logged, setLogged] = useState<string | null>(null);
  const chosen = engines.filter((e) => target === 'both' || e.engineId === target);

  const settle = () => {
    setProblem(null);
    setConfirm(null);
    setLogged(null);
  };
  const edit = (next: string) => {
    setText(next);
    settle();
  };

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
      return setProblem({ field: result.field, message: result.message });
    if (result.kind === 'confirm') return setConfirm(result.message);
    setSaving(true);
    try {
      await onLog(result.entries, details?.photo ?? undefined);
      setLogged(
        `Logged ${result.rpms.join(' and ')} rpm at ${THROTTLE_WORDS[throttle!]} for ${chosen.map((e) => e.label).join(' and ')}.`,
      );
      setDetails(null);
      setConfirm(null);
      if (mode === 'rpm') setKeypadOpen(false);
    } catch (error) {
      setProblem({
        field: (error as { field?: string }).field ?? 'reading',
        message: error instanceof Error ? error.message : 'The reading was not saved.',
      });
    } finally {
      setSaving(false);
    }
  };

  return {
    engines,
    chosen,
    target,
    mode,
    text,
    throttle,
    keypadOpen,
    details,
    gpsOn,
    gps,
    problem,
    confirm,
    saving,
    logged,
    edit,
    log,
    setKeypadOpen,
    setDetails,
    setGpsOn,
    dismissConfirm: () => setConfirm(null),
    setTarget: (next: string) => {
      setTargetState(next);
      settle();
    },
    setMode: (next: 'rpm' | 'hz') => {
      setModeState(next);
      edit('');
      setKeypadOpen(true);
    },
    setThrottle: (next: ThrottlePosition) => {
      setThrottleState(next);
      settle();
    },
  };
}

export type ReadingPadState = ReturnType<typeof useReadingPad>;
