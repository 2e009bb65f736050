import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { EmailSchema } from '../../../shared/auth/auth.schema.js';
import { Invite } from './invite.entity.js';
import { newInvite, OPERATOR } from './new-invite.js';
import { User } from '../users/user.entity.js';
import { Workshop } from '../workshops/workshop.entity.js';

/* A real workshop and the invite of its first manager, made by the operator from the command
   line (server/cli/create-workshop.ts). The manager sets their own password through the invite
   link, so no password passes through a shell history or a process list. */

const isTimeZone = (zone: string) => {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
};

export const NewWorkshopSchema = z.object({
  workshop: z
    .string({ error: 'Give the workshop its name (--workshop).' })
    .trim()
    .min(1, { error: 'Give the workshop its name (--workshop).' })
    .max(120, { error: 'A workshop name has at most 120 characters (--workshop).' }),
  email: EmailSchema,
  timezone: z
    .string()
    .refine(isTimeZone, {
      error: 'The time zone (--timezone) must be a zone name like Europe/Oslo or UTC.',
    })
    .default('UTC'),
});
export type NewWorkshop = z.infer<typeof NewWorkshopSchema>;

export type CreatedWorkshop = {
  workshopId: string;
  /** The workshop's name as stored. */
  name: string;
  token: string;
  expiresAt: Date;
  /** False when a workshop of that name was waiting for its first manager: a new link only. */
  created: boolean;
};

/**
 * Creates the workshop, its built-in programs and a manager invite in one go. Run again with
 * the same workshop name before anyone has accepted, it makes a new link for the same workshop
 * (a lost link) instead of a second workshop; once the workshop has a manager, its managers
 * invite people from the team page and this refuses.
 */
export async function createWorkshop(
  dataSource: DataSource,
  input: NewWorkshop,
  now: Date,
): Promise<CreatedWorkshop> {
  return dataSource.transaction(async (manager) => {
    if (await manager.getRepository(User).exists({ where: { email: input.email } }))
      throw new Error(`${input.email} already has an account (--email); choose another address.`);
    const same = await manager
      .getRepository(Workshop)
      .createQueryBuilder('w')
      .where('lower(w.name) = lower(:name)', { name: input.workshop })
      .getOne();
    if (same && (await manager.getRepository(User).exists({ where: { workshopId: same.id } })))
      throw new Error(
        `A workshop named "${same.name}" already has its people (--workshop); its managers invite others from the Team page.`,
      );
    const workshopId = same?.id ?? randomUUID();
    if (!same)
      await manager.getRepository(Workshop).insert({
        id: workshopId,
        name: input.workshop,
        email: input.email,
        timezone: input.timezone,
        units: { speed: 'kn', volume: 'L', power: 'kW', temperature: 'C' },
      });
    const { invite, token } = newInvite(
      { workshopId, email: input.email, role: 'manager', vesselIds: [], invitedById: OPERATOR },
      now,
    );
    await manager.getRepository(Invite).insert(invite);
    return {
      workshopId,
      name: same?.name ?? input.workshop,
      token,
      expiresAt: invite.expiresAt,
      created: !same,
    };
  });
}
