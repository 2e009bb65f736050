import type { SessionUser } from '../../../shared/auth/auth.schema';
import { api, isApiError } from '../../lib/api-client';
import { cachedUser, clearUserData, rememberUser } from '../../lib/db';

// Plain functions, no server-state library: the workshop app wraps them in queries, the deck
// app (src/deck) calls them directly.

/** The device database must never stand in the way of signing in: a failure there is only logged. */
export const quietly = <T>(work: Promise<T>) =>
  work.catch((error: unknown) => console.warn('Ringseat: the device database failed.', error));

/**
 * The signed-in user, or null when nobody is signed in (401 is an answer here, not an error).
 * With no network at all (at sea) the user the server last confirmed on this device stands in,
 * so the app opens offline; a 401 means signed out and clears the user's copies on the device.
 */
export async function fetchSessionUser(signal?: AbortSignal): Promise<SessionUser | null> {
  try {
    const { user } = await api.get<{ user: SessionUser }>('/api/auth/me', signal);
    await quietly(rememberUser(user));
    return user;
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      await quietly(clearUserData());
      return null;
    }
    if (isApiError(error) && error.isNetworkError) {
      const cached = await cachedUser().catch(() => null);
      if (cached) return cached;
    }
    throw error;
  }
}

/** Ends the session on the server; one that has already expired there counts as signed out. */
export async function signOutOnServer(): Promise<void> {
  try {
    await api.post<void>('/api/auth/sign-out');
  } catch (error) {
    if (!(isApiError(error) && error.status === 401)) throw error;
  }
}
