import { type RequestHandler } from 'express';
import { type Logger } from 'pino';

import { sessionCookieName } from './access/session-cookie';
import { type AuthOptions, createAuth } from './auth/auth';
import { type Db } from './db/database';
import { documentAttachmentKinds } from './documents/document-attachments';
import { type AttachmentRenderer, attachmentRenderer } from './mail/attachments';
import { type MailComposers } from './mail/composers';
import { defaultMailFrom } from './mail/transport';
import { type PaymentProvider } from './payments/payment-provider';
import { photoAttachmentKinds } from './photos/photo-attachments';
import { composeSaleNotice } from './sales/sale-notice';
import { statementAttachmentKinds } from './statements/statement-attachments';

/** Everything the app needs from outside, so tests can build it over an in-memory database. */
export type AppContext = {
  db: Db;
  auth: ReturnType<typeof createAuth>;
  logger: Logger;
  /** Serves everything outside /api: the exported web app, or Expo's dev server; null for none. */
  web: RequestHandler | null;
  trustedOrigins: readonly string[];
  /** Where people reach the app, e.g. https://saggar.example; null on a plain local install. */
  publicUrl: string | null;
  /** Where links in e-mails and the QR codes on labels point: publicUrl, or this machine. */
  appUrl: string;
  /** Where uploads live, by content hash: `<dataDir>/files` (a temporary folder in tests). */
  filesDir: string;
  /**
   * Sign-in attempts allowed in the window, per account and per client address. The address's is
   * the higher, so staff sharing one address are not locked out by one person's mistakes.
   */
  signInLimit: { perAccount: number; perAddress: number; windowMs: number };
  /** The session cookie's name and the secret that signs it. */
  sessionCookie: { name: string; secret: string };
  /** Express's `trust proxy`: false unless SAGGAR_TRUST_PROXY names the proxy in front. */
  trustProxy: boolean | string | number;
  /** The From address of the studio's e-mail (SAGGAR_MAIL_FROM). */
  mailFrom: string;
  /**
   * Makes an e-mail attachment's bytes from its recipe, for the mail worker and for the page that
   * shows what was sent; refuses a kind nobody registered.
   */
  renderAttachment: AttachmentRenderer;
  /** Kinds of message written again from their data just before they go (the sale e-mail). */
  composeMail: MailComposers;
  /**
   * The payment provider's SDK and webhook secret: the real service, or the local stand-in
   * `server/index.ts` starts; null where nobody set one up (online payment is then refused).
   */
  payments: PaymentProvider | null;
};

export type ContextOptions = Omit<
  AppContext,
  | 'auth'
  | 'signInLimit'
  | 'publicUrl'
  | 'sessionCookie'
  | 'trustProxy'
  | 'mailFrom'
  | 'renderAttachment'
  | 'composeMail'
  | 'appUrl'
  | 'payments'
> &
  Pick<AuthOptions, 'secret'> &
  Partial<Pick<AuthOptions, 'publicUrl'>> &
  Partial<
    Pick<
      AppContext,
      | 'signInLimit'
      | 'trustProxy'
      | 'mailFrom'
      | 'renderAttachment'
      | 'composeMail'
      | 'appUrl'
      | 'payments'
    >
  >;

export function createContext(options: ContextOptions): AppContext {
  const {
    secret,
    publicUrl = null,
    appUrl = publicUrl ?? 'http://localhost:8080',
    ...rest
  } = options;
  return {
    signInLimit: { perAccount: 10, perAddress: 50, windowMs: 15 * 60 * 1000 },
    trustProxy: false,
    mailFrom: defaultMailFrom,
    payments: null,
    renderAttachment: attachmentRenderer({
      ...documentAttachmentKinds({ filesDir: options.filesDir, appUrl }),
      ...photoAttachmentKinds({ filesDir: options.filesDir }),
      ...statementAttachmentKinds({ appUrl }),
    }),
    composeMail: { sale: composeSaleNotice({ appUrl }) },
    ...rest,
    publicUrl,
    appUrl,
    sessionCookie: {
      name: sessionCookieName(publicUrl?.startsWith('https://') ?? false),
      secret,
    },
    auth: createAuth({
      db: options.db,
      logger: options.logger,
      secret,
      publicUrl,
      appUrl,
      trustedOrigins: options.trustedOrigins,
    }),
  };
}
