import nodemailer, { type Transporter } from 'nodemailer';
import type { AppConfig } from '../../config';
import type { Logger } from '../../logger';
import { startFakeSmtpServer, type StoredMessage } from './fakeSmtpServer';

/** Outgoing mail. */
export interface Mailer {
  send(message: { to: string; subject: string; text: string }): Promise<void>;
}

export interface MailService {
  mailer: Mailer;
  /** Messages the local fake SMTP server kept, newest first; empty when real SMTP is configured. */
  outbox(): StoredMessage[];
  /** 'fake' (local catcher), 'smtp' (configured server) or 'none' (production without SMTP). */
  mode: 'fake' | 'smtp' | 'none';
  stop(): Promise<void>;
}

/**
 * nodemailer over SMTP. With SMTP settings in the config it sends there; otherwise, outside
 * production, it starts the local fake SMTP server on first use and sends to it, so the outbox
 * page and the tests read what was really sent. Sending failures are logged and never fail the
 * request that caused them (a comment is saved even when its notice cannot be sent).
 */
export function createMailService(config: AppConfig, logger: Logger): MailService {
  const mode: MailService['mode'] = config.mail.smtp ? 'smtp' : config.mail.catcher ? 'fake' : 'none';
  let fake: Awaited<ReturnType<typeof startFakeSmtpServer>> | null = null;
  let transport: Promise<Transporter> | null = null;

  function getTransport(): Promise<Transporter> {
    transport ??= (async () => {
      const smtp = config.mail.smtp;
      if (smtp) {
        return nodemailer.createTransport({
          host: smtp.host,
          port: smtp.port,
          secure: smtp.secure,
          auth: smtp.user ? { user: smtp.user, pass: smtp.pass ?? '' } : undefined,
        });
      }
      fake = await startFakeSmtpServer();
      return nodemailer.createTransport({ host: '127.0.0.1', port: fake.port, secure: false, ignoreTLS: true });
    })();
    return transport;
  }

  return {
    mode,
    mailer: {
      async send(message) {
        if (mode === 'none') {
          logger.warn(`Mail not sent (set SMTP_HOST to send mail): "${message.subject}" to ${message.to}`);
          return;
        }
        try {
          const transporter = await getTransport();
          await transporter.sendMail({ from: config.mail.from, to: message.to, subject: message.subject, text: message.text });
        } catch (error) {
          logger.error(`Sending mail "${message.subject}" failed`, error);
        }
      },
    },
    outbox: () => (fake ? [...fake.messages].reverse() : []),
    async stop() {
      const current = transport;
      transport = null;
      if (current) (await current.catch(() => null))?.close();
      if (fake) await fake.close();
      fake = null;
    },
  };
}
