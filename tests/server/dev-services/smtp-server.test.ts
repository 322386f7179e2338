import net from 'node:net';

import { startDevSmtpServer } from '@/server/dev-services/smtp-server';

import { startTestSmtp } from '../helpers/smtp';

/** Holds 127.0.0.1:`port` for the test, unless something else already does. */
async function occupy(port: number): Promise<net.Server | null> {
  const holder = net.createServer();
  return new Promise((resolve, reject) => {
    holder.once('error', (err: NodeJS.ErrnoException) =>
      err.code === 'EADDRINUSE' ? resolve(null) : reject(err),
    );
    holder.listen(port, '127.0.0.1', () => resolve(holder));
  });
}

/** Speaks SMTP up to `MAIL FROM`, then breaks the connection off with a reset. */
async function resetMidMessage(port: number) {
  const socket = net.connect(port, '127.0.0.1');
  socket.setEncoding('utf8');
  let heard = '';
  const hear = (code: string) =>
    new Promise<void>((resolve) => {
      const check = () => {
        if (heard.split('\r\n').some((l) => l.startsWith(`${code} `))) {
          heard = '';
          socket.off('data', onData);
          resolve();
        }
      };
      const onData = (chunk: string) => {
        heard += chunk;
        check();
      };
      socket.on('data', onData);
      check();
    });
  await hear('220');
  socket.write('EHLO test.example\r\n');
  await hear('250');
  socket.write('MAIL FROM:<someone@test.example>\r\n');
  await hear('250');
  socket.resetAndDestroy();
}

describe('the local mail stand-in', () => {
  it('starts on the next free port when 2525 is taken', async () => {
    const holder = await occupy(2525);
    const smtp = await startDevSmtpServer({ mailDir: null });
    try {
      expect(smtp.port).toBeGreaterThan(2525);
      expect(smtp.port).toBeLessThan(2525 + 20);
      expect(smtp.url).toBe(`smtp://127.0.0.1:${smtp.port}`);
    } finally {
      await smtp.stop();
      holder?.close();
    }
  });

  it('keeps running when a sender breaks its connection off mid-message', async () => {
    const smtp = await startTestSmtp();
    try {
      await resetMidMessage(smtp.port);
      await new Promise((resolve) => setTimeout(resolve, 100));
      // Still there: another sender is served.
      await resetMidMessage(smtp.port);
    } finally {
      await smtp.stop();
    }
  });
  it('refuses a port asked for that is in use, as an error the caller can catch', async () => {
    const taken = await startDevSmtpServer({ mailDir: null, port: 0 });
    try {
      await expect(startDevSmtpServer({ mailDir: null, port: taken.port })).rejects.toMatchObject({
        code: 'EADDRINUSE',
      });
    } finally {
      await taken.stop();
    }
  });
});
