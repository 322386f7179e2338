import pino from 'pino';

export function createLogger(level: string) {
  return pino({ level, redact: ['req.headers.cookie', 'res.headers["set-cookie"]'] });
}
