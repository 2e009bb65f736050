import { api, isApiError } from '../../lib/api-client';
import { db } from '../../lib/db';

/**
 * Sends photos one at a time, after the readings they belong to. Each upload carries the
 * photo's device-made id, so sending it again after a lost answer stores it once.
 * A failed file is simply sent whole again next time.
 */
export async function uploadPendingPhotos(): Promise<void> {
  const pending = await db.photos.where('sync').equals('pending').sortBy('createdAt');
  for (const photo of pending) {
    const form = new FormData();
    form.append('id', photo.id);
    form.append('recordType', 'run');
    form.append('recordId', photo.runId);
    if (photo.caption) form.append('caption', photo.caption);
    const extension = photo.mimeType === 'image/png' ? 'png' : 'jpg';
    form.append('file', photo.blob, `${photo.id}.${extension}`);
    try {
      await api.postForm('/api/attachments', form);
      await db.photos.update(photo.id, { sync: 'synced' });
    } catch (error) {
      if (isApiError(error) && isFinalRefusal(error.status)) {
        await db.photos.update(photo.id, { sync: 'rejected', rejectReason: error.message });
        continue;
      }
      throw error;
    }
  }
}

/** 4xx answers other than "sign in" and "slow down" will not change by trying again. */
export const isFinalRefusal = (status: number) =>
  status >= 400 && status < 500 && status !== 401 && status !== 408 && status !== 429;
