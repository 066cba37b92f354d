import { z } from 'zod';
import {
  EMAIL_MODES,
  NOTIFICATION_KINDS,
  NOTIFICATION_PAGE_MAX,
  NOTIFICATION_PAGE_SIZE,
} from '../constants/notifications';
import { uuid } from './common';

export const listNotificationsQuery = z
  .object({
    limit: z.coerce.number().int().min(1).max(NOTIFICATION_PAGE_MAX).default(NOTIFICATION_PAGE_SIZE),
    /** Keyset cursor: the id of the last (oldest) notification of the previous page. */
    before: uuid.optional(),
    unreadOnly: z
      .enum(['true', 'false'])
      .transform((v) => v === 'true')
      .optional(),
  })
  .strict();

export const notificationParams = z.object({ id: uuid });

/** Any subset of kinds, each set to a mode; at least one. */
export const updateNotificationPreferencesSchema = z
  .partialRecord(
    z.enum(NOTIFICATION_KINDS),
    z.enum(EMAIL_MODES, { message: `Choose one of: ${EMAIL_MODES.join(', ')}.` }),
  )
  .refine((v) => Object.keys(v).length > 0, 'Change at least one kind.');
export type UpdateNotificationPreferencesInput = z.input<typeof updateNotificationPreferencesSchema>;

export const unsubscribeQuery = z.object({ token: z.string().min(1).max(512) });
