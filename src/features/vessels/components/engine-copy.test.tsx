import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { EngineRow } from '../../../../shared/vessels/vessel-view';
import { stubFetch } from '../../../test/fetch-stub';
import { renderPage } from '../../../test/render';
import { EngineForm } from './engine-form';
import { EnginesList } from './engines-list';

afterEach(() => {
  vi.unstubAllGlobals();
});

const vesselId = '3f2b8c1e-2d4a-4c6b-9e8f-1a2b3c4d5e6f';
const field = (label: string) => screen.getByLabelText(label);

// The port engine of a twin outboard installation; rated 5000–6000 rpm, 12-pole coil, as makers
// print them for four-stroke outboards (common practice). Maker, model and serial are invented.
const port: EngineRow = {
  id: '9a8b7c6d-0000-4000-8000-000000000001',
  vesselId,
  position: 'port',
  installation: 'outboard',
  maker: 'Kestrel',
  model: 'K150 4S',
  serialNumber: 'K150-0001',
  ratedPowerKw: 110,
  fuel: 'petrol',
  cycle: 'four-stroke',
  ratedRpmMin: 5000,
  ratedRpmMax: 6000,
  gearRatio: 2.08,
  propBlades: 3,
  propDiameterIn: 14.5,
  propPitchIn: 19,
  tachSource: 'charging-coil',
  poles: 12,
  pulleyRatio: null,
  hourMeterAtCommissioning: 0.4,
  commissionedOn: '2026-11-28',
  createdAt: '2026-11-28T09:00:00.000Z',
  updatedAt: '2026-11-28T09:00:00.000Z',
  archivedAt: null,
  vessel: { id: vesselId, name: 'Blue Tern', archivedAt: null },
  checklist: null,
};

/** Every engine field but position and serial number. */
const COPIED = [
  'installation',
  'maker',
  'model',
  'ratedPowerKw',
  'fuel',
  'cycle',
  'ratedRpmMin',
  'ratedRpmMax',
  'gearRatio',
  'propBlades',
  'propDiameterIn',
  'propPitchIn',
  'tachSource',
  'poles',
  'pulleyRatio',
  'hourMeterAtCommissioning',
  'commissionedOn',
] as const;

describe('adding the second engine of a twin by copying the first', () => {
  it('offers a copy button on each engine in use', async () => {
    const onCopy = vi.fn();
    const user = userEvent.setup();
    renderPage(
      <EnginesList
        engines={[port, { ...port, id: 'archived', archivedAt: '2026-11-29T00:00:00Z' }]}
        showVessel={false}
        onCopy={onCopy}
      />,
    );
    const table = screen.getByRole('table');
    const copies = within(table).getAllByRole('button', { name: /^Copy/ });
    expect(copies).toHaveLength(1);
    expect(copies[0]).toHaveAccessibleName('Copy Port · Kestrel K150 4S to add the second engine');
    await user.click(copies[0]);
    expect(onCopy).toHaveBeenCalledWith(port);
  });

  it('prefills everything but position and serial number, and asks for those', async () => {
    const { calls, fetchMock } = stubFetch({
      'POST /api/engines': { status: 201, body: { engine: { id: 'e-2' } } },
    });
    const onSaved = vi.fn();
    const user = userEvent.setup();
    renderPage(<EngineForm vesselId={vesselId} copyFrom={port} onSaved={onSaved} />);

    expect(field('Maker')).toHaveValue('Kestrel');
    expect(field('Model')).toHaveValue('K150 4S');
    expect(field('Rated full-throttle RPM, high end')).toHaveValue('6000');
    expect(field('Propeller pitch (in)')).toHaveValue('19');
    expect(field('Serial number')).toHaveValue('');
    expect(field('Position')).toHaveValue('');

    await user.click(screen.getByRole('button', { name: 'Add engine' }));
    expect(field('Position')).toHaveAccessibleDescription(
      'Choose the engine position from the list.',
    );
    expect(field('Serial number')).toHaveAccessibleDescription('Enter the serial number.');
    expect(fetchMock).not.toHaveBeenCalled();

    await user.selectOptions(field('Position'), 'Starboard');
    await user.type(field('Serial number'), 'k150-0002');
    await user.click(screen.getByRole('button', { name: 'Add engine' }));

    await vi.waitFor(() => expect(onSaved).toHaveBeenCalledWith({ id: 'e-2' }));
    const copied = Object.fromEntries(COPIED.map((key) => [key, port[key]]));
    expect(calls[0].body).toEqual({
      ...copied,
      vesselId,
      position: 'starboard',
      serialNumber: 'K150-0002',
    });
  });
});
