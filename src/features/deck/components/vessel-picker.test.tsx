import { beforeEach, describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import type { Role } from '../../../../shared/auth/auth.schema';
import { db, type RunRecord } from '../../../lib/db';
import { testRun, testVessel } from '../test-fixtures';
import { clearDevice, store } from './deck-test-db';
import { VesselPicker } from './vessel-picker';

// The picker on a demo twin, built-in four-stroke program: its first phase is the workshop's.
beforeEach(clearDevice);

const onPhase = (run: RunRecord, phaseId: string) =>
  store(run, [{ kind: 'phase-advance', at: Date.now() - 60_000, phaseId } as never]);

async function show(runs: RunRecord[], role: Role, engines: RunRecord[] = runs) {
  await db.runs.bulkPut(runs);
  await db.vessels.put(testVessel(engines));
  render(<VesselPicker role={role} />);
  const card = (await screen.findByRole('heading', { name: 'Test Tern' })).closest('section')!;
  const engine = (position: string) =>
    within(card)
      .getByText(new RegExp(`^${position} ·`))
      .closest('li')!;
  return { card, engine };
}

const onDeck = (card: HTMLElement) => within(card).queryByRole('link', { name: /Go on deck/ });

describe('the deck vessel picker', () => {
  it('for a skipper: the workshop phase waiting, an engine with no run, and no "On deck"', async () => {
    const port = testRun('port', { state: 'planned' });
    const { card, engine } = await show([port], 'skipper', [port, testRun('starboard')]);
    const [p, starboard] = [engine('Port'), engine('Starboard')];
    expect(p).toHaveTextContent('Workshop phase waiting');
    expect(starboard).toHaveTextContent('No break-in run assigned');
    expect(onDeck(card)).toBeNull();
    expect(card).toHaveTextContent('Nothing on this vessel for you to log right now.');
    expect(within(p).getByRole('link', { name: 'Run page' })).toHaveAttribute(
      'href',
      `/runs/${port.id}`,
    );
  });

  it('for the workshop: the same phase is theirs to run, and "On deck" is offered', async () => {
    const port = testRun('port', { state: 'planned' });
    const { card, engine } = await show([port], 'technician', [port, testRun('starboard')]);
    const p = engine('Port');
    expect(p).toHaveTextContent('Workshop phase: yours to run');
    expect(onDeck(card)).toHaveAttribute('href', '/deck/11111111-1111-4111-8111-111111111111');
  });

  it('with the skipper, and returned with phases to run again', async () => {
    const port = testRun('port');
    const starboard = testRun('starboard', {
      state: 'returned',
      rerunFrom: { 'below-half': Date.now() - 3_600_000 },
      lastDecision: {
        decision: 'returned',
        comments: 'Again, please.',
        rerunPhaseIds: ['below-half'],
        reviewerName: 'Ivo',
        decidedAt: new Date().toISOString(),
      },
    });
    await onPhase(port, 'below-half');
    const { card, engine } = await show([port, starboard], 'skipper');
    const [p, s] = [engine('Port'), engine('Starboard')];
    expect(p).toHaveTextContent('With the skipper');
    expect(s).toHaveTextContent('Returned: phases to run again');
    expect(onDeck(card)).not.toBeNull();
  });

  it('submitted, signed off, and a cancelled run read as they are', async () => {
    const port = testRun('port', { state: 'signed-off' });
    const cancelled = testRun('starboard', { state: 'cancelled' });
    const submitted = testRun('starboard', {
      id: '22222229-2222-4222-8222-222222222229',
      state: 'submitted',
    });
    const { card, engine } = await show([port, cancelled], 'skipper');
    expect(engine('Port')).toHaveTextContent('Signed off');
    expect(engine('Starboard')).toHaveTextContent('No break-in run assigned');
    expect(onDeck(card)).toBeNull();
    // A new run on the same engine, now with the workshop: the cancelled one no longer speaks.
    await db.runs.put(submitted);
    const state = await within(card).findByText('Submitted for review');
    expect(state.closest('li')).toHaveTextContent(/^Starboard ·/);
  });

  it('a submit still waiting on this phone already reads as submitted', async () => {
    const port = testRun('port');
    await onPhase(port, 'below-half');
    const patchId = '55555555-5555-4555-8555-555555555555';
    await db.runPatches.add({
      id: patchId,
      runId: port.id,
      item: { type: 'run-patch', id: patchId, runId: port.id, at: Date.now(), submit: true },
      sync: 'pending',
      createdAt: Date.now(),
    });
    const { card, engine } = await show([port], 'skipper');
    const p = engine('Port');
    expect(p).toHaveTextContent('Submitted for review');
    expect(onDeck(card)).toBeNull();
  });
});
