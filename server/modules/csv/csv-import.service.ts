import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { analyzeCsv, type CsvAnalysis } from '@shared/readings/csv-analyze';
import { CsvProblem } from '@shared/readings/csv-layout';
import type { CsvImportRequest } from '@shared/schemas/csv-import.schema';
import type { ImportCommitResult } from '@shared/schemas/tank-views';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { chemistryOf, insertWaterTests, lockTank, takenAtsOf, type Tank } from '../tanks';

/** Reads the file against the tank's existing tests; a file that cannot be read at all is a 400 naming the problem. */
export async function analyzeForTank(
  manager: EntityManager,
  tank: Tank,
  request: CsvImportRequest,
  viewerTimeZone: string,
  now = new Date(),
): Promise<CsvAnalysis> {
  const chemistry = await chemistryOf(manager, tank);
  const existingTakenAt = await takenAtsOf(manager, tank.id);
  try {
    return analyzeCsv(request, {
      ...chemistry,
      now: now.toISOString(),
      timeZone: viewerTimeZone,
      existingTakenAt,
    });
  } catch (error) {
    if (error instanceof CsvProblem) throw errors.badRequest(error.message, error.issues);
    throw error;
  }
}

/**
 * Saves every valid row of the file in the caller's transaction, through the same insertWaterTests as the form; the
 * tank row is locked first so two imports of the same file cannot both pass the duplicate check.
 */
export async function commitImport(
  tx: EntityManager,
  deps: Pick<Deps, 'tankChanges'>,
  tank: Tank,
  request: CsvImportRequest,
  viewerTimeZone: string,
  actorId: string,
): Promise<ImportCommitResult> {
  await lockTank(tx, tank.id);
  const { preview, rows } = await analyzeForTank(tx, tank, request, viewerTimeZone);
  if (rows.length === 0) {
    throw errors.badRequest('No row of the file can be saved.', [
      {
        path: 'csv',
        message: `${preview.invalid} rows have errors and ${preview.duplicates} are already on the tank.`,
      },
    ]);
  }
  await insertWaterTests(tx, deps, tank, rows, { origin: 'import', actorId });
  await audit(tx, {
    actorId,
    clubId: tank.clubId,
    action: 'water-tests.imported',
    targetType: 'Tank',
    targetId: tank.id,
    details: { imported: rows.length },
  });
  const times = rows.map((r) => Date.parse(r.normalized.takenAt));
  return {
    imported: rows.length,
    invalid: preview.invalid,
    duplicates: preview.duplicates,
    skipped: preview.skipped,
    firstTakenAt: new Date(Math.min(...times)).toISOString(),
    lastTakenAt: new Date(Math.max(...times)).toISOString(),
  };
}
