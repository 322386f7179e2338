import {
  type DevSmtpOptions,
  type DevSmtpServer,
  startDevSmtpServer,
} from '@/server/dev-services/smtp-server';

export type TestSmtp = DevSmtpServer & {
  /** Starts it again on the same port after `stop()`, keeping what it had received. */
  restart(): Promise<void>;
};

/**
 * The local SMTP stand-in on a free loopback port, keeping messages in memory: what the mail
 * worker sends to in tests. `stop()` it to play a mail server that is down.
 */
export async function startTestSmtp(
  options: Pick<DevSmtpOptions, 'refuse' | 'mailDir'> = {},
): Promise<TestSmtp> {
  const messages: DevSmtpServer['messages'] = [];
  let server = await startDevSmtpServer({ mailDir: null, ...options, port: 0, messages });
  const { port, url } = server;
  return {
    url,
    port,
    messages,
    waitForCount: (count, timeoutMs) => server.waitForCount(count, timeoutMs),
    stop: () => server.stop(),
    restart: async () => {
      server = await startDevSmtpServer({ mailDir: null, ...options, port, messages });
    },
  };
}
