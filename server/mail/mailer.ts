import nodemailer from 'nodemailer';
import type { Logger } from 'pino';

/** A message ready to send: Seamwright always sends a plain-text and an HTML part. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

export interface SmtpSettings {
  host: string;
  port: number;
  /** True for implicit TLS (port 465); otherwise STARTTLS is used when the server offers it. */
  secure: boolean;
  user?: string;
  password?: string;
  from: string;
}

/** Sends over SMTP with nodemailer: any hosted provider works through these settings alone. */
export function createSmtpMailer(settings: SmtpSettings): Mailer {
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    auth: settings.user ? { user: settings.user, pass: settings.password ?? '' } : undefined,
    // No tracking: nodemailer adds nothing of the kind, and we ask for no read receipts either.
    disableFileAccess: true,
    disableUrlAccess: true,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: settings.from, ...mail });
    },
  };
}

/** A mailer that only logs: for apps built without mail settings (unit-style API tests). */
export function createDroppingMailer(logger?: Logger): Mailer {
  return {
    async send(mail) {
      logger?.debug({ to: mail.to, subject: mail.subject }, 'mail dropped: no mailer configured');
    },
  };
}
