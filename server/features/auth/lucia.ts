import {
  Lucia,
  TimeSpan,
  type Adapter,
  type DatabaseSession,
  type DatabaseUser,
  type User as LuciaUser,
} from 'lucia';
import { IsNull, LessThan, type DataSource } from 'typeorm';
import type { Role, SessionUser } from '../../../shared/auth/auth.schema.js';
import { User } from '../users/user.entity.js';
import { Session } from './session.entity.js';

type UserAttributes = {
  email: string;
  name: string;
  role: Role;
  workshopId: string;
  workshopName: string;
};

/** Lucia's storage interface over the TypeORM data source (sessions table + users joined to workshops). */
export class TypeormSessionAdapter implements Adapter {
  constructor(private readonly dataSource: DataSource) {}

  private get sessions() {
    return this.dataSource.getRepository(Session);
  }

  async getSessionAndUser(
    sessionId: string,
  ): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const session = await this.sessions.findOne({ where: { id: sessionId } });
    if (!session) return [null, null];
    const user = await this.dataSource.getRepository(User).findOne({
      where: { id: session.userId, archivedAt: IsNull() },
      relations: { workshop: true },
    });
    if (!user) return [null, null];
    return [toDatabaseSession(session), toDatabaseUser(user)];
  }

  async getUserSessions(userId: string): Promise<DatabaseSession[]> {
    const rows = await this.sessions.find({ where: { userId } });
    return rows.map(toDatabaseSession);
  }

  async setSession(session: DatabaseSession): Promise<void> {
    await this.sessions.insert({
      id: session.id,
      userId: session.userId,
      expiresAt: session.expiresAt.getTime(),
    });
  }

  async updateSessionExpiration(sessionId: string, expiresAt: Date): Promise<void> {
    await this.sessions.update({ id: sessionId }, { expiresAt: expiresAt.getTime() });
  }

  async deleteSession(sessionId: string): Promise<void> {
    await this.sessions.delete({ id: sessionId });
  }

  async deleteUserSessions(userId: string): Promise<void> {
    await this.sessions.delete({ userId });
  }

  async deleteExpiredSessions(): Promise<void> {
    await this.sessions.delete({ expiresAt: LessThan(Date.now()) });
  }
}

function toDatabaseSession(row: Session): DatabaseSession {
  return { id: row.id, userId: row.userId, expiresAt: new Date(row.expiresAt), attributes: {} };
}

function toDatabaseUser(row: User): DatabaseUser {
  return {
    id: row.id,
    attributes: {
      email: row.email,
      name: row.name,
      role: row.role,
      workshopId: row.workshopId,
      workshopName: row.workshop?.name ?? '',
    },
  };
}

export function createLucia(dataSource: DataSource, options: { secureCookies: boolean }) {
  return new Lucia(new TypeormSessionAdapter(dataSource), {
    // A skipper may be offshore for a month; the session renews itself whenever used.
    sessionExpiresIn: new TimeSpan(30, 'd'),
    sessionCookie: {
      name: 'ringseat_session',
      attributes: { secure: options.secureCookies, sameSite: 'lax' },
    },
    getUserAttributes: (attributes) => attributes,
  });
}

export type AppLucia = ReturnType<typeof createLucia>;

export const toSessionUser = (user: LuciaUser): SessionUser => ({
  id: user.id,
  email: user.email,
  name: user.name,
  role: user.role,
  workshopId: user.workshopId,
  workshopName: user.workshopName,
});

declare module 'lucia' {
  interface Register {
    Lucia: AppLucia;
    DatabaseUserAttributes: UserAttributes;
  }
}
