/** Stops the cluster `postgres-setup.ts` started, if it started one. */
export default async function teardown(): Promise<void> {
  (globalThis as { stopPostgres?: () => void }).stopPostgres?.();
}
