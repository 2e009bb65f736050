import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { RingseatDb } from '../../lib/db';
import { advancePhase, logAlert, logReadings } from './deck-store';
import { DeckInputError, nextEventAt } from './device-events';
import { activeOuting, changeOuting, startOuting } from './outing-store';
import { MIN, refOf, T0, testRun, VESSEL_ID } from './test-fixtures';

// Speeds and flows here are demo figures on demo engines (rated 5000–6000 rpm), not advice; the
// fuel-flow limit of 400 L/h is the shared schema's own sanity bound.
let database: RingseatDb;
const port = testRun('port');
const starboard = testRun('starboard');

beforeEach(async () => {
  database = new RingseatDb(`deck-store-${crypto.randomUUID()}`);
  await database.runs.bulkPut([port, starboard]);
});
afterEach(async () => {
  await database.delete();
});

const reading = (rpm: number, throttle: 'idle' | 'half' = 'half') => ({
  phaseId: 'below-half',
  rpm,
  throttle,
});

describe('the deck on the device database', () => {
  it('starts a twin outing: one session-start per engine, pending, with device-made UUIDs', async () => {
    const outing = await startOuting(database, VESSEL_ID, [refOf(port), refOf(starboard)], T0);
    const events = await database.events.toArray();
    expect(events.map((e) => [e.runId, e.kind, e.at, e.sync, e.origin])).toEqual(
      expect.arrayContaining([
        [port.id, 'session-start', T0, 'pending', 'device'],
        [starboard.id, 'session-start', T0, 'pending', 'device'],
      ]),
    );
    for (const e of events) expect(e.id).toMatch(/^[0-9a-f-]{36}$/);
    expect(outing).toMatchObject({
      vesselId: VESSEL_ID,
      runIds: [port.id, starboard.id],
      cautionsReadAt: T0,
      endedAt: null,
    });
    expect((await activeOuting(database, VESSEL_ID))?.id).toBe(outing.id);
  });

  it('refuses a second outing on the same vessel while one is under way', async () => {
    await startOuting(database, VESSEL_ID, [refOf(port)], T0);
    await expect(
      startOuting(database, VESSEL_ID, [refOf(starboard)], T0 + MIN),
    ).rejects.toBeInstanceOf(DeckInputError);
    expect(await database.events.count()).toBe(1);
  });

  it('keeps event times moving forward even when the clock stands still or goes back', async () => {
    await startOuting(database, VESSEL_ID, [refOf(port)], T0);
    await logReadings(database, [{ ...refOf(port), reading: reading(2400) }], T0);
    await logReadings(database, [{ ...refOf(port), reading: reading(2500) }], T0 - 5 * MIN);
    const times = (await database.events.where('runId').equals(port.id).sortBy('at')).map(
      (e) => e.at,
    );
    expect(times).toEqual([T0, T0 + 1, T0 + 2]);
    expect(await nextEventAt(database, port.id, T0 + MIN)).toBe(T0 + MIN);
  });

  it('stores one reading for both engines of a twin, with its photo, together', async () => {
    const photo = {
      blob: new Blob(['jpeg'], { type: 'image/jpeg' }),
      mimeType: 'image/jpeg',
      width: 1600,
      height: 1200,
    };
    const records = await logReadings(
      database,
      [
        { ...refOf(port), reading: reading(2400) },
        { ...refOf(starboard), reading: reading(2450) },
      ],
      T0,
      photo,
    );
    expect(records.map((r) => r.event)).toEqual([
      expect.objectContaining({
        kind: 'reading',
        engineId: port.engine.id,
        rpm: 2400,
        throttle: 'half',
      }),
      expect.objectContaining({
        kind: 'reading',
        engineId: starboard.engine.id,
        rpm: 2450,
        throttle: 'half',
      }),
    ]);
    const photos = await database.photos.toArray();
    expect(photos).toHaveLength(1);
    expect(photos[0]).toMatchObject({
      runId: port.id,
      eventId: records[0].id,
      sync: 'pending',
      width: 1600,
    });
  });

  it("saves nothing when one engine's reading is bad, and names the field", async () => {
    const bad = logReadings(
      database,
      [
        { ...refOf(port), reading: reading(2400) },
        { ...refOf(starboard), reading: reading(-5) },
      ],
      T0,
      {
        blob: new Blob(['x']),
        mimeType: 'image/jpeg',
        width: 10,
        height: 10,
      },
    );
    await expect(bad).rejects.toMatchObject({
      field: 'rpm',
      message: 'The engine speed (rpm) cannot be negative.',
    });
    expect(await database.events.count()).toBe(0);
    expect(await database.photos.count()).toBe(0);
  });

  it('rejects an absurd fuel flow by the shared schema', async () => {
    await expect(
      logReadings(database, [{ ...refOf(port), reading: { ...reading(2400), fuelLph: 900 } }], T0),
    ).rejects.toMatchObject({ field: 'fuelLph' });
  });

  it('pauses, resumes and ends: stops and starts every engine of the outing once', async () => {
    const runs = [refOf(port), refOf(starboard)];
    const outing = await startOuting(database, VESSEL_ID, runs, T0);
    await changeOuting(database, outing.id, runs, 'pause', T0 + MIN);
    await changeOuting(database, outing.id, runs, 'pause', T0 + 2 * MIN); // a second tap changes nothing
    await changeOuting(database, outing.id, runs, 'resume', T0 + 3 * MIN);
    await changeOuting(database, outing.id, runs, 'end', T0 + 4 * MIN);
    const kinds = (await database.events.where('runId').equals(port.id).sortBy('at')).map(
      (e) => e.kind,
    );
    expect(kinds).toEqual(['session-start', 'session-stop', 'session-start', 'session-stop']);
    expect(await database.outings.get(outing.id)).toMatchObject({
      endedAt: T0 + 4 * MIN,
      pausedAt: null,
    });
    expect(await activeOuting(database, VESSEL_ID)).toBeNull();
    await expect(
      changeOuting(database, outing.id, runs, 'resume', T0 + 5 * MIN),
    ).rejects.toBeInstanceOf(DeckInputError);
  });

  it('ending a paused outing adds no second stop', async () => {
    const outing = await startOuting(database, VESSEL_ID, [refOf(port)], T0);
    await changeOuting(database, outing.id, [refOf(port)], 'pause', T0 + MIN);
    await changeOuting(database, outing.id, [refOf(port)], 'end', T0 + 2 * MIN);
    expect((await database.events.orderBy('[runId+at]').toArray()).map((e) => e.kind)).toEqual([
      'session-start',
      'session-stop',
    ]);
  });

  it('records a phase advance as an event and a pending run change', async () => {
    await advancePhase(database, refOf(port), 'below-three-quarter', T0);
    const [event] = await database.events.toArray();
    expect(event.event).toMatchObject({ kind: 'phase-advance', phaseId: 'below-three-quarter' });
    const [patch] = await database.runPatches.toArray();
    expect(patch).toMatchObject({
      runId: port.id,
      sync: 'pending',
      item: { type: 'run-patch', currentPhaseId: 'below-three-quarter', at: event.at },
    });
  });

  it('logs an alert once per broken-rule stretch', async () => {
    const alert = {
      code: 'over-band',
      message: 'The engine ran above the band.',
      phaseId: 'below-half',
      sinceMs: T0,
    };
    expect(await logAlert(database, refOf(port), alert, T0 + 2 * MIN)).toBe(true);
    expect(await logAlert(database, refOf(port), alert, T0 + 3 * MIN)).toBe(false);
    expect(
      await logAlert(database, refOf(port), { ...alert, sinceMs: T0 + 10 * MIN }, T0 + 12 * MIN),
    ).toBe(true);
    expect((await database.events.toArray()).filter((e) => e.kind === 'alert')).toHaveLength(2);
  });
});
