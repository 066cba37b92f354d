/** Photos: decoding and re-encoding, files on disk, rows. The routes that serve them are the tanks module's. */
export { Photo } from './photo.entity';
export { presentPhoto } from './photo.presenter';
export { processPhoto, type ProcessedPhoto } from './photo-processing';
export {
  deletePhotoRow,
  findPhoto,
  photosOf,
  photosOfTank,
  storageKeysOf,
  type PhotosByOwner,
} from './photo.queries';
export { storePhotos, type PhotoFields } from './photo.service';
export { ensureUploadsDir, photoPath, removePhotoFiles, type PhotoSize } from './photo-storage';
export { receivePhotos } from './photo-upload';
