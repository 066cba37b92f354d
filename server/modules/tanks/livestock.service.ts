import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Deps } from '@server/deps';
import type { createLivestockSchema, updateLivestockSchema } from '@shared/schemas/tank.schema';
import { errors } from '../../lib/app-error';
import { storageKeysOf } from '../photos';
import { Livestock } from './livestock.entity';
import { findLivestock } from './livestock.queries';
import type { Tank } from './tank.entity';
import { TankEvent } from './tank-event.entity';

/** A day on the timeline: midday UTC, so the date reads the same in every time zone. */
const middayOf = (date: string) => new Date(`${date}T12:00:00.000Z`);

async function upsertEvent(
  tx: EntityManager,
  l: Livestock,
  kind: 'livestock-added' | 'livestock-removed',
  actorId: string,
): Promise<void> {
  const date = kind === 'livestock-added' ? l.addedOn : l.removedOn!;
  const details = {
    livestockId: l.id,
    speciesCommonName: l.speciesCommonName,
    count: l.count,
    ...(kind === 'livestock-removed' ? { reason: l.removalReason } : {}),
  };
  const existing = await tx.findOneBy(TankEvent, { livestockId: l.id, kind });
  if (existing)
    await tx.update(
      TankEvent,
      { id: existing.id },
      { occurredAt: middayOf(date), details: details as object },
    );
  else
    await tx.insert(TankEvent, {
      tankId: l.tankId,
      kind,
      livestockId: l.id,
      occurredAt: middayOf(date),
      details: details as object,
      computed: {},
      note: '',
      createdById: actorId,
    });
}

/** Keeps the timeline's "added" and "removed" entries in step with the livestock row they describe. */
export async function syncLivestockEvents(tx: EntityManager, l: Livestock, actorId: string): Promise<void> {
  await upsertEvent(tx, l, 'livestock-added', actorId);
  if (l.removedOn) await upsertEvent(tx, l, 'livestock-removed', actorId);
  else await tx.delete(TankEvent, { livestockId: l.id, kind: 'livestock-removed' });
}

type Changes = Pick<Deps, 'tankChanges'>;

export async function addLivestock(
  tx: EntityManager,
  deps: Changes,
  tank: Tank,
  input: z.output<typeof createLivestockSchema>,
  actorId: string,
): Promise<Livestock> {
  const row = await tx.save(
    tx.create(Livestock, { ...input, tankId: tank.id, removedOn: null, removalReason: null }),
  );
  await syncLivestockEvents(tx, row, actorId);
  await deps.tankChanges.publish(tx, tank.id, 'livestock');
  return row;
}

export async function editLivestock(
  tx: EntityManager,
  deps: Changes,
  row: Livestock,
  patch: z.output<typeof updateLivestockSchema>,
  actorId: string,
): Promise<Livestock> {
  const next = {
    ...row,
    ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)),
  } as Livestock;
  if (next.removedOn && next.removedOn < next.addedOn) {
    throw errors.badRequest('Check the dates.', [
      { path: 'removedOn', message: 'The animals cannot leave before they arrived.' },
    ]);
  }
  if (!next.removedOn) next.removalReason = null;
  await tx.update(
    Livestock,
    { id: row.id },
    {
      speciesCommonName: next.speciesCommonName,
      count: next.count,
      addedOn: next.addedOn,
      source: next.source,
      quarantineNotes: next.quarantineNotes,
      removedOn: next.removedOn,
      removalReason: next.removalReason,
    },
  );
  const saved = await tx.findOneByOrFail(Livestock, { id: row.id });
  await syncLivestockEvents(tx, saved, actorId);
  await deps.tankChanges.publish(tx, saved.tankId, 'livestock');
  return saved;
}

/** For an entry made by mistake: its timeline entries go with it. Returns the photo files to remove once committed. */
export async function deleteLivestock(tx: EntityManager, deps: Changes, row: Livestock): Promise<string[]> {
  const events = await tx.find(TankEvent, { where: { livestockId: row.id }, select: { id: true } });
  const keys = await storageKeysOf(tx, { eventIds: events.map((e) => e.id) });
  await tx.delete(Livestock, { id: row.id });
  await deps.tankChanges.publish(tx, row.tankId, 'livestock');
  return keys;
}

export async function loadLivestock(
  manager: EntityManager,
  tankId: string,
  livestockId: string,
): Promise<Livestock> {
  const row = await findLivestock(manager, tankId, livestockId);
  if (!row) throw errors.notFound('That livestock entry');
  return row;
}
