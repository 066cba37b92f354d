import { z } from 'zod';
import { clubIdParams, uuid } from './common';
import { tankParams } from './tank.schema';

/** The text fields sent beside the files (multipart: all strings). Attach to the tank, or to one test or event. */
export const photoUploadFieldsSchema = z
  .object({
    waterTestId: uuid.optional(),
    eventId: uuid.optional(),
    caption: z.string().trim().max(300, 'Keep the caption under 300 characters.').default(''),
  })
  .strict()
  .refine((f) => !(f.waterTestId && f.eventId), {
    path: ['eventId'],
    message: 'Attach to a water test or to an event, not both.',
  });
export type PhotoUploadFields = z.input<typeof photoUploadFieldsSchema>;

export const photoParams = clubIdParams.extend({ photoId: uuid });
export const tankPhotoListQuery = z
  .object({ waterTestId: uuid.optional(), eventId: uuid.optional() })
  .strict();
export { tankParams };
