import path from 'node:path';
import type { Logger } from '../../lib/logger.js';
import { createSmtpMailer, loadMailSettings, type Mailer } from '../../lib/mailer.js';
import { MailCatcher } from './mail-catcher.js';

/**
 * The mail setup of a starting server. With SMTP_HOST set, mail goes to that server. Without
 * it, outside production, a catcher inside the process takes every e-mail (kept under
 * <dataDir>/mail, shown on /dev/mail); in production without SMTP_HOST nothing is sent and
 * every place that would send says so.
 */
export async function startMail(options: {
  production: boolean;
  dataDir: string;
  logger: Logger;
  env?: NodeJS.ProcessEnv;
}) {
  const settings = loadMailSettings(options.env);
  if (settings.smtp) {
    const mailer = createSmtpMailer(settings.smtp);
    options.logger.info(`e-mail goes out through ${mailer.describe}`);
    return { mailer, mailbox: undefined, close: async () => mailer.close() };
  }
  if (options.production) {
    options.logger.warn(
      'SMTP_HOST is not set: no e-mail will be sent (invites, certificates, reminders)',
    );
    return { mailer: null as Mailer | null, mailbox: undefined, close: async () => undefined };
  }
  const mailbox = await MailCatcher.start({ dir: path.join(options.dataDir, 'mail') });
  const mailer = createSmtpMailer({
    host: '127.0.0.1',
    port: mailbox.port,
    secure: false,
    from: settings.from,
  });
  options.logger.info(
    `e-mail is caught locally (smtp://127.0.0.1:${mailbox.port}); managers read it at /dev/mail`,
  );
  return {
    mailer: mailer as Mailer | null,
    mailbox,
    close: async () => {
      mailer.close();
      await mailbox.close();
    },
  };
}
