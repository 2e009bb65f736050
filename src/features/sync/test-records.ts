import type { EventRecord } from '../../lib/db';

/* Device records as the deck writes them, for the sync tests. */

export const RUN = '11111111-1111-4111-8111-111111111111';
export const ENGINE = '22222222-2222-4222-8222-222222222222';

export function reading(
  id: string,
  at: number,
  sync: EventRecord['sync'] = 'pending',
): EventRecord {
  const event = {
    kind: 'reading' as const,
    id,
    at,
    engineId: ENGINE,
    phaseId: 'p1',
    rpm: 2500,
    throttle: 'half' as const,
  };
  return {
    id,
    runId: RUN,
    engineId: ENGINE,
    at,
    kind: 'reading',
    event,
    origin: 'device',
    sync,
    createdAt: at,
  };
}

export const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;
