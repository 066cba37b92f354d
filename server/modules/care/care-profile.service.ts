import { randomBytes } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { BUILT_IN_PROFILES, builtInProfile, careProfileSchema, type CareProfile } from '@shared/care';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { ClubCareProfile, ClubCareProfileVersion } from './care-profile.entity';
import { describeChanges } from './profile-diff';

export interface ProfileSummary {
  key: string;
  name: string;
  version: number;
  systemTypes: readonly string[];
  animals: string;
  source: 'built-in' | 'club';
  id?: string;
  basedOnKey?: string;
}

const summary = (
  p: CareProfile,
  extra: Partial<ProfileSummary> & Pick<ProfileSummary, 'source'>,
): ProfileSummary => ({
  key: p.key,
  name: p.name,
  version: p.version,
  systemTypes: p.systemTypes,
  animals: p.animals,
  ...extra,
});

async function currentDefinitions(manager: EntityManager, clubId: string) {
  return manager
    .createQueryBuilder(ClubCareProfileVersion, 'v')
    .innerJoin(ClubCareProfile, 'p', 'p.id = v.profile_id AND p.current_version = v.version')
    .where('p.club_id = :clubId', { clubId })
    .select(['v.profileId', 'v.definition'])
    .addSelect('p.based_on_key', 'based_on_key')
    .getRawAndEntities();
}

/** The shipped profiles plus the club's own copies at their newest version. */
export async function listProfiles(manager: EntityManager, clubId: string): Promise<ProfileSummary[]> {
  const { entities, raw } = await currentDefinitions(manager, clubId);
  const club = entities.map((v, i) =>
    summary(v.definition, {
      source: 'club',
      id: v.profileId,
      basedOnKey: (raw[i] as { based_on_key: string }).based_on_key,
    }),
  );
  return [
    ...BUILT_IN_PROFILES.map((p) => summary(p, { source: 'built-in' })),
    ...club.sort((a, b) => a.name.localeCompare(b.name)),
  ];
}

/** The profile a tank of this club follows: a built-in by key, or the club's copy at its newest version. */
export async function resolveProfile(
  manager: EntityManager,
  clubId: string,
  key: string,
): Promise<CareProfile | undefined> {
  return (await resolveProfiles(manager, clubId, [key])).get(key);
}

/** `resolveProfile` for several keys in at most one query: built-in profiles need none; unknown keys are left out. */
export async function resolveProfiles(
  manager: EntityManager,
  clubId: string,
  keys: readonly string[],
): Promise<Map<string, CareProfile>> {
  const found = new Map<string, CareProfile>();
  const clubKeys: string[] = [];
  for (const key of new Set(keys)) {
    const builtIn = builtInProfile(key);
    if (builtIn) found.set(key, builtIn);
    else clubKeys.push(key);
  }
  if (!clubKeys.length) return found;
  const rows: { key: string; definition: CareProfile }[] = await manager
    .createQueryBuilder(ClubCareProfileVersion, 'v')
    .innerJoin(ClubCareProfile, 'p', 'p.id = v.profile_id AND p.current_version = v.version')
    .select('p.key', 'key')
    .addSelect('v.definition', 'definition')
    .where('p.club_id = :clubId AND p.key IN (:...clubKeys)', { clubId, clubKeys })
    .getRawMany();
  for (const row of rows) found.set(row.key, row.definition);
  return found;
}

export async function loadClubProfile(manager: EntityManager, clubId: string, profileId: string) {
  const profile = await manager.findOneBy(ClubCareProfile, { id: profileId, clubId });
  if (!profile) throw errors.notFound('That care profile');
  const versions = await manager.find(ClubCareProfileVersion, {
    where: { profileId },
    order: { version: 'DESC' },
  });
  return { profile, versions };
}

