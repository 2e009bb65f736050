import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import type { OutgoingMailView } from '../../../shared/mail/outgoing-mail.js';
import type { Clock } from '../../lib/clock.js';
import { NotFoundError } from '../../lib/errors.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { Outbox } from './outbox.js';
import { OutgoingMail } from './outgoing-mail.entity.js';

const IdParamsSchema = z.object({
  id: z.uuid({ error: 'The e-mail id in the address is not valid.' }),
});

const viewOf = (row: OutgoingMail): OutgoingMailView => ({
  id: row.id,
  recipients: row.recipients,
  subject: row.subject,
  state: row.state,
  attempts: row.attempts,
  lastError: row.lastError,
  createdAt: row.createdAt.toISOString(),
  sentAt: row.sentAt?.toISOString() ?? null,
  nextAttemptAt: row.state === 'waiting' ? new Date(row.nextAttemptAt).toISOString() : null,
});

/** The workshop's outbox for its managers: what went, what waits and why, and "try again now". */
export function outgoingMailRouter(dataSource: DataSource, outbox: Outbox, clock: Clock): Router {
  const router = Router();
  const repository = dataSource.getRepository(OutgoingMail);

  router.get('/mail/outgoing', requireRole('manager'), async (_req, res) => {
    const rows = await repository.find({
      where: { workshopId: currentUser(res).workshopId },
      order: { createdAt: 'DESC', id: 'ASC' },
      take: 100,
    });
    res.json({ mail: rows.map(viewOf) });
  });

  router.post(
    '/mail/outgoing/:id/retry',
    requireRole('manager'),
    validate({ params: IdParamsSchema }),
    async (req, res) => {
      const where = { id: String(req.params.id), workshopId: currentUser(res).workshopId };
      const row = await repository.findOneBy(where);
      if (!row) throw new NotFoundError('e-mail', where.id);
      if (row.state !== 'sent' && row.recipients) {
        const fresh = row.state === 'failed' ? { attempts: 0 } : {};
        await repository.update(where, {
          ...fresh,
          state: 'waiting',
          nextAttemptAt: clock.now().getTime(),
        });
        await outbox.deliver([row.id]);
      }
      res.json({ mail: viewOf(await repository.findOneByOrFail(where)) });
    },
  );

  return router;
}
