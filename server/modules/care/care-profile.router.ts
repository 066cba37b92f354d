import { Router } from 'express';
import type { Deps } from '@server/deps';
import { careProfileKeyParams, careProfileParams, copyCareProfileSchema, updateCareProfileSchema } from '@shared/schemas/care-profile.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { ClubCareProfile } from './care-profile.entity';
import { copyProfile, listProfiles, loadClubProfile, resolveProfile, updateProfile } from './care-profile.service';

export function careProfileRouter(deps: Pick<Deps, 'dataSource' | 'tankChanges'>): Router {
  const { dataSource, tankChanges } = deps;
  const router = Router();

  router.get('/clubs/:clubId/care-profiles', requireSignIn, validate({ params: clubIdParams }), requireClubMember, async (req, res) => {
    const clubId = req.params.clubId as string;
    authorize(req, 'read', 'CareProfile', { clubId });
    res.json({ profiles: await listProfiles(dataSource.manager, clubId) });
  });

  const byKey = { params: careProfileKeyParams };
  router.get('/clubs/:clubId/care-profiles/:key', requireSignIn, validate(byKey), requireClubMember, async (req, res) => {
    const { clubId, key } = inputOf(res, byKey).params;
    const profile = await resolveProfile(dataSource.manager, clubId, key);
    if (!profile) throw errors.notFound('That care profile');
    const clubRow = await dataSource.getRepository(ClubCareProfile).findOneBy({ clubId, key });
    authorize(req, 'read', 'CareProfile', { clubId: clubRow ? clubId : null });
    const history = clubRow ? (await loadClubProfile(dataSource.manager, clubId, clubRow.id)).versions : [];
    res.json({
      profile,
      source: clubRow ? 'club' : 'built-in',
      id: clubRow?.id,
      basedOnKey: clubRow?.basedOnKey,
      history: history.map((v) => ({ version: v.version, note: v.note, changes: v.changes, changedById: v.changedById, changedAt: v.changedAt.toISOString() })),
    });
  });

  const copy = { params: clubIdParams, body: copyCareProfileSchema };
  router.post('/clubs/:clubId/care-profiles', requireSignIn, validate(copy), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, copy);
    authorize(req, 'create', 'CareProfile', { clubId: params.clubId });
    const created = await dataSource.transaction((tx) => copyProfile(tx, { clubId: params.clubId, basedOn: body.basedOn, name: body.name, actorId: viewerOf(req).user.id }));
    res.status(201).json({ id: created.id, key: created.key, version: created.currentVersion });
  });

  const update = { params: careProfileParams, body: updateCareProfileSchema };
  router.put('/clubs/:clubId/care-profiles/:profileId', requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    authorize(req, 'update', 'CareProfile', { clubId: params.clubId });
    const result = await dataSource.transaction(async (tx) => {
      const updated = await updateProfile(tx, { clubId: params.clubId, profileId: params.profileId, definition: body.definition, note: body.note, actorId: viewerOf(req).user.id, expectedVersion: body.baseVersion });
      // Every tank that follows the profile is judged again by the new version, in the same transaction.
      await tankChanges.publishForProfile(tx, params.clubId, updated.profile.key);
      return updated;
    });
    res.json({ profile: result.definition, changes: result.changes });
  });

  return router;
}
