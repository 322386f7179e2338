import { startDevSmtpServer } from '@/server/dev-services/smtp-server';

describe('the local SMTP stand-in', () => {
  it('takes the next free port when 2525 (or the one after) is in use, instead of crashing', async () => {
    const first = await startDevSmtpServer({ mailDir: null });
    const second = await startDevSmtpServer({ mailDir: null });
    try {
      expect(first.port).toBeGreaterThanOrEqual(2525);
      expect(second.port).toBeGreaterThan(first.port);
      expect(second.port).toBeLessThan(2525 + 20);
      expect(second.url).toBe(`smtp://127.0.0.1:${second.port}`);
    } finally {
      await second.stop();
      await first.stop();
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
