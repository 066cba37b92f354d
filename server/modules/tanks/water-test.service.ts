import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Deps } from '@server/deps';
import { PARAMETER_KEYS } from '@shared/care/parameters';
import type { ReadingIssue } from '@shared/readings/issues';
import { normalizeWaterTest, type NormalizedWaterTest } from '@shared/readings/normalize-water-test';
import type {
  createWaterTestSchema,
  updateWaterTestSchema,
  WaterTestEntries,
} from '@shared/schemas/water-test.schema';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { storageKeysOf } from '../photos';
import { recomputeDerivedFrom } from './derived-refresh';
import type { Tank } from './tank.entity';
import { chemistryOf, lastKnownBefore } from './water-test.context';
import { VALUE_COLUMNS, WaterTest } from './water-test.entity';

export interface SavedWaterTest {
  test: WaterTest;
  warnings: ReadingIssue[];
}

/** Every stored column of a normalized test; parameters it lacks become NULL (an edit can remove one). */
export function columnsOf(n: NormalizedWaterTest): Partial<WaterTest> {
  const columns: Partial<WaterTest> = {
    takenAt: new Date(n.takenAt),
    entries: n.entries,
    derived: n.derived,
    freeAmmoniaMgL: n.freeAmmonia,
  };
  for (const key of PARAMETER_KEYS) columns[VALUE_COLUMNS[key].property] = n.values[key] ?? null;
  return columns;
}

function refuseErrors(n: NormalizedWaterTest): void {
  if (n.errors.length) throw errors.badRequest('Some readings need attention.', n.errors);
}

async function normalizeFor(
  tx: EntityManager,
  tank: Tank,
  id: string,
  takenAt: string,
  entries: WaterTestEntries,
  now: Date,
): Promise<NormalizedWaterTest> {
  const lastKnown = await lastKnownBefore(tx, tank.id, { takenAt, id });
  const normalized = normalizeWaterTest(
    { takenAt, entries },
    { ...(await chemistryOf(tx, tank)), now: now.toISOString(), testId: id, lastKnown },
  );
  refuseErrors(normalized);
  return normalized;
}

type Changes = Pick<Deps, 'tankChanges'>;

/** Rows per INSERT: well under PostgreSQL's 65,535 parameters per statement. */
const BATCH_ROWS = 500;

export interface NewWaterTest {
  normalized: NormalizedWaterTest;
  note: string;
}

/**
 * The one way water tests are stored, one from the form or many from a spreadsheet, inside the caller's
 * transaction: the rows go in (in batches), free ammonia is worked out again from the earliest of them on (later
 * tests may lean on their temperature, pH or salinity), and the tank-changed seam hears of it once.
 * Returns the new tests' ids, in the order given.
 */
export async function insertWaterTests(
  tx: EntityManager,
  deps: Changes,
  tank: Tank,
  tests: readonly (NewWaterTest & { id?: string })[],
  p: { origin: WaterTest['origin']; actorId: string },
): Promise<string[]> {
  if (tests.length === 0) return [];
  const rows = tests.map((t) => ({
    id: t.id ?? randomUUID(),
    tankId: tank.id,
    ...columnsOf(t.normalized),
    note: t.note,
    origin: p.origin,
    createdById: p.actorId,
  }));
  for (let i = 0; i < rows.length; i += BATCH_ROWS) {
    await tx
      .createQueryBuilder()
      .insert()
      .into(WaterTest)
      .values(rows.slice(i, i + BATCH_ROWS))
      .updateEntity(false)
      .execute();
  }
  await recomputeDerivedFrom(tx, tank, new Date(Math.min(...rows.map((r) => r.takenAt!.getTime()))));
  await deps.tankChanges.publish(tx, tank.id, 'water-tests');
  return rows.map((r) => r.id);
}

/** A test typed into the form: normalized against the tank's record (last known values included), then stored. */
export async function createWaterTest(
  tx: EntityManager,
  deps: Changes,
  tank: Tank,
  input: z.output<typeof createWaterTestSchema>,
  actorId: string,
  now = new Date(),
): Promise<SavedWaterTest> {
  const id = randomUUID();
  const normalized = await normalizeFor(tx, tank, id, input.takenAt, input.entries, now);
  await insertWaterTests(tx, deps, tank, [{ id, normalized, note: input.note }], { origin: 'form', actorId });
  return { test: await tx.findOneByOrFail(WaterTest, { id }), warnings: normalized.warnings };
}

/** Merges the edit into the stored entries, then normalizes the whole test again (derived values included). */
export async function updateWaterTest(
  tx: EntityManager,
  deps: Changes,
  tank: Tank,
  test: WaterTest,
  patch: z.output<typeof updateWaterTestSchema>,
  now = new Date(),
): Promise<SavedWaterTest> {
  const entries: Record<string, unknown> = { ...test.entries };
  for (const [key, entry] of Object.entries(patch.entries ?? {})) {
    if (entry === null) delete entries[key];
    else if (entry !== undefined) entries[key] = entry;
  }
  if (Object.keys(entries).length === 0) {
    throw errors.badRequest('A water test needs at least one reading.', [
      { path: 'entries', message: 'Keep at least one reading, or delete the test.' },
    ]);
  }
  const takenAt = patch.takenAt ?? test.takenAt.toISOString();
  const normalized = await normalizeFor(tx, tank, test.id, takenAt, entries as WaterTestEntries, now);
  await tx.update(WaterTest, { id: test.id }, { ...columnsOf(normalized), note: patch.note ?? test.note });
  const earliest = Math.min(test.takenAt.getTime(), Date.parse(takenAt));
  await recomputeDerivedFrom(tx, tank, new Date(earliest));
  const saved = await tx.findOneByOrFail(WaterTest, { id: test.id });
  await deps.tankChanges.publish(tx, tank.id, 'water-tests');
  return { test: saved, warnings: normalized.warnings };
}

/** Deletes for good (photos included), audited; returns the photo files to remove once committed. */
export async function deleteWaterTest(
  tx: EntityManager,
  deps: Changes,
  tank: Tank,
  test: WaterTest,
  actorId: string,
): Promise<string[]> {
  const keys = await storageKeysOf(tx, { waterTestIds: [test.id] });
  await tx.delete(WaterTest, { id: test.id });
  await audit(tx, {
    actorId,
    clubId: tank.clubId,
    action: 'water-test.deleted',
    targetType: 'WaterTest',
    targetId: test.id,
    details: { tankId: tank.id, takenAt: test.takenAt.toISOString() },
  });
  await recomputeDerivedFrom(tx, tank, test.takenAt);
  await deps.tankChanges.publish(tx, tank.id, 'water-tests');
  return keys;
}
