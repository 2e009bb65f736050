import { isApiError } from '../lib/api-client';

/** What went wrong, in words, for any error a page can throw (the deck app uses it too). */
export function describeError(error: unknown): { title: string; detail: string } {
  if (isApiError(error)) {
    return {
      title: error.isNetworkError ? 'No connection' : 'The server could not answer',
      detail: error.message,
    };
  }
  // A chunk that fails to load usually means a newer version of the app was installed.
  if (
    error instanceof TypeError &&
    /dynamically imported module|Importing a module script/i.test(error.message)
  ) {
    return { title: 'Ringseat was updated', detail: 'Reload the page to get the new version.' };
  }
  return {
    title: 'Something went wrong',
    detail: 'This page stopped working. Try again, or go back to the start.',
  };
}
