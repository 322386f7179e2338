import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { freePort } from './free-port';

export type PostgresCluster = {
  /** The cluster's `postgres` database, as its superuser `postgres`, over loopback. */
  url: string;
  stop: () => void;
};

/** Debian puts the server's programs under /usr/lib/postgresql/<version>/bin, off the PATH. */
function postgresBin(): string {
  const onPath = (process.env.PATH ?? '')
    .split(path.delimiter)
    .find((dir: string) => fs.existsSync(path.join(dir, 'pg_ctl')));
  if (onPath) return onPath;
  const root = '/usr/lib/postgresql';
  const versions = fs.existsSync(root)
    ? fs
        .readdirSync(root)
        .filter((v) => fs.existsSync(path.join(root, v, 'bin', 'pg_ctl')))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (versions.length === 0) {
    throw new Error(
      'PostgreSQL is not installed (no initdb or pg_ctl): run `sudo apt-get install postgresql`.',
    );
  }
  return path.join(root, versions[0]!, 'bin');
}

/**
 * A throwaway PostgreSQL cluster in a temporary folder, listening on a free loopback port with
 * trust authentication, for tests and benchmarks; `stop` shuts it down and deletes the folder.
 * The server refuses to run as root, so as root it runs as the `postgres` user Debian's package
 * makes. The C locale makes text sort and fold case as SQLite does (see server/db/dialect.ts);
 * fsync is off, since nothing here outlives the run, unless `durable` (for a benchmark that
 * compares it with SQLite, which does sync its commits).
 */
export async function startPostgresCluster({ durable = false } = {}): Promise<PostgresCluster> {
  const bin = postgresBin();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-pg-'));
  const asRoot = process.getuid?.() === 0;
  const run = (program: string, args: string[]) => {
    const command = path.join(bin, program);
    const [file, argv] = asRoot
      ? ['runuser', ['-u', 'postgres', '--', command, ...args]]
      : [command, args];
    execFileSync(file, argv, { stdio: 'pipe' });
  };
  if (asRoot) execFileSync('chown', ['postgres:postgres', dir]);
  const data = path.join(dir, 'data');
  run('initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '--locale=C', '-E', 'UTF8']);
  const port = await freePort();
  const options = [
    `-p ${port}`,
    `-k ${dir}`,
    '-c listen_addresses=127.0.0.1',
    '-c max_connections=300',
    ...(durable ? [] : ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off']),
  ].join(' ');
  run('pg_ctl', ['-D', data, '-o', options, '-l', path.join(dir, 'server.log'), '-w', 'start']);
  return {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    stop: () => {
      try {
        run('pg_ctl', ['-D', data, '-m', 'immediate', '-w', 'stop']);
      } finally {
        fs.rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}
