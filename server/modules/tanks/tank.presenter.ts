import { tankVolume, type TankVolumeInput } from '@shared/chemistry/tank-volume';
import type { LivestockView, TankDetailView, TankView } from '@shared/schemas/tank-views';
import type { LastKnown } from '@shared/care';
import type { Livestock } from './livestock.entity';
import type { Tank } from './tank.entity';

const defined = <T extends object>(o: T) =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== null && v !== undefined));

function presentVolume(t: Tank): TankView['volume'] {
  if (t.volumeSource === 'entered' || !t.shape || t.heightCm === null) return { source: 'entered' };
  const dimensionsCm = {
    height: t.heightCm,
    ...defined({ length: t.lengthCm, width: t.widthCm, diameter: t.diameterCm, bowDepth: t.bowDepthCm }),
  };
  const { grossL } = tankVolume({ shape: t.shape, dimensionsCm } as TankVolumeInput);
  return {
    source: 'dimensions',
    shape: t.shape,
    dimensionsCm,
    fillHeightCm: t.fillHeightCm,
    displacementFraction: t.displacementFraction ?? 0,
    grossL,
  };
}

export function presentTank(t: Tank, extra: { ownerName: string; hasLivestock: boolean }): TankView {
  return {
    id: t.id,
    clubId: t.clubId,
    owner: { id: t.ownerId, displayName: extra.ownerName },
    name: t.name,
    systemType: t.systemType,
    volumeL: t.volumeL,
    volume: presentVolume(t),
    setUpOn: t.setUpOn,
    phase: t.phase,
    equipmentNotes: t.equipmentNotes,
    careProfileKey: t.careProfileKey,
    hasLivestock: extra.hasLivestock,
    archivedAt: t.archivedAt?.toISOString() ?? null,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
  };
}

export function presentLivestock(l: Livestock): LivestockView {
  return {
    id: l.id,
    tankId: l.tankId,
    speciesCommonName: l.speciesCommonName,
    count: l.count,
    addedOn: l.addedOn,
    source: l.source,
    quarantineNotes: l.quarantineNotes,
    removedOn: l.removedOn,
    removalReason: l.removalReason,
    createdAt: l.createdAt.toISOString(),
    updatedAt: l.updatedAt.toISOString(),
  };
}

export function presentTankDetail(
  t: Tank,
  extra: { ownerName: string; livestock: Livestock[]; lastKnown: LastKnown },
): TankDetailView {
  const hasLivestock = extra.livestock.some((l) => l.removedOn === null);
  return {
    ...presentTank(t, { ownerName: extra.ownerName, hasLivestock }),
    livestock: extra.livestock.map(presentLivestock),
    lastKnown: extra.lastKnown,
  };
}
