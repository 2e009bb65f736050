import type fc from 'fast-check';
import type { z } from 'zod';
import { AttachmentUploadFieldsSchema } from '../../shared/attachments/attachment.schema.js';
import {
  AcceptInviteInputSchema,
  InviteInputSchema,
  SignInInputSchema,
} from '../../shared/auth/auth.schema.js';
import { EngineInputSchema } from '../../shared/engines/engine.schema.js';
import { AssignProgramInputSchema } from '../../shared/runs/run.schema.js';
import { PushBatchSchema } from '../../shared/sync/sync.schema.js';
import { VesselInputSchema } from '../../shared/vessels/vessel.schema.js';
import { pushOfBadItems } from './bad-push.js';
import type { BadBody } from './bad-values.js';

/**
 * The body schema each write without an id in its address checks (the same shared schema its
 * router passes to `validate`). A write with an id is kept harmless by an id that names nothing;
 * these have no id, so an object body is sent only when this schema refuses it.
 *
 * A write missing here gets only requests refused before any handler runs (malformed JSON, a
 * body of another type, a foreign Origin), since it may act on any body at all:
 * POST /api/auth/sign-out and POST /api/account/sign-out-everywhere read none and would sign
 * the test's own sessions out. A new write lands there too until it is added here.
 */
export const BODY_SCHEMAS: Record<string, z.core.$ZodType> = {
  'POST /api/auth/sign-in': SignInInputSchema,
  'POST /api/auth/accept-invite': AcceptInviteInputSchema,
  'POST /api/invites': InviteInputSchema,
  'POST /api/vessels': VesselInputSchema,
  'POST /api/engines': EngineInputSchema,
  'POST /api/runs': AssignProgramInputSchema,
  'POST /api/sync/push': PushBatchSchema,
  // Multipart for a real upload; its fields are checked the same way when sent as JSON.
  'POST /api/attachments': AttachmentUploadFieldsSchema,
};

/**
 * Bodies a route's schema accepts that still name no record, for the routes whose real checks
 * come after the schema: a push's envelope is checked first and each item on its own after it.
 */
export const PAST_SCHEMA_BODIES: Record<string, fc.Arbitrary<BadBody>> = {
  'POST /api/sync/push': pushOfBadItems,
};
