import type { DataSource } from 'typeorm';

/**
 * Counts every row inserted, updated or deleted in the app's tables, with a row-level trigger writing to a log in a
 * schema of its own. The log is transactional: a request that writes and then rolls back leaves nothing, so
 * "0 rows changed" means committed changes only.
 */
export interface RowWatch {
  /** Committed changes since the previous call (or since watching began), per table and operation (`"tank UPDATE": 1`). */
  take(): Promise<Record<string, number>>;
  /** Removes the triggers and the log. */
  stop(): Promise<void>;
}

const SCHEMA = 'row_watch';

export async function watchRows(ds: DataSource, options: { ignore: string[] }): Promise<RowWatch> {
  const tables: { tablename: string }[] = await ds.query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations' AND NOT (tablename = ANY($1))`,
    [options.ignore],
  );
  await ds.query(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE`);
  await ds.query(`CREATE SCHEMA ${SCHEMA}`);
  await ds.query(
    `CREATE TABLE ${SCHEMA}.change (id bigserial PRIMARY KEY, table_name text NOT NULL, op text NOT NULL)`,
  );
  await ds.query(`
    CREATE FUNCTION ${SCHEMA}.log() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      INSERT INTO ${SCHEMA}.change (table_name, op) VALUES (TG_TABLE_NAME, TG_OP);
      RETURN NULL;
    END $$`);
  for (const { tablename } of tables) {
    await ds.query(
      `CREATE TRIGGER row_watch AFTER INSERT OR UPDATE OR DELETE ON public."${tablename}" FOR EACH ROW EXECUTE FUNCTION ${SCHEMA}.log()`,
    );
  }
  let seen = 0;
  return {
    async take() {
      const rows: { what: string; n: number; last: number }[] = await ds.query(
        `SELECT table_name || ' ' || op AS what, count(*)::int AS n, max(id)::int AS last FROM ${SCHEMA}.change WHERE id > $1 GROUP BY 1`,
        [seen],
      );
      seen = Math.max(seen, ...rows.map((r) => r.last));
      return Object.fromEntries(rows.map((r) => [r.what, r.n]));
    },
    async stop() {
      // Dropping the function with CASCADE drops every trigger that calls it.
      await ds.query(`DROP SCHEMA IF EXISTS ${SCHEMA} CASCADE`);
    },
  };
}
