import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Deps } from '@server/deps';
import { defaultProfileFor } from '@shared/care/profiles';
import type { SystemType } from '@shared/care/system-types';
import { tankVolume, type TankVolumeInput as ChemistryVolumeInput } from '@shared/chemistry/tank-volume';
import { convert } from '@shared/chemistry/units';
import {
  CM_PER_INCH,
  MAX_TANK_VOLUME_L,
  type createTankSchema,
  type tankVolumeSchema,
  type updateTankSchema,
} from '@shared/schemas/tank.schema';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { resolveProfile } from '../care';
import { recomputeDerivedFrom } from './derived-refresh';
import { Tank } from './tank.entity';

type VolumeInput = z.output<typeof tankVolumeSchema>;
type VolumeColumns = Pick<
  Tank,
  | 'volumeL'
  | 'volumeSource'
  | 'shape'
  | 'lengthCm'
  | 'widthCm'
  | 'heightCm'
  | 'diameterCm'
  | 'bowDepthCm'
  | 'fillHeightCm'
  | 'displacementFraction'
>;

const NO_DIMENSIONS = {
  shape: null,
  lengthCm: null,
  widthCm: null,
  heightCm: null,
  diameterCm: null,
  bowDepthCm: null,
  fillHeightCm: null,
  displacementFraction: null,
};

function tooBig(litres: number): never {
  throw errors.badRequest('Check the volume.', [
    {
      path: 'volume',
      message: `${Math.round(litres)} L is more than the ${MAX_TANK_VOLUME_L} L we can hold a record for.`,
    },
  ]);
}

/** The volume columns: as entered (converted to litres), or worked out from the inside dimensions net of rock and sand. */
export function volumeColumns(input: VolumeInput): VolumeColumns {
  if (input.source === 'entered') {
    const litres = convert(input.value, input.unit, 'L');
    if (litres > MAX_TANK_VOLUME_L) tooBig(litres);
    return { volumeL: litres, volumeSource: 'entered', ...NO_DIMENSIONS };
  }
  const cm = (v: number | undefined) =>
    v === undefined ? undefined : input.unit === 'in' ? v * CM_PER_INCH : v;
  const dims = {
    length: cm(input.length),
    width: cm(input.width),
    height: cm(input.height)!,
    diameter: cm(input.diameter),
    bowDepth: cm(input.bowDepth),
  };
  const fillHeightCm = cm(input.fillHeight);
  let netL: number;
  try {
    ({ netL } = tankVolume({
      shape: input.shape,
      dimensionsCm: dims,
      fillHeightCm,
      displacementFraction: input.displacementFraction,
    } as ChemistryVolumeInput));
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw errors.badRequest('Check the measurements.', [{ path: 'volume', message: error.message }]);
  }
  if (netL > MAX_TANK_VOLUME_L) tooBig(netL);
  if (!(netL > 0))
    throw errors.badRequest('Check the volume.', [
      { path: 'volume', message: 'Those measurements hold no water.' },
    ]);
  return {
    volumeL: netL,
    volumeSource: 'dimensions',
    shape: input.shape,
    lengthCm: dims.length ?? null,
    widthCm: dims.width ?? null,
    heightCm: dims.height,
    diameterCm: dims.diameter ?? null,
    bowDepthCm: dims.bowDepth ?? null,
    fillHeightCm: fillHeightCm ?? null,
    displacementFraction: input.displacementFraction,
  };
}

/** The care profile judging a tank: the one asked for (built-in or the club's own), if it suits the kind of tank, else the kind's default. */
export async function resolveCareProfileKey(
  manager: EntityManager,
  clubId: string,
  systemType: SystemType,
  key: string | undefined,
): Promise<string> {
  if (key === undefined) return defaultProfileFor(systemType).key;
  const profile = await resolveProfile(manager, clubId, key);
  if (!profile)
    throw errors.badRequest('Check the care profile.', [
      { path: 'careProfileKey', message: `There is no care profile "${key}".` },
    ]);
  if (!profile.systemTypes.includes(systemType)) {
    throw errors.badRequest('Check the care profile.', [
      {
        path: 'careProfileKey',
        message: `The ${profile.name} profile is for ${profile.systemTypes.join(', ')} tanks.`,
      },
    ]);
  }
  return key;
}

export async function createTank(
  tx: EntityManager,
  clubId: string,
  ownerId: string,
  input: z.output<typeof createTankSchema>,
): Promise<Tank> {
  const { volume, careProfileKey, ...rest } = input;
  const row = tx.create(Tank, {
    ...rest,
    ...volumeColumns(volume),
    clubId,
    ownerId,
    careProfileKey: await resolveCareProfileKey(tx, clubId, input.systemType, careProfileKey),
    archivedAt: null,
  });
  return tx.save(row);
}

/** Applies an edit; when what free ammonia depends on (kind of tank, profile) changed, every test's is worked out again. */
export async function updateTank(
  tx: EntityManager,
  deps: Pick<Deps, 'tankChanges'>,
  tank: Tank,
  input: z.output<typeof updateTankSchema>,
): Promise<Tank> {
  const { volume, careProfileKey, systemType, ...rest } = input;
  const nextType = systemType ?? tank.systemType;
  let nextKey =
    careProfileKey === undefined
      ? tank.careProfileKey
      : await resolveCareProfileKey(tx, tank.clubId, nextType, careProfileKey);
  if (careProfileKey === undefined && nextType !== tank.systemType) {
    // A profile chosen for the old kind of tank rarely suits the new one: fall back to the new kind's default.
    const current = await resolveProfile(tx, tank.clubId, tank.careProfileKey);
    if (!current?.systemTypes.includes(nextType)) nextKey = defaultProfileFor(nextType).key;
  }
  const changes: Partial<Tank> = {
    ...Object.fromEntries(Object.entries(rest).filter(([, v]) => v !== undefined)),
    ...(volume ? volumeColumns(volume) : {}),
    systemType: nextType,
    careProfileKey: nextKey,
  };
  await tx.update(Tank, { id: tank.id }, changes);
  const updated = await tx.findOneByOrFail(Tank, { id: tank.id });
  // Free ammonia assumes a salinity from the kind of tank and its profile.
  if (nextType !== tank.systemType || nextKey !== tank.careProfileKey)
    await recomputeDerivedFrom(tx, updated, null);
  // Phase, volume, kind or profile all change what the readings mean.
  await deps.tankChanges.publish(tx, tank.id, 'settings');
  return updated;
}

/** Archives or restores a tank (history stays readable either way); audited when it changes. */
export async function setArchived(
  tx: EntityManager,
  tank: Tank,
  archived: boolean,
  actorId: string,
): Promise<Tank> {
  if (Boolean(tank.archivedAt) !== archived) {
    await tx.update(Tank, { id: tank.id }, { archivedAt: archived ? new Date() : null });
    await audit(tx, {
      actorId,
      clubId: tank.clubId,
      action: archived ? 'tank.archived' : 'tank.restored',
      targetType: 'Tank',
      targetId: tank.id,
    });
  }
  return tx.findOneByOrFail(Tank, { id: tank.id });
}
