import { beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { db } from '../../../lib/db';
import { startOuting } from '../outing-store';
import { MIN, refOf, testRun, testVessel, VESSEL_ID } from '../test-fixtures';
import { clearDevice, outingOn, showDeck as show, store } from './deck-test-db';

// Phases, details and the outing's pause, on the built-in four-stroke program (demo engine).
const port = testRun('port');

beforeEach(clearDevice);

describe('the deck run screen, during an outing', () => {
  it('proposes the next phase once the current one has its time, and logs the move when confirmed', async () => {
    const startedAt = Date.now() - 15 * MIN;
    await db.runs.put(port);
    await db.vessels.put(testVessel([port]));
    await startOuting(db, VESSEL_ID, [refOf(port)], startedAt);
    // The dock run needs 10 minutes in band at idle (built-in program, common practice).
    await store(port, [
      { kind: 'reading', at: startedAt, phaseId: 'dock-run', rpm: 800, throttle: 'idle' } as never,
    ]);
    const user = userEvent.setup();
    show('technician');
    expect(
      await screen.findByText(
        'Phase done. Move on to \u201cBelow half throttle, changing speed\u201d?',
      ),
    ).toBeInTheDocument();
    await user.click(screen.getByText('All phases (3)'));
    const phases = screen.getByRole('list', { name: 'Port: phases' });
    expect(within(phases).getAllByRole('listitem')[0]).toHaveTextContent(
      'First run at the dock · workshop · done',
    );
    await user.click(screen.getByRole('button', { name: 'Move on' }));
    expect(await screen.findByText('Phase 2 of 3')).toBeInTheDocument();
    const advance = (await db.events.toArray()).find((e) => e.kind === 'phase-advance');
    expect(advance?.event).toMatchObject({ phaseId: 'below-half' });
    expect(await db.runPatches.count()).toBe(1);
  });

  it('checks the optional details: an absurd speed is refused by name, good ones go with the next reading', async () => {
    await outingOn([port]);
    const user = userEvent.setup();
    show();
    await user.click(await screen.findByRole('button', { name: 'Details' }));
    const speed = await screen.findByRole('textbox', { name: 'Speed over ground (kn)' });
    await user.type(speed, '95');
    await user.type(screen.getByRole('textbox', { name: 'Fuel flow (L/h)' }), '18,5');
    await user.click(screen.getByRole('button', { name: 'Keep details' }));
    expect(
      await screen.findByText('The speed over ground (speedKn) must be at most 80 kn.'),
    ).toBeInTheDocument();
    await user.clear(speed);
    await user.type(speed, '21.4');
    await user.click(screen.getByRole('button', { name: 'Keep details' }));
    expect(await screen.findByText('With: 21.4 kn · 18.5 L/h')).toBeInTheDocument();
    await user.type(screen.getByRole('textbox', { name: 'Engine speed (RPM)' }), '2600');
    await user.click(screen.getByRole('radio', { name: 'half throttle' }));
    await user.click(screen.getByRole('button', { name: 'Log reading' }));
    await waitFor(async () => {
      const [reading] = (await db.events.toArray()).filter((e) => e.kind === 'reading');
      expect(reading?.event).toMatchObject({
        rpm: 2600,
        speedKn: 21.4,
        speedSource: 'typed',
        fuelLph: 18.5,
      });
    });
  });

  it('pauses and resumes the outing: time stops counting while paused', async () => {
    await outingOn([port]);
    const user = userEvent.setup();
    show();
    await user.click(await screen.findByRole('button', { name: 'Pause' }));
    expect(await screen.findByText('Outing paused')).toBeInTheDocument();
    expect(await screen.findByRole('status', { name: /Port: Stopped/ })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Log reading' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Resume' }));
    expect(await screen.findByRole('button', { name: 'Log reading' })).toBeInTheDocument();
    const kinds = (await db.events.orderBy('[runId+at]').toArray()).map((e) => e.kind);
    expect(kinds).toEqual(['session-start', 'phase-advance', 'session-stop', 'session-start']);
  });
});
