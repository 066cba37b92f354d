import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import { FUTURE_TOLERANCE_MS } from '@shared/readings/normalize-water-test';
import { isLinearEntry, toCanonical } from '@shared/readings/convert-entry';
import { salinityFromEntry } from '@shared/readings/salinity';
import {
  LIVESTOCK_EVENT_KINDS,
  TANK_EVENT_DETAILS_SCHEMAS,
  type createTankEventSchema,
  type TankEventDetails,
  type TankEventKind,
  type updateTankEventSchema,
} from '@shared/schemas/tank-event.schema';
import { errors } from '../../lib/app-error';
import { parseInput } from '../../middleware/validate';
import { audit } from '../audit';
import { storageKeysOf } from '../photos';
import { Livestock } from './livestock.entity';
import type { Tank } from './tank.entity';
import { TankEvent } from './tank-event.entity';

const isLivestockKind = (kind: TankEventKind) => (LIVESTOCK_EVENT_KINDS as readonly string[]).includes(kind);

function refuseFuture(occurredAt: string, now: Date): void {
  if (Date.parse(occurredAt) > now.getTime() + FUTURE_TOLERANCE_MS) {
    throw errors.badRequest('Check the time.', [
      { path: 'occurredAt', message: 'That time is in the future.' },
    ]);
  }
}

/** Litres and share of the tank for a water change, and its new water's nitrate and salinity in canonical units. */
function computeWaterChange(tank: Tank, d: TankEventDetails<'water-change'>): TankEvent['computed'] {
  const litres = d.volumeL ?? ((d.percent ?? 0) / 100) * tank.volumeL;
  if (litres > tank.volumeL) {
    throw errors.badRequest('Check the amount.', [
      {
        path: 'details.volumeL',
        message: `The tank holds ${Math.round(tank.volumeL)} L: a change cannot be larger.`,
      },
    ]);
  }
  const computed: TankEvent['computed'] = { litres, fraction: litres / tank.volumeL };
  if (d.sourceNitrate)
    computed.sourceNitrateMgL = toCanonical('nitrate', d.sourceNitrate.value, d.sourceNitrate.unit);
  const s = d.sourceSalinity;
  if (s) {
    try {
      computed.sourceSalinity = isLinearEntry('salinity', s.unit)
        ? toCanonical('salinity', s.value, s.unit)
        : salinityFromEntry(s).salinity;
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
      throw errors.badRequest('Check the new water’s salinity.', [
        {
          path: 'details.sourceSalinity.value',
          message: `That reading cannot be turned into a salinity: ${error.message}`,
        },
      ]);
    }
  }
  return computed;
}

async function checkDetails(
  tx: EntityManager,
  tank: Tank,
  kind: TankEventKind,
  details: Record<string, unknown>,
): Promise<TankEvent['computed']> {
  if (kind === 'water-change') return computeWaterChange(tank, details as TankEventDetails<'water-change'>);
  const livestockId =
    kind === 'observation' ? (details as TankEventDetails<'observation'>).livestockId : undefined;
  if (livestockId && !(await tx.existsBy(Livestock, { id: livestockId, tankId: tank.id }))) {
    throw errors.badRequest('Check the animal.', [
      { path: 'details.livestockId', message: 'That livestock entry is not in this tank.' },
    ]);
  }
  return {};
}

export async function createTankEvent(
  tx: EntityManager,
  tank: Tank,
  input: z.output<typeof createTankEventSchema>,
  actorId: string,
  now = new Date(),
): Promise<TankEvent> {
  refuseFuture(input.occurredAt, now);
  const details = input.details as Record<string, unknown>;
  const computed = await checkDetails(tx, tank, input.kind, details);
  return tx.save(
    tx.create(TankEvent, {
      tankId: tank.id,
      kind: input.kind,
      occurredAt: new Date(input.occurredAt),
      note: input.note,
      details,
      computed,
      livestockId: null,
      createdById: actorId,
    }),
  );
}

function refuseLivestockKinds(event: TankEvent): void {
  if (isLivestockKind(event.kind))
    throw errors.conflict(
      'This entry follows the livestock list: change or delete the livestock entry instead.',
    );
}

export async function updateTankEvent(
  tx: EntityManager,
  tank: Tank,
  event: TankEvent,
  patch: z.output<typeof updateTankEventSchema>,
  now = new Date(),
): Promise<TankEvent> {
  refuseLivestockKinds(event);
  if (patch.occurredAt) refuseFuture(patch.occurredAt, now);
  const details =
    patch.details === undefined
      ? event.details
      : (parseInput(TANK_EVENT_DETAILS_SCHEMAS[event.kind], patch.details, 'details') as Record<
          string,
          unknown
        >);
  const computed = await checkDetails(tx, tank, event.kind, details);
  await tx.update(
    TankEvent,
    { id: event.id },
    {
      details: details as object,
      computed,
      ...(patch.occurredAt ? { occurredAt: new Date(patch.occurredAt) } : {}),
      ...(patch.note !== undefined ? { note: patch.note } : {}),
    },
  );
  return tx.findOneByOrFail(TankEvent, { id: event.id });
}

/** Deletes for good, audited; returns the photo files to remove once committed. */
export async function deleteTankEvent(
  tx: EntityManager,
  tank: Tank,
  event: TankEvent,
  actorId: string,
): Promise<string[]> {
  refuseLivestockKinds(event);
  const keys = await storageKeysOf(tx, { eventIds: [event.id] });
  await tx.delete(TankEvent, { id: event.id });
  await audit(tx, {
    actorId,
    clubId: tank.clubId,
    action: 'tank-event.deleted',
    targetType: 'TankEvent',
    targetId: event.id,
    details: { tankId: tank.id, kind: event.kind },
  });
  return keys;
}
