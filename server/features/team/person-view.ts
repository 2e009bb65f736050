import type { User } from '../users/user.entity.js';

/** A person as the team page shows them: never the password hash. */
export const personView = (u: User) => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  createdAt: u.createdAt.toISOString(),
  archivedAt: u.archivedAt?.toISOString() ?? null,
});
