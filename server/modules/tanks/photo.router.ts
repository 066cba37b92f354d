import { readFile } from 'node:fs/promises';
import { Router, type RequestHandler } from 'express';
import type { Deps } from '@server/deps';
import {
  photoParams,
  photoUploadFieldsSchema,
  tankParams,
  tankPhotoListQuery,
} from '@shared/schemas/photo.schema';
import { errors } from '../../lib/app-error';
import { inputOf, parseInput, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import {
  ensureUploadsDir,
  findPhoto,
  photoPath,
  photosOfTank,
  presentPhoto,
  receivePhotos,
  type PhotoSize,
} from '../photos';
import { findTank, loadTank, ownedBy, requireActive } from './tank-access';
import type { Tank } from './tank.entity';
import { attachPhotos, deletePhoto } from './tank-photo.service';

/** Photos of a tank, a water test or an event, served only to people who may read the tank. */
export function photoRouter(deps: Pick<Deps, 'dataSource' | 'config'>): Router {
  const { dataSource } = deps;
  const { uploadsDir } = deps.config;
  ensureUploadsDir(uploadsDir);
  const router = Router();
  const tankPhotos = '/clubs/:clubId/tanks/:tankId/photos';

  const list = { params: tankParams, query: tankPhotoListQuery };
  router.get(tankPhotos, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'Photo', ownedBy(tank));
    const rows = await photosOfTank(dataSource.manager, tank.id, query);
    res.json({ photos: rows.map((p) => presentPhoto(p, tank.clubId)) });
  });

  // The tank is loaded and the upload authorized before a single byte of the files is read.
  const one = { params: tankParams };
  const mayUpload: RequestHandler = async (req, res, next) => {
    const { params } = inputOf(res, one);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'create', 'Photo', ownedBy(tank));
    requireActive(tank);
    res.locals.tank = tank;
    next();
  };
  router.post(
    tankPhotos,
    requireSignIn,
    validate(one),
    requireClubMember,
    mayUpload,
    receivePhotos,
    async (req, res) => {
      const tank = res.locals.tank as Tank;
      const fields = parseInput(photoUploadFieldsSchema, { ...req.body }, 'body');
      const files = (req.files ?? []) as Express.Multer.File[];
      const rows = await attachPhotos(dataSource, uploadsDir, tank, fields, files, viewerOf(req).user.id);
      res.status(201).json({ photos: rows.map((p) => presentPhoto(p, tank.clubId)) });
    },
  );

  const photo = { params: photoParams };
  /** The photo and its tank, when the tank is in this club. */
  const loadPhoto = async (clubId: string, photoId: string) => {
    const row = await findPhoto(dataSource.manager, photoId);
    const tank = row ? await findTank(dataSource.manager, clubId, row.tankId) : null;
    if (!row || !tank) throw errors.notFound('That photo');
    return { photo: row, tank };
  };

  const serve =
    (size: PhotoSize): RequestHandler =>
    async (req, res) => {
      const { params } = inputOf(res, photo);
      const { photo: row, tank } = await loadPhoto(params.clubId, params.photoId);
      authorize(req, 'read', 'Photo', ownedBy(tank));
      const data = await readFile(photoPath(uploadsDir, row.storageKey, size)).catch(
        (error: NodeJS.ErrnoException) => {
          if (error.code === 'ENOENT') throw errors.notFound('That photo file');
          throw error;
        },
      );
      res
        .status(200)
        .set({
          'Content-Type': 'image/webp',
          'X-Content-Type-Options': 'nosniff',
          'Content-Disposition': 'inline; filename="photo.webp"',
          'Cache-Control': 'private, max-age=3600',
        })
        .send(data);
    };
  router.get(
    '/clubs/:clubId/photos/:photoId',
    requireSignIn,
    validate(photo),
    requireClubMember,
    serve('full'),
  );
  router.get(
    '/clubs/:clubId/photos/:photoId/thumb',
    requireSignIn,
    validate(photo),
    requireClubMember,
    serve('thumb'),
  );

  router.delete(
    '/clubs/:clubId/photos/:photoId',
    requireSignIn,
    validate(photo),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, photo);
      const { photo: row, tank } = await loadPhoto(params.clubId, params.photoId);
      authorize(req, 'delete', 'Photo', ownedBy(tank));
      requireActive(tank);
      await deletePhoto(dataSource.manager, uploadsDir, row);
      res.status(204).end();
    },
  );

  return router;
}
