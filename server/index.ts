import { createApp } from './app';
import { readConfig } from './config';
import { createContext } from './context';
import { openDatabase } from './db/database';
import { migrateToLatest } from './db/migrate';
import { demoSignIns } from './demo/demo-studio';
import { seedDemoIfEmpty } from './demo/seed';
import { devWebProxy } from './http/dev-web-proxy';
import { webApp } from './http/web-app';
import { createLogger } from './logger';

async function main() {
  const config = readConfig();
  const logger = createLogger(config.logLevel);
  const db = openDatabase(config.dbFile);
  await migrateToLatest(db);
  const seeded = await seedDemoIfEmpty(db, { filesDir: config.filesDir });

  const context = createContext({
    db,
    logger,
    secret: config.authSecret,
    publicUrl: config.publicUrl,
    web: config.webDevUrl ? await devWebProxy(config.webDevUrl) : webApp(config.webRoot),
    trustedOrigins: config.trustedOrigins,
    filesDir: config.filesDir,
    trustProxy: config.trustProxy,
  });
  const app = createApp(context);

  const server = app.listen(config.port, config.host, () => {
    const lines = [
      `Saggar is running at http://localhost:${config.port}`,
      `Database: ${config.dbFile}${seeded ? ' (demo data seeded)' : ''}`,
      'Demo sign-ins (password for all: ' + demoSignIns.password + '):',
      ...demoSignIns.people.map((p) => `  ${p.email.padEnd(24)} ${p.description}`),
    ];
    console.log(lines.join('\n'));
  });

  const stop = () => {
    server.close(() => void db.destroy().then(() => process.exit(0)));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
