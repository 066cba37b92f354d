import type { DataSource } from 'typeorm';

const PING_TIMEOUT_MS = 2_000;

/** Whether PostgreSQL answers within two seconds. */
export async function databaseIsUp(dataSource: DataSource): Promise<boolean> {
  if (!dataSource.isInitialized) return false;
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error('ping timeout')), PING_TIMEOUT_MS);
    });
    await Promise.race([dataSource.query('SELECT 1'), timeout]);
    return true;
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
