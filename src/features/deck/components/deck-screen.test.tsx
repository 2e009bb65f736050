import { beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { db } from '../../../lib/db';
import { MIN, testRun, testVessel } from '../test-fixtures';
import { clearDevice, outingOn, readingAt, showDeck as show, store } from './deck-test-db';

/*
 * The run screen on the built-in four-stroke program with demo engines rated 5000–6000 rpm
 * (bands: below half 0–3000 rpm; a test band of 1500–3000 rpm where "under" must show).
 */
const port = testRun('port');
const starboard = testRun('starboard');

beforeEach(clearDevice);

const panel = (name: string) => screen.findByRole('region', { name });

describe('the deck run screen', () => {
  it('shows a twin side by side, each engine with its own state: in band and over', async () => {
    const startedAt = await outingOn([port, starboard]);
    await store(port, [readingAt(startedAt + 2 * MIN, 2400)]);
    await store(starboard, [readingAt(startedAt + 2 * MIN, 3500)]);
    show();
    const left = await panel('Port');
    const right = await panel('Starboard');
    expect(left.parentElement).toBe(right.parentElement);
    expect(left.parentElement).toHaveClass('grid-cols-2');
    expect(await within(left).findByRole('status', { name: /Port: In band/ })).toBeInTheDocument();
    expect(
      within(right).getByRole('status', { name: /Starboard: Over, ease back/ }),
    ).toBeInTheDocument();
    expect(within(left).getByTestId('time-in-band').textContent).toMatch(/^0:0[23]:\d\d$/);
    expect(
      within(left).getByText('Below half throttle, changing speed', { selector: 'p' }),
    ).toBeInTheDocument();
    expect(within(left).getByText('0–3000 rpm')).toBeInTheDocument();
    expect(screen.getByRole('radiogroup', { name: 'Reading for' })).toBeInTheDocument();
  });

  it('shows under when the engine runs below the band, and the over-band alert after the grace', async () => {
    const banded = testRun('port', {
      bands: { ...port.bands, 'below-half': { rpmMin: 1500, rpmMax: 3000 } },
    });
    const startedAt = await outingOn([banded], 10);
    await store(banded, [readingAt(startedAt + MIN, 1000, 'quarter')]);
    show();
    expect(
      await screen.findByRole('status', { name: /Port: Under, open up a little/ }),
    ).toBeInTheDocument();
    await store(banded, [readingAt(startedAt + 7 * MIN, 3600)]);
    expect(await screen.findByRole('status', { name: /Port: Over/ })).toBeInTheDocument();
    const alert = await screen.findByText('Over the band: ease back');
    expect(alert.closest('[role="alert"]')).toBeInTheDocument();
    await waitFor(async () =>
      expect((await db.events.toArray()).filter((e) => e.kind === 'alert')).toHaveLength(1),
    );
  });

  it('logs a reading typed on the keypad for both engines at once', async () => {
    await outingOn([port, starboard]);
    const user = userEvent.setup();
    show();
    const keypad = await screen.findByRole('group', { name: 'Keypad' });
    for (const key of ['2', '4', '0', '0'])
      await user.click(within(keypad).getByRole('button', { name: key }));
    expect(screen.getByRole('textbox', { name: 'Engine speed (RPM)' })).toHaveValue('2400');
    await user.click(screen.getByRole('radio', { name: 'half throttle' }));
    await user.click(screen.getByRole('button', { name: 'Log reading' }));
    expect(
      await screen.findByText('Logged 2400 and 2400 rpm at half throttle for Port and Starboard.'),
    ).toBeInTheDocument();
    const readings = (await db.events.toArray())
      .filter((e) => e.kind === 'reading')
      .map((e) => e.event);
    expect(readings).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          engineId: port.engine.id,
          rpm: 2400,
          throttle: 'half',
          phaseId: 'below-half',
          rpmSource: 'tachometer',
        }),
        expect.objectContaining({ engineId: starboard.engine.id, rpm: 2400, throttle: 'half' }),
      ]),
    );
  });

  it('refuses a negative speed with a message naming the field, and asks before a speed far above rated', async () => {
    await outingOn([port]);
    const user = userEvent.setup();
    show();
    const entry = await screen.findByRole('textbox', { name: 'Engine speed (RPM)' });
    await user.type(entry, '-300');
    await user.click(screen.getByRole('radio', { name: 'half throttle' }));
    await user.click(screen.getByRole('button', { name: 'Log reading' }));
    expect(
      await screen.findByText('The engine speed (RPM) cannot be negative.'),
    ).toBeInTheDocument();
    expect(entry).toHaveAttribute('aria-invalid', 'true');
    await user.clear(entry);
    await user.type(entry, '7000');
    await user.click(screen.getByRole('button', { name: 'Log reading' }));
    expect(
      await screen.findByText(/7000 rpm is far above the rated top of 6000 rpm/),
    ).toBeInTheDocument();
    expect((await db.events.toArray()).filter((e) => e.kind === 'reading')).toHaveLength(0);
    await user.click(screen.getByRole('button', { name: 'Yes, log it' }));
    await waitFor(async () =>
      expect((await db.events.toArray()).filter((e) => e.kind === 'reading')).toHaveLength(1),
    );
  });

  it("turns a measured frequency into RPM with the engine's 12 poles (rpm = 10 × Hz, common practice)", async () => {
    await outingOn([port]);
    const user = userEvent.setup();
    show();
    await user.click(await screen.findByRole('radio', { name: 'Measured frequency in hertz' }));
    expect(screen.getByText('Converted with the 12-pole charging coil.')).toBeInTheDocument();
    await user.type(screen.getByRole('textbox', { name: 'Measured frequency (Hz)' }), '0');
    await user.click(screen.getByRole('radio', { name: 'half throttle' }));
    await user.click(screen.getByRole('button', { name: 'Log reading' }));
    expect(
      await screen.findByText('The measured frequency (Hz) must be more than zero.'),
    ).toBeInTheDocument();
    await user.clear(screen.getByRole('textbox', { name: 'Measured frequency (Hz)' }));
    await user.type(screen.getByRole('textbox', { name: 'Measured frequency (Hz)' }), '240');
    await user.click(screen.getByRole('button', { name: 'Log reading' }));
    await waitFor(async () => {
      const [reading] = (await db.events.toArray()).filter((e) => e.kind === 'reading');
      expect(reading?.event).toMatchObject({ rpm: 2400, rpmSource: 'frequency', frequencyHz: 240 });
    });
  });

  it('for a skipper, a workshop phase not yet done shows as waiting and cannot be started', async () => {
    await db.runs.put(port);
    await db.vessels.put(testVessel([port]));
    show('skipper');
    expect(
      await screen.findByRole('status', { name: /Port: Waiting, for the workshop/ }),
    ).toBeInTheDocument();
    expect(
      screen.getByText(/waiting for the workshop \(First run at the dock\)/),
    ).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Start outing' })).toBeDisabled();
  });

  it('starts an outing only once the cautions are read', async () => {
    await db.runs.put(port);
    await db.vessels.put(testVessel([port]));
    const user = userEvent.setup();
    show('technician');
    expect(await screen.findByText(/kill-switch lanyard/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Start outing' }));
    expect(
      screen.getByText('Tick that you have read the cautions before starting.'),
    ).toBeInTheDocument();
    expect(await db.events.count()).toBe(0);
    await user.click(screen.getByRole('checkbox', { name: 'I have read the cautions' }));
    await user.click(screen.getByRole('button', { name: 'Start outing' }));
    expect(await screen.findByRole('button', { name: 'Log reading' })).toBeInTheDocument();
    expect((await db.events.toArray()).map((e) => e.kind)).toEqual(['session-start']);
  });
});
