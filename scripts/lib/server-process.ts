import { type ChildProcess, spawn } from 'node:child_process';
import path from 'node:path';

import { isPostgresUrl } from '../../server/db/database';
import { freePort } from './free-port';

const root = path.resolve(__dirname, '../..');

export type ServerProcess = {
  url: string;
  pid: number;
  /** The process's resident memory now and at its peak so far, in MB (Linux /proc). */
  memory: () => Promise<{ rssMb: number; peakMb: number }>;
  stop: () => Promise<void>;
};

/**
 * The real server (`server/index.ts`, as `npm start` runs it) in a process of its own, on a free
 * port, over the database given, a SQLite file or a PostgreSQL URL (seeded with the demo when it
 * is empty): what the browser tests drive, and what the benchmarks load without measuring their
 * own load.
 */
export async function startServerProcess(
  database: string,
  env: Record<string, string> = {},
): Promise<ServerProcess> {
  const port = await freePort();
  const child: ChildProcess = spawn(
    process.execPath,
    [path.join(root, 'node_modules/tsx/dist/cli.mjs'), 'server/index.ts'],
    {
      cwd: root,
      env: {
        ...process.env,
        PORT: String(port),
        HOST: '127.0.0.1',
        ...(isPostgresUrl(database) ? { SAGGAR_DATABASE_URL: database } : { SAGGAR_DB: database }),
        LOG_LEVEL: 'warn',
        ...env,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    },
  );
  let output = '';
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  const url = `http://127.0.0.1:${port}`;
  for (let waited = 0; ; waited += 100) {
    if (child.exitCode !== null)
      throw new Error(`The server exited before it listened:\n${output}`);
    if (waited > 60_000) throw new Error(`The server did not start in 60 s:\n${output}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  // tsx starts node as a child of its own: the server is the deepest process under it.
  const serverPid = async () => {
    let pid = child.pid!;
    for (;;) {
      const fs = await import('node:fs/promises');
      const children = (await fs.readFile(`/proc/${pid}/task/${pid}/children`, 'utf8')).trim();
      if (children === '') return pid;
      pid = Number(children.split(/\s+/)[0]);
    }
  };
  const pid = await serverPid();
  return {
    url,
    pid,
    memory: async () => {
      const fs = await import('node:fs/promises');
      const status = await fs.readFile(`/proc/${pid}/status`, 'utf8');
      const kb = (field: string) =>
        Number(new RegExp(`${field}:\\s+(\\d+)`).exec(status)?.[1] ?? 0);
      return { rssMb: kb('VmRSS') / 1024, peakMb: kb('VmHWM') / 1024 };
    },
    stop: async () => {
      if (child.exitCode !== null) return;
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    },
  };
}

/** Signs in through the real endpoint; answers the Cookie header to send back. */
export async function signInCookie(url: string, email: string, password: string) {
  const res = await fetch(`${url}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: url },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in answered ${res.status}: ${await res.text()}`);
  return res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}
