import type { Response } from 'express';
import { toSessionUser, type AppLucia } from './lucia.js';

/** Sets the session cookie and answers with the user the new session belongs to. */
export async function startSession(
  lucia: AppLucia,
  res: Response,
  sessionId: string,
  status: number,
): Promise<void> {
  res.append('Set-Cookie', lucia.createSessionCookie(sessionId).serialize());
  const { user } = await lucia.validateSession(sessionId);
  res.status(status).json({ user: user && toSessionUser(user) });
}
