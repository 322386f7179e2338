import { scoped } from '../access/scoped';
import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';

export async function findBankColumns(db: Db, scope: Scope) {
  const row = await scoped.studios(db, scope).select('studios.bank_csv_columns').executeTakeFirst();
  return row?.bank_csv_columns ?? null;
}

export async function saveBankColumns(db: Db, scope: Scope, columns: string) {
  await db
    .updateTable('studios')
    .set({ bank_csv_columns: columns })
    .where('studios.id', '=', scope.studioId)
    .execute();
}

/** Issued statements still owed, to match credits against. */
export async function listOpenStatementIds(db: Db, scope: Scope) {
  const rows = await scoped
    .statements(db, scope)
    .select('statements.id')
    .where('statements.state', '=', 'issued')
    .execute();
  return rows.map((r) => r.id);
}
