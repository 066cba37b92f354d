import { z } from 'zod';
import { ROLES } from '../constants/roles';
import { email, uuid } from './common';

export const createInviteSchema = z.object({ email, role: z.enum(ROLES) }).strict();
export type CreateInviteInput = z.input<typeof createInviteSchema>;

export const inviteParams = z.object({ clubId: uuid, inviteId: uuid });
export const membershipParams = z.object({ clubId: uuid, membershipId: uuid });

export const updateMembershipSchema = z
  .object({ role: z.enum(ROLES), status: z.enum(['active', 'suspended']) })
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'Change the role or the status.');

export const createAssignmentSchema = z.object({ mentorId: uuid, menteeId: uuid }).strict();
export const assignmentParams = z.object({ clubId: uuid, assignmentId: uuid });
