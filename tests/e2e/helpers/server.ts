import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

const root = path.resolve(__dirname, '../../..');

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

export type RunningServer = { url: string; stop: () => Promise<void> };

/**
 * Starts `server/index.ts` as `npm start` would, on a free port with a temporary database
 * (seeded with the demo because it is empty) and the exported web app in dist/.
 */
export async function startServer(): Promise<RunningServer> {
  if (!fs.existsSync(path.join(root, 'dist/index.html'))) {
    throw new Error('dist/ is missing: run `npm run build:web` before the browser tests.');
  }
  const port = await freePort();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-e2e-'));
  const child: ChildProcess = spawn(
    process.execPath,
    [path.join(root, 'node_modules/tsx/dist/cli.mjs'), 'server/index.ts'],
    {
      cwd: root,
      env: {
        ...process.env,
        PORT: String(port),
        HOST: '127.0.0.1',
        SAGGAR_DB: path.join(dataDir, 'saggar.db'),
        LOG_LEVEL: 'warn',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  let output = '';
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));

  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`The server exited:\n${output}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`The server did not start in time:\n${output}`);
    await new Promise((r) => setTimeout(r, 200));
  }

  return {
    url,
    stop: async () => {
      if (child.exitCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        child.kill('SIGTERM');
        await exited;
      }
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
