import { useEffect, useRef } from 'react';
import { useLogAlert } from './device-records';
import { buzz } from './device';
import { alertsToLog, type EngineSnapshot } from './engine-snapshot';

const ALERT_BUZZ = [400, 150, 400, 150, 400];
const OVER_BUZZ = [250];

/**
 * Turns what the core computes into signals: each new broken-rule stretch is logged once as an
 * alert event and buzzes long; going over the band buzzes short at once, before the grace ends.
 */
export function useAlertSignals(snapshots: EngineSnapshot[], active: boolean): void {
  const logAlert = useLogAlert();
  const tried = useRef(new Set<string>());
  const lastState = useRef(new Map<string, string>());
  const { mutate } = logAlert;

  useEffect(() => {
    if (!active) return;
    for (const snapshot of snapshots) {
      const state = snapshot.live.state;
      if (state === 'over' && lastState.current.get(snapshot.engineId) !== 'over') buzz(OVER_BUZZ);
      lastState.current.set(snapshot.engineId, state);
      for (const alert of alertsToLog(snapshot)) {
        const key = `${snapshot.run.id}:${alert.code}:${alert.sinceMs}`;
        if (tried.current.has(key)) continue;
        tried.current.add(key);
        buzz(ALERT_BUZZ);
        mutate({
          run: { runId: snapshot.run.id, engineId: snapshot.engineId },
          alert: {
            code: alert.code,
            message: alert.message,
            phaseId: snapshot.phase?.id,
            sinceMs: alert.sinceMs,
          },
        });
      }
    }
  }, [snapshots, active, mutate]);
}
