import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { startServerProcess } from '../../../scripts/lib/server-process';

const root = path.resolve(__dirname, '../../..');

export type RunningServer = { url: string; stop: () => Promise<void> };

/**
 * Starts the server as `npm start` would, on a free port with a temporary database (seeded with
 * the demo because it is empty) and the exported web app in dist/.
 */
export async function startServer(): Promise<RunningServer> {
  if (!fs.existsSync(path.join(root, 'dist/index.html'))) {
    throw new Error('dist/ is missing: run `npm run build:web` before the browser tests.');
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-e2e-'));
  const server = await startServerProcess(path.join(dataDir, 'saggar.db'));
  return {
    url: server.url,
    stop: async () => {
      await server.stop();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
