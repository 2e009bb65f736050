import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { AppDeps } from '../../app.js';
import { createSmtpMailer } from '../../lib/mailer.js';
import { startTestServer, type TestServer } from '../../../tests/helpers/test-server.js';
import { MailCatcher } from './mail-catcher.js';

export type MailTestServer = TestServer & { catcher: MailCatcher; dataDir: string };

/**
 * A test server whose e-mail goes over real SMTP to a real catcher on a free local port, with
 * its own data folder for certificates and uploads. For tests only.
 */
export async function startMailTestServer(
  overrides: Partial<AppDeps> = {},
): Promise<MailTestServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ringseat-files-'));
  const catcher = await MailCatcher.start({ dir: path.join(dataDir, 'mail') });
  const mailer = createSmtpMailer({
    host: '127.0.0.1',
    port: catcher.port,
    secure: false,
    from: 'Ringseat <no-reply@ringseat.invalid>',
  });
  const server = await startTestServer({ mailer, mailbox: catcher, dataDir, ...overrides });
  return {
    ...server,
    catcher,
    dataDir,
    close: async () => {
      mailer.close();
      await catcher.close();
      await server.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
