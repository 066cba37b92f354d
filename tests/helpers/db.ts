import type { DataSource } from 'typeorm';

/** Empties every table of ours (not the migrations' own, nor the job queue's schema). */
export async function resetDatabase(dataSource: DataSource): Promise<void> {
  const rows: { tablename: string }[] = await dataSource.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'`,
  );
  if (rows.length)
    await dataSource.query(`TRUNCATE ${rows.map((r) => `"${r.tablename}"`).join(', ')} CASCADE`);
  const boss: unknown[] = await dataSource.query(
    `SELECT 1 FROM pg_tables WHERE schemaname = 'pgboss' AND tablename = 'job'`,
  );
  if (boss.length) await dataSource.query(`DELETE FROM pgboss.job`);
}
