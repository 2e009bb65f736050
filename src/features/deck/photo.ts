import type { PhotoInput } from './deck-store';

/*
 * Photos are made smaller on the phone before they are stored: a phone camera's 12 MP image is
 * several megabytes, and it waits in IndexedDB until there is signal. 1600 px on the long side
 * keeps an hour meter or a tachometer face readable (our own choice).
 */
export const PHOTO_MAX_EDGE_PX = 1600;
export const PHOTO_MAX_BYTES = 1_500_000;
const JPEG_QUALITY = 0.8;

export function fitWithin(
  width: number,
  height: number,
  maxEdge = PHOTO_MAX_EDGE_PX,
): { width: number; height: number } {
  const scale = Math.min(1, maxEdge / Math.max(width, height));
  return {
    width: Math.max(1, Math.round(width * scale)),
    height: Math.max(1, Math.round(height * scale)),
  };
}

export class PhotoError extends Error {}

/** Downscales an image file to JPEG; refuses files that are not images or stay too large. */
export async function preparePhoto(file: File): Promise<PhotoInput> {
  if (!file.type.startsWith('image/'))
    throw new PhotoError('The photo must be an image (JPEG, PNG or HEIC from the camera).');
  let bitmap: ImageBitmap;
  try {
    bitmap = await createImageBitmap(file);
  } catch {
    throw new PhotoError('This photo could not be read. Take it again, or choose another.');
  }
  const size = fitWithin(bitmap.width, bitmap.height);
  const canvas = document.createElement('canvas');
  canvas.width = size.width;
  canvas.height = size.height;
  canvas.getContext('2d')?.drawImage(bitmap, 0, 0, size.width, size.height);
  bitmap.close();
  const blob = await new Promise<Blob | null>((resolve) =>
    canvas.toBlob(resolve, 'image/jpeg', JPEG_QUALITY),
  );
  if (!blob) throw new PhotoError('This photo could not be made smaller on this device.');
  if (blob.size > PHOTO_MAX_BYTES)
    throw new PhotoError(
      'The photo is still too large after making it smaller. Choose a simpler picture.',
    );
  return { blob, mimeType: 'image/jpeg', ...size };
}
