import { randomUUID } from 'node:crypto';
import type { Role } from '../../../shared/auth/auth.schema.js';
import { hashToken, newToken } from '../../lib/tokens.js';
import { Invite } from './invite.entity.js';

export const INVITE_VALID_DAYS = 7;

/** Who made an invite from the command line rather than from the team page. */
export const OPERATOR = 'operator';

/** A new invite row and its one-time token; only the token's hash is ever stored. */
export function newInvite(
  fields: {
    workshopId: string;
    email: string;
    role: Role;
    vesselIds: string[];
    invitedById: string;
  },
  now: Date,
): { invite: Invite; token: string } {
  const token = newToken();
  const invite = Object.assign(new Invite(), {
    id: randomUUID(),
    ...fields,
    vesselIds: fields.role === 'skipper' ? fields.vesselIds : [],
    tokenHash: hashToken(token),
    expiresAt: new Date(now.getTime() + INVITE_VALID_DAYS * 86_400_000),
    acceptedAt: null,
  });
  return { invite, token };
}
