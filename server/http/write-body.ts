import { type Response } from 'express';

/**
 * Writes part of a streamed response, waiting while the client's buffer is full, so a slow
 * download never piles the whole body up in memory. Rejects when the client has gone.
 */
export function writeBody(res: Response, chunk: string): Promise<void> {
  if (res.destroyed) return Promise.reject(new Error('The client closed the connection.'));
  if (res.write(chunk)) return Promise.resolve();
  return new Promise((resolve, reject) => {
    const done = (err?: Error) => {
      res.off('drain', onDrain);
      res.off('close', onClose);
      if (err) reject(err);
      else resolve();
    };
    const onDrain = () => done();
    const onClose = () => done(new Error('The client closed the connection.'));
    res.on('drain', onDrain);
    res.on('close', onClose);
  });
}
