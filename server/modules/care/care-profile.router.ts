import { Router } from 'express';
import type { Deps } from '@server/deps';
import {
  careProfileKeyParams,
  careProfileParams,
  copyCareProfileSchema,
  updateCareProfileSchema,
} from '@shared/schemas/care-profile.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { copyProfile, listProfiles, profileDetail, updateProfile } from './care-profile.service';

export function careProfileRouter(deps: Pick<Deps, 'dataSource' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const router = Router();

  router.get(
    '/clubs/:clubId/care-profiles',
    requireSignIn,
    validate({ params: clubIdParams }),
    requireClubMember,
    async (req, res) => {
      const clubId = req.params.clubId as string;
      authorize(req, 'read', 'CareProfile', { clubId });
      res.json({ profiles: await listProfiles(dataSource.manager, clubId) });
    },
  );

  const byKey = { params: careProfileKeyParams };
  router.get(
    '/clubs/:clubId/care-profiles/:key',
    requireSignIn,
    validate(byKey),
    requireClubMember,
    async (req, res) => {
      const { clubId, key } = inputOf(res, byKey).params;
      const detail = await profileDetail(dataSource.manager, clubId, key);
      if (!detail) throw errors.notFound('That care profile');
      authorize(req, 'read', 'CareProfile', { clubId: detail.source === 'club' ? clubId : null });
      res.json(detail);
    },
  );

  const copy = { params: clubIdParams, body: copyCareProfileSchema };
  router.post(
    '/clubs/:clubId/care-profiles',
    requireSignIn,
    validate(copy),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, copy);
      authorize(req, 'create', 'CareProfile', { clubId: params.clubId });
      const created = await dataSource.transaction((tx) =>
        copyProfile(tx, {
          clubId: params.clubId,
          basedOn: body.basedOn,
          name: body.name,
          actorId: viewerOf(req).user.id,
        }),
      );
      res.status(201).json({ id: created.id, key: created.key, version: created.currentVersion });
    },
  );

  const update = { params: careProfileParams, body: updateCareProfileSchema };
  router.put(
    '/clubs/:clubId/care-profiles/:profileId',
    requireSignIn,
    validate(update),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, update);
      authorize(req, 'update', 'CareProfile', { clubId: params.clubId });
      const result = await dataSource.transaction((tx) =>
        updateProfile(tx, deps, {
          clubId: params.clubId,
          profileId: params.profileId,
          definition: body.definition,
          note: body.note,
          actorId: viewerOf(req).user.id,
          expectedVersion: body.baseVersion,
        }),
      );
      res.json({ profile: result.definition, changes: result.changes });
    },
  );

  return router;
}
