import fs from 'node:fs';
import path from 'node:path';

import { sql } from 'kysely';

import { openDatabase } from '@/server/db/database';
import { migrateToLatest } from '@/server/db/migrate';

// SQLite only, on purpose, in both runs: migrations that have shipped must go on producing the
// very tables they did before they learnt PostgreSQL. sqlite-schema.sql is what they produced then
// (written from sqlite_master before server/db/dialect.ts existed).

describe('the migrations on SQLite', () => {
  it('produce the schema they produced before PostgreSQL was supported', async () => {
    const db = openDatabase(':memory:');
    await migrateToLatest(db);
    const { rows } = await sql<{ type: string; name: string; sql: string | null }>`
      select type, name, sql from sqlite_master where name not like 'kysely_%' order by name`.execute(
      db,
    );
    await db.destroy();
    const schema = rows
      .map((r) => `-- ${r.type} ${r.name}\n${r.sql ?? '(automatic)'};`)
      .join('\n\n');
    expect(schema + '\n').toBe(fs.readFileSync(path.join(__dirname, 'sqlite-schema.sql'), 'utf8'));
  });
});
