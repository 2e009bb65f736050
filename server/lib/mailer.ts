import nodemailer, { type Transporter } from 'nodemailer';
import { z } from 'zod';

/** One e-mail as the app writes it; `from` comes from the mailer's settings. */
export interface MailMessage {
  to: string[];
  subject: string;
  text: string;
  html?: string;
  replyTo?: string;
  attachments?: Array<{ filename: string; content: Buffer; contentType: string }>;
  headers?: Record<string, string>;
}

/**
 * Names the workshop an e-mail was sent for, so the local catcher shows each workshop's staff
 * only their own mail. It carries an id, nothing personal.
 */
export const WORKSHOP_HEADER = 'X-Ringseat-Workshop';

export interface Mailer {
  /** Where mail goes, for logs: "smtp://host:port". */
  readonly describe: string;
  send(message: MailMessage): Promise<{ messageId: string; accepted: string[] }>;
  close(): void;
}

export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  from: string;
}

const MailEnvSchema = z.object({
  SMTP_HOST: z.string().trim().min(1).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  SMTP_SECURE: z
    .enum(['true', 'false'], { error: 'SMTP_SECURE must be true or false.' })
    .optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().trim().min(3).default('Ringseat <no-reply@ringseat.invalid>'),
});

/**
 * Mail settings from the environment. Without SMTP_HOST there is no outside server: the process
 * starts its own local catcher (development and tests) or sends nothing (production).
 */
export function loadMailSettings(env: NodeJS.ProcessEnv = process.env): {
  smtp: SmtpSettings | null;
  from: string;
} {
  const parsed = MailEnvSchema.safeParse(env);
  if (!parsed.success)
    throw new Error(
      `Invalid mail settings:\n${parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n')}`,
    );
  const e = parsed.data;
  if (!e.SMTP_HOST) return { smtp: null, from: e.MAIL_FROM };
  const secure = e.SMTP_SECURE === 'true';
  // 465 is SMTP over TLS, 587 submission with STARTTLS (RFC 8314).
  const port = e.SMTP_PORT ?? (secure ? 465 : 587);
  return {
    smtp: {
      host: e.SMTP_HOST,
      port,
      secure,
      user: e.SMTP_USER || undefined,
      pass: e.SMTP_PASS || undefined,
      from: e.MAIL_FROM,
    },
    from: e.MAIL_FROM,
  };
}

/** Sends through any SMTP server: the workshop's provider, or the local catcher. */
export function createSmtpMailer(settings: SmtpSettings): Mailer {
  const transport: Transporter = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    auth: settings.user ? { user: settings.user, pass: settings.pass ?? '' } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    describe: `smtp://${settings.host}:${settings.port}`,
    async send(message) {
      const info = await transport.sendMail({ from: settings.from, ...message });
      return { messageId: info.messageId, accepted: (info.accepted ?? []).map(String) };
    },
    close: () => transport.close(),
  };
}
