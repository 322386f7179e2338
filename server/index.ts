import { type Logger } from 'pino';

import { createApp } from './app';
import { type Config, readConfig } from './config';
import { createContext } from './context';
import { openDatabase } from './db/database';
import { migrateToLatest } from './db/migrate';
import { demoSignIns } from './demo/demo-studio';
import { seedDemoIfEmpty } from './demo/seed';
import { type PaymentsStandIn, startPaymentsStandIn } from './dev-services/payments-stand-in';
import { type DevSmtpServer, startDevSmtpServer } from './dev-services/smtp-server';
import { devWebProxy } from './http/dev-web-proxy';
import { webApp } from './http/web-app';
import { createLogger } from './logger';
import { createMailWorker } from './mail/mail-worker';
import { createMailTransport } from './mail/transport';
import { createPaymentProvider, type PaymentProvider } from './payments/payment-provider';

/** SMTP_URL if set; otherwise the local stand-in, started here, keeping mail under data/mail/. */
async function mailServer(config: Config): Promise<{ url: string; local: DevSmtpServer | null }> {
  if (config.smtpUrl) return { url: config.smtpUrl, local: null };
  const local = await startDevSmtpServer({ mailDir: config.mailDir });
  return { url: local.url, local };
}

/**
 * The payment provider from STRIPE_SECRET_KEY and STRIPE_WEBHOOK_SECRET if set; otherwise the
 * local stand-in, started here on loopback, with the SDK pointed at it and its webhooks sent to
 * this server.
 */
async function paymentProvider(
  config: Config,
  logger: Logger,
): Promise<{ provider: PaymentProvider; local: PaymentsStandIn | null }> {
  if (config.stripe) return { provider: createPaymentProvider(config.stripe), local: null };
  // This server as the stand-in reaches it: over loopback when it listens on every address.
  const host = ['0.0.0.0', '::'].includes(config.host) ? '127.0.0.1' : config.host;
  const origin = `http://${host.includes(':') ? `[${host}]` : host}:${config.port}`;
  const local = await startPaymentsStandIn({
    webhookUrl: `${origin}/api/payments/webhook`,
    onDelivery: (d) => {
      if (!d.error) return;
      logger.warn({ eventId: d.eventId, status: d.status, error: d.error }, 'webhook refused');
    },
  });
  const provider = createPaymentProvider({
    secretKey: local.secretKey,
    webhookSecret: local.webhookSecret,
    endpoint: { host: '127.0.0.1', port: local.port, protocol: 'http' },
  });
  return { provider, local };
}

async function main() {
  const config = readConfig();
  const logger = createLogger(config.logLevel);
  const db = openDatabase(config.database);
  await migrateToLatest(db);
  const seeded = await seedDemoIfEmpty(db, { filesDir: config.filesDir });
  const payments = await paymentProvider(config, logger.child({ part: 'payments stand-in' }));
  if (payments.local && config.publicUrl) {
    logger.warn(
      'STRIPE_SECRET_KEY is not set: online payment goes to the local stand-in, and nobody pays.',
    );
  }

  const context = createContext({
    db,
    logger,
    secret: config.authSecret,
    publicUrl: config.publicUrl,
    appUrl: config.appUrl,
    web: config.webDevUrl ? await devWebProxy(config.webDevUrl) : webApp(config.webRoot),
    trustedOrigins: config.trustedOrigins,
    filesDir: config.filesDir,
    trustProxy: config.trustProxy,
    mailFrom: config.mailFrom,
    payments: payments.provider,
  });
  const app = createApp(context);

  const smtp = await mailServer(config);
  if (smtp.local && config.publicUrl) {
    // A public address says people rely on this install: their mail would reach nobody.
    logger.warn('SMTP_URL is not set: e-mail goes to the local stand-in only and reaches nobody.');
  }
  const transport = createMailTransport(smtp.url);
  const mailWorker = createMailWorker({
    db,
    transport,
    from: context.mailFrom,
    renderAttachment: context.renderAttachment,
    composeMail: context.composeMail,
    logger: logger.child({ part: 'mail' }),
  });
  mailWorker.start();

  const server = app.listen(config.port, config.host, () => {
    const lines = [
      `Saggar is running at http://localhost:${config.port}`,
      `Database: ${redactedUrl(config.database, config.database)}${seeded ? ' (demo data seeded)' : ''}`,
      'Demo sign-ins (password for all: ' + demoSignIns.password + '):',
      ...demoSignIns.people.map((p) => `  ${p.email.padEnd(24)} ${p.description}`),
      smtp.local
        ? `Mail: local stand-in at ${smtp.local.url}; what it receives is kept in ${config.mailDir}`
        : `Mail: sent through ${redactedUrl(smtp.url, 'the configured SMTP_URL')}`,
      payments.local
        ? `Payments: local stand-in at ${payments.local.url} (test payments, no card is charged)`
        : 'Payments: through Stripe',
    ];
    console.log(lines.join('\n'));
  });

  // Stop taking requests and looking for mail; a message being sent is finished (or given back
  // to the queue) before the database closes.
  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    void Promise.all([closed, mailWorker.stop()]).then(async () => {
      transport.close();
      await smtp.local?.stop();
      await payments.local?.stop();
      await db.destroy();
      process.exit(0);
    });
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

/** An address (the mail server's, the database's) for the log, without its password. */
function redactedUrl(url: string, otherwise: string): string {
  try {
    const parsed = new URL(url);
    if (parsed.password) parsed.password = '***';
    return parsed.toString();
  } catch {
    return otherwise;
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
