import SQLite from 'better-sqlite3';

/**
 * Copies a live SQLite database with SQLite's online backup API. The copy is taken in one step,
 * under one read transaction, so it is the database as it stood at one moment: writes by the
 * server carry on meanwhile (WAL lets readers and one writer work at once) and land after it.
 */
export async function copySqliteDatabase(source: string, destination: string): Promise<void> {
  const db = new SQLite(source, { readonly: true, fileMustExist: true });
  try {
    db.pragma('busy_timeout = 5000');
    // The first step copies nothing (better-sqlite3 starts at 0 pages); the next copies them all.
    await db.backup(destination, { progress: () => 0x7fffffff });
  } finally {
    db.close();
  }
}

/** SQLite's own check of a database file: "ok", or the problems it found. */
export function integrityOf(file: string): string {
  const db = new SQLite(file, { readonly: true, fileMustExist: true });
  try {
    const rows = db.pragma('integrity_check') as { integrity_check: string }[];
    return rows.map((row) => row.integrity_check).join('\n');
  } finally {
    db.close();
  }
}

/** The SHA-256 of every stored picture the database refers to. */
export function referencedPictures(file: string): string[] {
  const db = new SQLite(file, { readonly: true, fileMustExist: true });
  try {
    const rows = db.prepare('select distinct sha256 from files').all() as { sha256: string }[];
    return rows.map((row) => row.sha256);
  } finally {
    db.close();
  }
}
