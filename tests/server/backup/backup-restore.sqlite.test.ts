import { execFile } from 'node:child_process';
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';

import SQLite from 'better-sqlite3';
import request from 'supertest';

import { picture } from '../helpers/pictures';
import { type Fixture, studioFixture } from '../helpers/studio-fixture';
import { createTestApp, signIn } from '../helpers/test-app';

const run = promisify(execFile);
const root = path.resolve(__dirname, '../../..');

/** `npm run backup` / `npm run restore` as a person runs them: a process of their own. */
function cli(script: 'backup' | 'restore', args: string[], env: Record<string, string>) {
  return run(
    process.execPath,
    [path.join(root, 'node_modules/tsx/dist/cli.mjs'), `server/backup/${script}-cli.ts`, ...args],
    { cwd: root, env: { ...process.env, ...env } },
  );
}

async function tempDir() {
  return fs.mkdtemp(path.join(os.tmpdir(), 'saggar-backup-'));
}

async function liveStudio(dir: string) {
  const dbFile = path.join(dir, 'live', 'saggar.db');
  const filesDir = path.join(dir, 'live', 'files');
  const f = await studioFixture({ dbFile, filesDir });
  return { f, dbFile, filesDir, cookie: await f.cookie('owner') };
}

async function addWork(f: Fixture, cookie: string, title: string) {
  const res = await request(f.app)
    .post('/api/works')
    .set('Cookie', cookie)
    .send({ title, year: 2026, retailPrice: { amount: 12_000, currency: 'GBP' } });
  if (res.status !== 201) throw new Error(`${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; title: string };
}

describe('npm run backup, then npm run restore', () => {
  it('copies the database while works are being written, and restores every acknowledged one', async () => {
    const dir = await tempDir();
    const { f, dbFile, filesDir, cookie } = await liveStudio(dir);
    const withPhoto = await addWork(f, cookie, 'Jug with a photo');
    const upload = await request(f.app)
      .post(`/api/works/${withPhoto.id}/photos`)
      .set('Cookie', cookie)
      .attach('photos', await picture(640, 480, '#7a5c3e'), {
        filename: 'jug.jpg',
        contentType: 'image/jpeg',
      });
    expect(upload.status).toBe(201);

    // Two writers keep adding works until told to stop; every 201 is an acknowledged write.
    const acknowledged: { id: number; title: string }[] = [];
    let writing = true;
    const writer = async (name: string) => {
      for (let n = 0; writing; n += 1) acknowledged.push(await addWork(f, cookie, `${name} ${n}`));
    };
    const writers = [writer('Bowl'), writer('Cup')];
    while (acknowledged.length < 20) await new Promise((resolve) => setTimeout(resolve, 10));

    const before = [...acknowledged];
    const backupDir = path.join(dir, 'backup');
    const backup = await cli('backup', [backupDir], {
      SAGGAR_DB: dbFile,
      SAGGAR_FILES_DIR: filesDir,
    });
    const duringBackup = acknowledged.length - before.length;
    writing = false;
    await Promise.all(writers);
    // The writes went on while the backup ran, so it was taken from a database in use.
    expect(duringBackup).toBeGreaterThan(0);
    expect(backup.stdout).toContain('integrity check: ok; pictures: 1');

    const fresh = path.join(dir, 'fresh');
    const freshDb = path.join(fresh, 'saggar.db');
    const freshFiles = path.join(fresh, 'files');
    await cli('restore', [backupDir], { SAGGAR_DB: freshDb, SAGGAR_FILES_DIR: freshFiles });

    // Checked with SQLite itself, not through the app.
    const sqlite = new SQLite(freshDb, { readonly: true });
    expect(sqlite.pragma('integrity_check', { simple: true })).toBe('ok');
    const titles = new Map(
      (sqlite.prepare('select id, title from works').all() as { id: number; title: string }[]).map(
        (row) => [row.id, row.title],
      ),
    );
    sqlite.close();
    for (const work of [withPhoto, ...before]) expect(titles.get(work.id)).toBe(work.title);

    // The restored copy serves the work and its picture.
    const restored = await studioFixtureOver(freshDb, freshFiles);
    const work = await request(restored.app)
      .get(`/api/works/${withPhoto.id}`)
      .set('Cookie', await restored.signIn());
    expect(work.status).toBe(200);
    expect(work.body.photos).toHaveLength(1);
    const thumbnail = await request(restored.app)
      .get(work.body.photos[0].thumbnailUrl)
      .set('Cookie', await restored.signIn());
    expect(thumbnail.status).toBe(200);
    expect(thumbnail.headers['content-type']).toBe('image/webp');
  });

  it('moves what was there aside instead of overwriting it', async () => {
    const dir = await tempDir();
    const { f, dbFile, filesDir, cookie } = await liveStudio(dir);
    await addWork(f, cookie, 'Kept in the backup');
    const backupDir = path.join(dir, 'backup');
    await cli('backup', [backupDir], { SAGGAR_DB: dbFile, SAGGAR_FILES_DIR: filesDir });
    const later = await addWork(f, cookie, 'Made after the backup');
    await f.db.destroy();

    const { stdout } = await cli('restore', [backupDir], {
      SAGGAR_DB: dbFile,
      SAGGAR_FILES_DIR: filesDir,
    });
    const aside = stdout.match(/kept as (.*saggar\.db\.before-restore-\S+)/)?.[1];
    expect(aside).toBeDefined();
    const old = new SQLite(aside!, { readonly: true });
    expect(old.prepare('select title from works where id = ?').get(later.id)).toEqual({
      title: later.title,
    });
    old.close();
    const now = new SQLite(dbFile, { readonly: true });
    expect(now.prepare('select title from works where id = ?').get(later.id)).toBeUndefined();
    now.close();
  });

  it('refuses a folder that is not a finished backup, and a backup into a folder in use', async () => {
    const dir = await tempDir();
    const notBackup = path.join(dir, 'not-a-backup');
    await fs.mkdir(notBackup);
    await fs.writeFile(path.join(notBackup, 'notes.txt'), 'hello');
    const env = { SAGGAR_DB: path.join(dir, 'db', 'saggar.db') };

    await expect(cli('restore', [notBackup], env)).rejects.toMatchObject({
      code: 1,
      stderr: expect.stringContaining('is not a finished Saggar backup'),
    });
    await expect(cli('backup', [notBackup], env)).rejects.toMatchObject({
      code: 1,
      stderr: expect.stringContaining('is not empty'),
    });
    await expect(fs.readdir(notBackup)).resolves.toEqual(['notes.txt']);
  });
});

/** The app over a restored database, signed in as the fixture's owner. */
async function studioFixtureOver(dbFile: string, filesDir: string) {
  const { app } = await createTestApp({ dbFile, filesDir });
  let cookie: string | undefined;
  return {
    app,
    signIn: async () => (cookie ??= await signIn(app, 'owner-a@example.test')),
  };
}
