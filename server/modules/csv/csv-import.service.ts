import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { analyzeCsv, type CsvAnalysis } from '@shared/readings/csv-analyze';
import { CsvProblem } from '@shared/readings/csv-layout';
import type { CsvImportRequest } from '@shared/schemas/csv-import.schema';
import type { ImportCommitResult } from '@shared/schemas/tank-views';
import { errors } from '../../lib/app-error';
import { chemistryOf, columnsOf, recomputeDerivedFrom, WaterTest, type Tank } from '../tanks';

/** Rows per INSERT: well under PostgreSQL's 65,535 parameters per statement. */
const BATCH_ROWS = 500;

/** Reads the file against the tank's existing tests; a file that cannot be read at all is a 400 naming the problem. */
export async function analyzeForTank(manager: EntityManager, tank: Tank, request: CsvImportRequest, viewerTimeZone: string, now = new Date()): Promise<CsvAnalysis> {
  const existing: { takenAt: Date }[] = await manager.query(`SELECT taken_at AS "takenAt" FROM water_test WHERE tank_id = $1`, [tank.id]);
  const chemistry = await chemistryOf(manager, tank);
  try {
    return analyzeCsv(request, {
      ...chemistry,
      now: now.toISOString(),
      timeZone: viewerTimeZone,
      existingTakenAt: new Set(existing.map((r) => new Date(r.takenAt).getTime())),
    });
  } catch (error) {
    if (error instanceof CsvProblem) throw errors.badRequest(error.message, error.issues);
    throw error;
  }
}

/**
 * Saves every valid row of the file in the caller's transaction, in batches; the tank row is locked first so two
 * imports of the same file cannot both pass the duplicate check.
 */
export async function commitImport(tx: EntityManager, deps: Pick<Deps, 'tankChanges'>, tank: Tank, request: CsvImportRequest, viewerTimeZone: string, actorId: string): Promise<ImportCommitResult> {
  await tx.query(`SELECT id FROM tank WHERE id = $1 FOR UPDATE`, [tank.id]);
  const { preview, rows } = await analyzeForTank(tx, tank, request, viewerTimeZone);
  if (rows.length === 0) {
    throw errors.badRequest('No row of the file can be saved.', [{ path: 'csv', message: `${preview.invalid} rows have errors and ${preview.duplicates} are already on the tank.` }]);
  }
  const values = rows.map((r) => ({ id: randomUUID(), tankId: tank.id, ...columnsOf(r.normalized), note: r.note, origin: 'import' as const, createdById: actorId }));
  for (let i = 0; i < values.length; i += BATCH_ROWS) {
    await tx.createQueryBuilder().insert().into(WaterTest).values(values.slice(i, i + BATCH_ROWS)).updateEntity(false).execute();
  }
  const times = values.map((v) => v.takenAt!.getTime());
  const first = new Date(Math.min(...times));
  const last = new Date(Math.max(...times));
  await recomputeDerivedFrom(tx, tank, first);
  await deps.tankChanges.publish(tx, tank.id, 'water-tests');
  return {
    imported: values.length,
    invalid: preview.invalid,
    duplicates: preview.duplicates,
    skipped: preview.skipped,
    firstTakenAt: first.toISOString(),
    lastTakenAt: last.toISOString(),
  };
}
