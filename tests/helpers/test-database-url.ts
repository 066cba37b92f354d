import pg from 'pg';

/**
 * Tests only ever touch a database whose name says it is for tests. The browser suites get a database of their
 * own (`…_e2e_test`): vitest runs projects side by side, and the API suites empty their tables between tests.
 */
export function testDatabaseUrl(kind: 'api' | 'e2e' = 'api'): string {
  const base =
    process.env.DATABASE_URL ?? `postgres://shoalwise@127.0.0.1:${process.env.PGPORT ?? 5487}/shoalwise_test`;
  const url = new URL(base);
  if (!/_test$/.test(url.pathname)) {
    throw new Error(
      `Refusing to run tests against ${base}: the database name must end in _test (./scripts/test sets it up).`,
    );
  }
  if (kind === 'e2e') url.pathname = url.pathname.replace(/_test$/, '_e2e_test');
  return url.toString();
}

/** Creates the database when it is missing (the browser suites' one is made here, not by the scripts). */
export async function ensureDatabase(databaseUrl: string): Promise<void> {
  const url = new URL(databaseUrl);
  const name = url.pathname.slice(1);
  url.pathname = '/postgres';
  const client = new pg.Client({ connectionString: url.toString() });
  await client.connect();
  try {
    const { rowCount } = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (!rowCount) await client.query(`CREATE DATABASE "${name.replace(/"/g, '')}"`);
  } finally {
    await client.end();
  }
}
