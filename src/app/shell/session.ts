import { useOutletContext } from 'react-router-dom';
import type { SessionUser } from '../../../shared/auth/auth.schema';

export interface SessionContext {
  user: SessionUser;
}

/** The signed-in user, for routes inside the app shell (the shell guarantees one). */
export const useSessionUser = () => useOutletContext<SessionContext>().user;
