import fs from 'node:fs';
import path from 'node:path';

import { type ParsedMail, simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** One message as the stand-in received it. */
export type ReceivedMail = {
  /** The SMTP envelope: who it was from and to, as the client said. */
  envelope: { from: string | null; to: string[] };
  /** The message exactly as it arrived (what the .eml file holds). */
  raw: Buffer;
  parsed: ParsedMail;
  /** Where it was written, or null when the stand-in keeps messages in memory only. */
  file: string | null;
  receivedAt: Date;
};

export type DevSmtpServer = {
  /** smtp://127.0.0.1:PORT, what the mail transport is pointed at. */
  url: string;
  port: number;
  /** Everything received so far, oldest first. */
  messages: ReceivedMail[];
  /** Resolves once `count` messages have been received, or rejects after `timeoutMs`. */
  waitForCount(count: number, timeoutMs?: number): Promise<ReceivedMail[]>;
  stop(): Promise<void>;
};

export type DevSmtpOptions = {
  /** That port, or 0 for any free one. Left out: 2525, or if it is taken the next free one. */
  port?: number;
  /** Where each message is written as `<time>-<n>.eml`; null keeps them in memory only. */
  mailDir?: string | null;
  /** Recipients refused with 550, for trying a mail server that says no for good. */
  refuse?: (address: string) => boolean;
  /** The list to keep messages in: a test restarting the server on its port keeps one list. */
  messages?: ReceivedMail[];
};

const defaultPort = 2525;
const portsToTry = 20;
const loopback = '127.0.0.1';

function listen(server: SMTPServer, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    // SMTPServer re-emits its net server's errors as its own: with no listener there, a port in
    // use would end the process before the next port could be tried.
    const onError = (err: Error) => {
      server.server.off('listening', onListening);
      reject(err);
    };
    const onListening = () => {
      server.off('error', onError);
      const address = server.server.address();
      resolve(typeof address === 'object' && address ? address.port : port);
    };
    server.once('error', onError);
    server.server.once('listening', onListening);
    server.listen(port, loopback);
  });
}

/**
 * A local stand-in for a mail server, for `npm start` without SMTP_URL and for tests: an SMTP
 * server on loopback only that accepts any message without sign-in or TLS and keeps it, in memory
 * and as an .eml file a developer can open in any mail program.
 */
export async function startDevSmtpServer(options: DevSmtpOptions = {}): Promise<DevSmtpServer> {
  const { mailDir = null, refuse, messages = [] } = options;
  if (mailDir) fs.mkdirSync(mailDir, { recursive: true });
  const waiters = new Set<() => void>();
  let counter = 0;

  const create = () => {
    const server = new SMTPServer({
      secure: false,
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      banner: 'Saggar local mail stand-in',
      size: 50 * 1024 * 1024,
      onRcptTo(address, _session, callback) {
        if (refuse?.(address.address)) {
          const err = new Error(`${address.address}: no such mailbox here`) as Error & {
            responseCode: number;
          };
          err.responseCode = 550;
          return callback(err);
        }
        callback();
      },
      onData(stream, session, callback) {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('error', callback);
        stream.on('end', () => {
          const raw = Buffer.concat(chunks);
          const receivedAt = new Date();
          counter += 1;
          let file: string | null = null;
          if (mailDir) {
            const stamp = receivedAt.toISOString().replace(/[:.]/g, '-');
            file = path.join(mailDir, `${stamp}-${counter}.eml`);
            fs.writeFileSync(file, raw);
          }
          simpleParser(raw)
            .then((parsed) => {
              const from = session.envelope.mailFrom;
              messages.push({
                envelope: {
                  from: from ? from.address : null,
                  to: session.envelope.rcptTo.map((r) => r.address),
                },
                raw,
                parsed,
                file,
                receivedAt,
              });
              for (const wake of waiters) wake();
              callback();
            })
            .catch(callback);
        });
      },
    });
    // smtp-server passes its socket's and its connections' errors on as its own 'error' event,
    // which throws when nothing listens: a port in use is `listen`'s to handle, and a connection
    // broken off is the sender's to retry. Neither may stop the process it runs in.
    server.on('error', () => undefined);
    return server;
  };

  // The default port, or the next free one above it; a port asked for is that port or an error.
  const fallForward = options.port === undefined;
  const first = options.port ?? defaultPort;
  let server = create();
  let port: number;
  for (let attempt = 0; ; attempt += 1) {
    try {
      port = await listen(server, first + attempt);
      break;
    } catch (err) {
      const inUse = (err as NodeJS.ErrnoException).code === 'EADDRINUSE';
      if (!inUse || !fallForward || attempt + 1 >= portsToTry) throw err;
      server = create();
    }
  }

  return {
    url: `smtp://${loopback}:${port}`,
    port,
    messages,
    waitForCount(count, timeoutMs = 10_000) {
      return new Promise((resolve, reject) => {
        const check = () => {
          if (messages.length < count) return;
          cleanUp();
          resolve(messages.slice());
        };
        const timer = setTimeout(() => {
          cleanUp();
          reject(new Error(`${messages.length} of ${count} messages arrived in ${timeoutMs} ms`));
        }, timeoutMs);
        const cleanUp = () => {
          clearTimeout(timer);
          waiters.delete(check);
        };
        waiters.add(check);
        check();
      });
    },
    stop: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
