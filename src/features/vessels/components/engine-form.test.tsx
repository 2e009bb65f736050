import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { problem, stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { EngineForm } from './engine-form';

afterEach(() => {
  vi.unstubAllGlobals();
});

const vesselId = '3f2b8c1e-2d4a-4c6b-9e8f-1a2b3c4d5e6f';
const field = (label: string) => screen.getByLabelText(label);

async function fillRequired(user: ReturnType<typeof userEvent.setup>) {
  await user.type(field('Maker'), 'Kestrel');
  await user.type(field('Model'), 'K25 4S');
  await user.type(field('Serial number'), 'kt-25-000871');
  // A rated range of 5000–6000 rpm, as makers print it for four-stroke outboards (common practice).
  await user.type(field('Rated full-throttle RPM, low end'), '5000');
  await user.type(field('Rated full-throttle RPM, high end'), '6000');
}

describe('EngineForm', () => {
  it('shows each missing field’s error beside that field and sends nothing', async () => {
    const { fetchMock } = stubFetch({});
    const user = userEvent.setup();
    renderPage(<EngineForm vesselId={vesselId} onSaved={() => {}} />);

    await user.click(screen.getByRole('button', { name: 'Add engine' }));

    expect(
      await screen.findByText('5 fields need attention: see the marked fields below.'),
    ).toBeInTheDocument();
    expect(field('Maker')).toHaveAccessibleDescription('Enter the maker.');
    expect(field('Model')).toHaveAccessibleDescription('Enter the model.');
    expect(field('Serial number')).toHaveAccessibleDescription('Enter the serial number.');
    expect(field('Rated full-throttle RPM, low end')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Rated RPM (low end) must be a number.')).toBeInTheDocument();
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('names a backwards rated range, odd poles and a word where a number belongs', async () => {
    const { fetchMock } = stubFetch({});
    const user = userEvent.setup();
    renderPage(<EngineForm vesselId={vesselId} onSaved={() => {}} />);

    await fillRequired(user);
    await user.clear(field('Rated full-throttle RPM, high end'));
    await user.type(field('Rated full-throttle RPM, high end'), '4800');
    await user.selectOptions(field('Signal source'), 'charging-coil');
    await user.type(field('Poles of the coil or alternator'), '7');
    await user.type(field('Propeller pitch (in)'), 'nineteen');
    await user.click(screen.getByRole('button', { name: 'Add engine' }));

    expect(
      await screen.findByText('Rated RPM high end must be above the low end.'),
    ).toBeInTheDocument();
    expect(field('Rated full-throttle RPM, high end')).toHaveAccessibleDescription(
      'Rated RPM high end must be above the low end.',
    );
    expect(field('Poles of the coil or alternator')).toHaveAccessibleDescription(
      expect.stringContaining('Poles come in pairs: enter an even number.'),
    );
    expect(field('Propeller pitch (in)')).toHaveAccessibleDescription(
      'Propeller pitch must be a number.',
    );
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('sends numbers (a comma as the decimal point) and shows the tachometer setting', async () => {
    const { calls } = stubFetch({
      'POST /api/engines': { status: 201, body: { engine: { id: 'e-1' } } },
    });
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderPage(<EngineForm vesselId={vesselId} onSaved={onSaved} />);

    await fillRequired(user);
    await user.type(field('Gear ratio (x:1)'), '2,08');
    await user.selectOptions(field('Signal source'), 'charging-coil');
    await user.type(field('Poles of the coil or alternator'), '12');
    // 12-pole coil: 12 on a poles dial, 6 on a pulses-per-rev dial (common practice).
    expect(
      screen.getByText(
        /12 on a dial labelled in poles, or 6 on one labelled in pulses per revolution/,
      ),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Add engine' }));

    await vi.waitFor(() => expect(onSaved).toHaveBeenCalledWith({ id: 'e-1' }));
    expect(calls[0].body).toMatchObject({
      vesselId,
      maker: 'Kestrel',
      serialNumber: 'KT-25-000871',
      ratedRpmMin: 5000,
      ratedRpmMax: 6000,
      gearRatio: 2.08,
      tachSource: 'charging-coil',
      poles: 12,
      pulleyRatio: null,
      commissionedOn: null,
    });
  });

  it('puts the server’s serial-number refusal on the serial number field', async () => {
    const message =
      'Serial number KT-25-000871 is already recorded on the single engine of Gannet.';
    stubFetch({
      'POST /api/engines': problem(409, 'Conflict', message, [{ field: 'serialNumber', message }]),
    });
    const user = userEvent.setup();
    renderPage(<EngineForm vesselId={vesselId} onSaved={() => {}} />);

    await fillRequired(user);
    await user.click(screen.getByRole('button', { name: 'Add engine' }));

    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(field('Serial number')).toHaveAccessibleDescription(`${message}`);
    expect(screen.queryByText('Engine not saved')).not.toBeInTheDocument();
  });
});
