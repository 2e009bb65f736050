import { describe, expect, it } from 'vitest';
import { fitWithin, PhotoError, preparePhoto } from './photo';

describe('photos made smaller on the device', () => {
  it('fits the long side within 1600 px (our own choice), keeping the shape', () => {
    expect(fitWithin(4032, 3024)).toEqual({ width: 1600, height: 1200 });
    expect(fitWithin(3024, 4032)).toEqual({ width: 1200, height: 1600 });
    expect(fitWithin(800, 600)).toEqual({ width: 800, height: 600 });
  });

  it('refuses a file that is not an image', async () => {
    await expect(
      preparePhoto(new File(['%PDF'], 'schedule.pdf', { type: 'application/pdf' })),
    ).rejects.toBeInstanceOf(PhotoError);
  });
});
