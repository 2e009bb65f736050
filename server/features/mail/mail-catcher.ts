import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { simpleParser, type ParsedMail } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { WORKSHOP_HEADER } from '../../lib/mailer.js';

/** A message the catcher received, as the /dev/mail page lists it. */
export interface CaughtMessage {
  id: string;
  /** The workshop the e-mail was sent for (its WORKSHOP_HEADER); null when it named none. */
  workshopId: string | null;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: Array<{ index: number; filename: string; contentType: string; size: number }>;
}

type Stored = CaughtMessage & { raw: Buffer };

const MAX_KEPT = 500;
const MAX_SIZE = 25 * 1024 * 1024;

const addresses = (field: ParsedMail['to']): string[] =>
  (Array.isArray(field) ? field : field ? [field] : [])
    .flatMap((a) => a.value.map((v) => v.address ?? ''))
    .filter(Boolean);

/**
 * The local stand-in for a mail provider: a real SMTP server inside the process, on a free
 * local port, that keeps what it receives (in memory, and as .eml files with a .json index in
 * `dir` so the mailbox survives a restart) instead of delivering it.
 */
export class MailCatcher {
  private readonly messages: Stored[] = [];
  private readonly waiters = new Set<() => void>();

  private constructor(
    private readonly server: SMTPServer,
    readonly port: number,
    private readonly dir: string | null,
  ) {}

  static async start(options: { dir?: string; host?: string } = {}): Promise<MailCatcher> {
    const dir = options.dir ?? null;
    if (dir) fs.mkdirSync(dir, { recursive: true });
    let catcher: MailCatcher | null = null;
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      size: MAX_SIZE,
      onData(stream, _session, callback) {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('end', () => {
          catcher!.receive(Buffer.concat(chunks)).then(
            () => callback(),
            (error: Error) => callback(error),
          );
        });
      },
    });
    const port = await new Promise<number>((resolve, reject) => {
      server.once('error', reject);
      server.listen(0, options.host ?? '127.0.0.1', () =>
        resolve((server.server.address() as { port: number }).port),
      );
    });
    catcher = new MailCatcher(server, port, dir);
    await catcher.loadStored();
    return catcher;
  }

  private async receive(raw: Buffer): Promise<void> {
    const parsed = await simpleParser(raw);
    const workshop = parsed.headers.get(WORKSHOP_HEADER.toLowerCase());
    const message: Stored = {
      id: randomUUID(),
      workshopId: typeof workshop === 'string' && workshop ? workshop : null,
      receivedAt: new Date().toISOString(),
      from: parsed.from?.text ?? '',
      to: addresses(parsed.to),
      subject: parsed.subject ?? '(no subject)',
      text: parsed.text ?? '',
      attachments: parsed.attachments.map((a, index) => ({
        index,
        filename: a.filename ?? `attachment-${index + 1}`,
        contentType: a.contentType,
        size: a.size,
      })),
      raw,
    };
    this.keep(message);
    if (this.dir) {
      const { raw: _raw, ...meta } = message;
      fs.writeFileSync(path.join(this.dir, `${message.id}.eml`), raw);
      fs.writeFileSync(path.join(this.dir, `${message.id}.json`), JSON.stringify(meta, null, 2));
    }
    for (const wake of this.waiters) wake();
  }

  private keep(message: Stored) {
    this.messages.unshift(message);
    if (this.messages.length > MAX_KEPT) this.messages.length = MAX_KEPT;
  }

  /** Reads back what earlier runs of the process caught, newest first. */
  private async loadStored() {
    if (!this.dir) return;
    const metas = fs.readdirSync(this.dir).filter((f) => f.endsWith('.json'));
    const stored: Stored[] = [];
    for (const file of metas) {
      try {
        const meta = JSON.parse(
          fs.readFileSync(path.join(this.dir, file), 'utf8'),
        ) as CaughtMessage;
        stored.push({
          ...meta,
          workshopId: meta.workshopId ?? null,
          raw: fs.readFileSync(path.join(this.dir, `${meta.id}.eml`)),
        });
      } catch {
        // A half-written or foreign file is skipped, never fatal.
      }
    }
    stored.sort((a, b) => a.receivedAt.localeCompare(b.receivedAt));
    for (const message of stored.slice(-MAX_KEPT)) this.keep(message);
  }

  /** Newest first: everything caught, or only what was sent for one workshop. */
  list(workshopId?: string): CaughtMessage[] {
    return this.messages
      .filter((m) => workshopId === undefined || m.workshopId === workshopId)
      .map(({ raw: _raw, ...meta }) => meta);
  }

  get(id: string): CaughtMessage | undefined {
    return this.list().find((m) => m.id === id);
  }

  /** One attachment of a message sent for `workshopId`; null for any other workshop's mail. */
  async attachment(
    workshopId: string,
    id: string,
    index: number,
  ): Promise<{ filename: string; contentType: string; content: Buffer } | null> {
    const message = this.messages.find((m) => m.id === id && m.workshopId === workshopId);
    if (!message) return null;
    const parsed = await simpleParser(message.raw);
    const found = parsed.attachments[index];
    return found
      ? {
          filename: found.filename ?? `attachment-${index + 1}`,
          contentType: found.contentType,
          content: found.content,
        }
      : null;
  }

  /** Resolves with the first message (newest first) that matches, waiting for it to arrive. */
  waitFor(match: (m: CaughtMessage) => boolean, timeoutMs = 5000): Promise<CaughtMessage> {
    return new Promise((resolve, reject) => {
      const check = () => {
        const found = this.list().find(match);
        if (!found) return false;
        this.waiters.delete(check);
        clearTimeout(timer);
        resolve(found);
        return true;
      };
      const timer = setTimeout(() => {
        this.waiters.delete(check);
        reject(new Error(`no matching e-mail within ${timeoutMs} ms`));
      }, timeoutMs);
      if (!check()) this.waiters.add(check);
    });
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}
