import { Router, type RequestHandler, type Response } from 'express';
import { z } from 'zod';
import type { CaughtMessage, MailCatcher } from './mail-catcher.js';

/*
 * /dev/mail: what the local catcher received, for managers, outside production only. A plain
 * server page (not part of the app bundle) so it works even when the client is not built.
 */

const esc = (text: string) =>
  text.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!,
  );

const STYLE = `body{margin:0;background:#f3ead6;color:#1b1813;font:17px/1.5 system-ui,sans-serif}
main{max-width:60rem;margin:0 auto;padding:1rem}h1{font-size:1.8rem}
details{background:#fbf6ea;border:2px solid #857557;border-radius:8px;margin:0 0 .75rem;padding:.5rem 1rem}
summary{cursor:pointer;font-weight:700;min-height:48px;display:flex;align-items:center;gap:.5rem;flex-wrap:wrap}
pre{white-space:pre-wrap;font:15px/1.45 ui-monospace,monospace;background:#e8dcc1;padding:.75rem;border-radius:6px}
a{color:#7b4f14;font-weight:600}.meta{color:#4a4131;font-size:.95rem}.att{display:inline-flex;min-height:48px;align-items:center}
@media (prefers-color-scheme:dark){body{background:#000;color:#e54700}details{background:#0e0200;border-color:#6e1c00}pre{background:#1c0500}a,.meta{color:#e54700}}`;

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${esc(title)} · Ringseat</title><style>${STYLE}</style></head><body><main>${body}</main></body></html>`;
}

function messageHtml(m: CaughtMessage, index: number): string {
  const files = m.attachments
    .map(
      (a) =>
        `<li><a class="att" href="/dev/mail/${m.id}/attachments/${a.index}" download>${esc(a.filename)}</a> <span class="meta">${esc(a.contentType)}, ${Math.ceil(a.size / 1024)} KB</span></li>`,
    )
    .join('');
  return `<details ${index === 0 ? 'open' : ''}><summary>${esc(m.subject)}</summary>
<p class="meta">From ${esc(m.from)} to ${esc(m.to.join(', '))}, received ${esc(new Date(m.receivedAt).toUTCString())}</p>
<pre>${esc(m.text)}</pre>${files ? `<p>Attachments:</p><ul>${files}</ul>` : ''}</details>`;
}

/** Signed-in managers only; anyone else is sent to sign in or told plainly. */
const managersOnly: RequestHandler = (req, res, next) => {
  const user = res.locals.user;
  if (!user) {
    res.redirect(303, `/sign-in?next=${encodeURIComponent(req.originalUrl)}`);
    return;
  }
  if (user.role !== 'manager') {
    res
      .status(403)
      .type('html')
      .send(
        page(
          'Not allowed',
          '<h1>Not allowed</h1><p>Only the workshop\u2019s managers can read the local mailbox.</p><p><a href="/">Back to Ringseat</a></p>',
        ),
      );
    return;
  }
  next();
};

const ParamsSchema = z.object({ id: z.uuid(), index: z.coerce.number().int().nonnegative() });

function notFound(res: Response) {
  res
    .status(404)
    .type('html')
    .send(
      page(
        'Not found',
        '<h1>Not found</h1><p>No such e-mail or attachment.</p><p><a href="/dev/mail">Back to the mailbox</a></p>',
      ),
    );
}

export function devMailRouter(catcher: MailCatcher, session: RequestHandler): Router {
  const router = Router();
  router.use(session, managersOnly);

  // Each workshop's managers read only the mail sent for their workshop: invite links in
  // another workshop's mail would let them in there.
  router.get('/', (_req, res) => {
    const messages = catcher.list(res.locals.user!.workshopId);
    const list =
      messages.length === 0
        ? '<p>No e-mail has been sent yet.</p>'
        : messages.map(messageHtml).join('');
    res.setHeader('Cache-Control', 'no-store');
    res.type('html').send(
      page(
        'Local mailbox',
        `<h1>Local mailbox</h1>
<p class="meta">Every e-mail Ringseat sent for this workshop while no outside mail server is set up lands here instead of being delivered (${messages.length} kept, newest first). Set SMTP_HOST to send real mail.</p>
<p><a href="/">Back to Ringseat</a></p>${list}`,
      ),
    );
  });

  router.get('/messages.json', (_req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json({ messages: catcher.list(res.locals.user!.workshopId) });
  });

  router.get('/:id/attachments/:index', async (req, res) => {
    const params = ParamsSchema.safeParse(req.params);
    const found = params.success
      ? await catcher.attachment(res.locals.user!.workshopId, params.data.id, params.data.index)
      : null;
    if (!found) return notFound(res);
    res.setHeader('Content-Type', found.contentType);
    res.setHeader('X-Content-Type-Options', 'nosniff');
    res.attachment(found.filename);
    res.send(found.content);
  });

  return router;
}
