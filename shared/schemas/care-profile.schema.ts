import { z } from 'zod';
import { careProfileSchema } from '../care/profiles/schema';
import { uuid } from './common';

export const careProfileParams = z.object({ clubId: uuid, profileId: uuid });
export const careProfileKeyParams = z.object({ clubId: uuid, key: z.string().min(1).max(100) });

export const copyCareProfileSchema = z
  .object({
    basedOn: z.string().min(1, 'Choose the profile to start from.').max(100),
    name: z.string().trim().min(3, 'Give the copy a name of at least 3 characters.').max(80),
  })
  .strict();

/** An edit of a club's profile: its whole definition (the server keeps its own key and version) and why it changed. */
export const updateCareProfileSchema = z
  .object({
    definition: careProfileSchema,
    /** The version the editor started from: if someone saved in between, the edit is refused (409). */
    baseVersion: z.number().int().positive(),
    note: z.string().trim().min(3, 'Say briefly why it changed, for the history.').max(500),
  })
  .strict();

export type CopyCareProfileInput = z.input<typeof copyCareProfileSchema>;
export type UpdateCareProfileInput = z.input<typeof updateCareProfileSchema>;