export async function copyProfile(
  tx: EntityManager,
  p: { clubId: string; basedOn: string; name: string; actorId: string },
) {
  const source = await resolveProfile(tx, p.clubId, p.basedOn);
  if (!source)
    throw errors.badRequest('Choose a profile to start from.', [
      { path: 'basedOn', message: 'No profile with that key in this club.' },
    ]);
  const slug =
    p.name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 40) || 'profile';
  const key = `${slug}-${randomBytes(3).toString('hex')}`;
  const definition: CareProfile = { ...structuredClone(source), key, name: p.name, version: 1 };
  const profile = await tx.save(
    tx.create(ClubCareProfile, {
      clubId: p.clubId,
      key,
      basedOnKey: source.key,
      currentVersion: 1,
      createdById: p.actorId,
    }),
  );
  await tx.insert(ClubCareProfileVersion, {
    profileId: profile.id,
    version: 1,
    definition,
    changes: [],
    note: `Copied from ${source.name} (version ${source.version}).`,
    changedById: p.actorId,
  });
  await audit(tx, {
    actorId: p.actorId,
    clubId: p.clubId,
    action: 'care-profile.copied',
    targetType: 'CareProfile',
    targetId: profile.id,
    details: { basedOn: source.key },
  });
  return profile;
}

/**
 * Stores an edited definition as the next version, noting who changed what. Concurrent edits: the later one gets 409.
 * Every tank that follows the profile is judged again by the new version, in the same transaction.
 */
export async function updateProfile(
  tx: EntityManager,
  deps: Pick<Deps, 'tankChanges'>,
  p: {
    clubId: string;
    profileId: string;
    definition: unknown;
    note: string;
    actorId: string;
    expectedVersion?: number;
  },
) {
  const { profile, versions } = await loadClubProfile(tx, p.clubId, p.profileId);
  const current = versions[0]!.definition;
  const next = careProfileSchema.parse({
    ...(p.definition as object),
    key: profile.key,
    version: profile.currentVersion + 1,
  }) as CareProfile;
  const changes = describeChanges({ ...current, version: undefined }, { ...next, version: undefined });
  if (changes.length === 0)
    throw errors.badRequest('Nothing changed.', [
      { path: 'definition', message: 'Change at least one value.' },
    ]);
  const bumped = await tx
    .createQueryBuilder()
    .update(ClubCareProfile)
    .set({ currentVersion: next.version })
    .where('id = :id AND current_version = :v', {
      id: profile.id,
      v: p.expectedVersion ?? profile.currentVersion,
    })
    .execute();
  if (bumped.affected !== 1)
    throw errors.conflict(
      'Someone else changed this profile meanwhile. Reload it and make your change again.',
    );
  await tx.insert(ClubCareProfileVersion, {
    profileId: profile.id,
    version: next.version,
    definition: next,
    changes,
    note: p.note,
    changedById: p.actorId,
  });
  await audit(tx, {
    actorId: p.actorId,
    clubId: p.clubId,
    action: 'care-profile.changed',
    targetType: 'CareProfile',
    targetId: profile.id,
    details: { version: next.version, changes: changes.length },
  });
  await deps.tankChanges.publishForProfile(tx, p.clubId, profile.key);
  return { profile: { ...profile, currentVersion: next.version }, definition: next, changes };
}

/** A profile by key with where it comes from and, for a club's copy, every version with who changed what. */
export async function profileDetail(manager: EntityManager, clubId: string, key: string) {
  const profile = await resolveProfile(manager, clubId, key);
  if (!profile) return null;
  const clubRow = await manager.findOneBy(ClubCareProfile, { clubId, key });
  const history = clubRow ? (await loadClubProfile(manager, clubId, clubRow.id)).versions : [];
  return {
    profile,
    source: clubRow ? ('club' as const) : ('built-in' as const),
    id: clubRow?.id,
    basedOnKey: clubRow?.basedOnKey,
    history: history.map((v) => ({
      version: v.version,
      note: v.note,
      changes: v.changes,
      changedById: v.changedById,
      changedAt: v.changedAt.toISOString(),
    })),
  };
}
