import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { startServerProcess } from '../../../scripts/lib/server-process';

const root = path.resolve(__dirname, '../../..');

export type RunningServer = {
  url: string;
  /** The server's database and its data folder (its local SMTP stand-in writes to mail/ there). */
  dbFile: string;
  dataDir: string;
  stop: () => Promise<void>;
};

/**
 * Starts the server as `npm start` would, on a free port with a temporary database (seeded with
 * the demo because it is empty), the exported web app in dist/ and, as SMTP_URL is not set, its
 * own local SMTP stand-in.
 */
export async function startServer(): Promise<RunningServer> {
  if (!fs.existsSync(path.join(root, 'dist/index.html'))) {
    throw new Error('dist/ is missing: run `npm run build:web` before the browser tests.');
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-e2e-'));
  const dbFile = path.join(dataDir, 'saggar.db');
  // SMTP_URL empty: the server starts its own stand-in, whatever the shell running the tests says.
  const server = await startServerProcess(dbFile, { SMTP_URL: '' });
  return {
    url: server.url,
    dbFile,
    dataDir,
    stop: async () => {
      await server.stop();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
