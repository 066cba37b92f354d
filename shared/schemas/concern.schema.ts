import { z } from 'zod';
import { uuid } from './common';

export const concernParams = z.object({ clubId: uuid, concernId: uuid });
export const concernActionSchema = z
  .object({ note: z.string().trim().max(1000, 'Keep the note under 1000 characters.').default('') })
  .strict();
export const concernListQuery = z.object({ status: z.enum(['live', 'all']).default('live') }).strict();

export const readinessChecklistSchema = z
  .object({
    equipmentRunning: z.boolean(),
    quarantinePlan: z.boolean(),
    foodReady: z.boolean(),
    notes: z.string().trim().max(2000, 'Keep the notes under 2000 characters.').default(''),
  })
  .strict();
export type ReadinessChecklistInput = z.input<typeof readinessChecklistSchema>;
export const signOffSchema = z.object({ note: z.string().trim().max(1000).default('') }).strict();
