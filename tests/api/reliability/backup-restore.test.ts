import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openDataSource } from '../../../server/db/data-source';
import { createLogger } from '../../../server/lib/logger';
import { buildWorld } from '../access/world';
import { createTestApp } from '../../helpers/test-app';
import { ensureDatabase } from '../../helpers/test-database-url';

const run = promisify(execFile);

/** Every row of every table of ours and of the job queue, as one fingerprint per table. */
async function fingerprint(ds: DataSource): Promise<Record<string, string>> {
  const tables: { name: string }[] = await ds.query(
    `SELECT format('%I.%I', schemaname, tablename) AS name FROM pg_tables WHERE schemaname IN ('public', 'pgboss') ORDER BY 1`,
  );
  const out: Record<string, string> = {};
  for (const { name } of tables) {
    const [row] = (await ds.query(
      `SELECT count(*)::int AS n, coalesce(md5(string_agg(t::text, '|' ORDER BY t::text)), '') AS h FROM ${name} t`,
    )) as [{ n: number; h: string }];
    out[name] = `${row.n} rows ${row.h}`;
  }
  return out;
}

/**
 * scripts/backup and scripts/restore (ASVS 14.2.x data protection: a tested way back): a database full of the
 * matrix's world is backed up, wiped to nothing, restored, and every table holds exactly the same rows again.
 */
describe('backup and restore', () => {
  let ds: DataSource;
  let url: string;
  let dir: string;

  beforeAll(async () => {
    const u = new URL(inject('databaseUrl'));
    u.pathname = u.pathname.replace(/_test$/, '_backup_test');
    url = u.toString();
    await ensureDatabase(url);
    ds = await openDataSource(url, createLogger({ logLevel: 'silent' }));
    await ds.query(`DROP SCHEMA IF EXISTS pgboss CASCADE; DROP SCHEMA public CASCADE; CREATE SCHEMA public`);
    await ds.runMigrations({ transaction: 'each' });
    dir = mkdtempSync(join(tmpdir(), 'shoalwise-backup-'));
  }, 60_000);
  afterAll(async () => {
    await ds?.destroy();
    if (dir) rmSync(dir, { recursive: true, force: true });
    if (url) {
      const admin = new URL(url);
      admin.pathname = '/postgres';
      const client = new pg.Client({ connectionString: admin.toString() });
      await client.connect();
      await client.query(`DROP DATABASE IF EXISTS "${new URL(url).pathname.slice(1)}" WITH (FORCE)`);
      await client.end();
    }
  });

  it('when the database is backed up, wiped and restored, then every table has the same rows', async () => {
    // The app itself fills it (services, mail queue); it stops before the backup so its workers change nothing after.
    const app = await createTestApp({ DATABASE_URL: url });
    await buildWorld(app.deps);
    await app.close();
    const before = await fingerprint(ds);
    const file = join(dir, 'club.dump');
    const env = { ...process.env, DATABASE_URL: url };

    await run('scripts/backup', [file], { env });
    expect(statSync(file).size).toBeGreaterThan(1_000);

    await ds.query(`DROP SCHEMA IF EXISTS pgboss CASCADE; DROP SCHEMA public CASCADE; CREATE SCHEMA public`);
    expect(await fingerprint(ds)).toEqual({});

    await run('scripts/restore', [file, '--yes'], { env });
    const after = await fingerprint(ds);
    const filled = Object.values(before).filter((v) => !v.startsWith('0 rows')).length;
    console.info(
      `backup and restore: ${Object.keys(before).length} tables (${filled} with rows), ${(statSync(file).size / 1024).toFixed(0)} kB`,
    );
    expect(filled).toBeGreaterThan(15);
    expect(after).toEqual(before);
  }, 60_000);

  it('when restore is run without --yes and without a terminal, then it refuses and changes nothing', async () => {
    const before = await fingerprint(ds);
    await expect(
      run('scripts/restore', [join(dir, 'club.dump')], { env: { ...process.env, DATABASE_URL: url } }),
    ).rejects.toMatchObject({ stderr: expect.stringMatching(/--yes/) });
    expect(await fingerprint(ds)).toEqual(before);
  });
});
