import nodemailer, { type SendMailOptions } from 'nodemailer';
import addressparser from 'nodemailer/lib/addressparser';

/** The From address when SAGGAR_MAIL_FROM is not set. */
export const defaultMailFrom = 'Saggar <no-reply@saggar.localhost>';

/** What the mail worker needs of a transport: nodemailer's, or anything that sends the same way. */
export type MailTransport = {
  sendMail(message: SendMailOptions): Promise<{ messageId: string }>;
  close(): void;
};

/**
 * nodemailer over SMTP to `smtpUrl` (smtp://host:port, or smtps:// and user:pass@ for a real
 * relay). One connection per message, with timeouts well inside the worker's claim on it, so a
 * mail server that hangs gives the message back to the queue rather than holding it.
 */
export function createMailTransport(smtpUrl: string): MailTransport {
  return nodemailer.createTransport({
    url: smtpUrl,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 60_000,
  });
}

/** The domain of the From address (`saggar.localhost`), for the Message-IDs it sends. */
export function mailFromDomain(from: string): string {
  const [first] = addressparser(from, { flatten: true });
  const domain = first?.address?.split('@')[1];
  if (!first || !domain) {
    throw new Error(
      `The From address "${from}" is not an e-mail address such as ${defaultMailFrom}.`,
    );
  }
  return domain;
}
