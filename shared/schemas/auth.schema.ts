import { z } from 'zod';
import { EXPERIENCE_LEVELS } from '../constants/roles';
import { SALINITY_DISPLAYS, TEMPERATURE_UNITS, VOLUME_UNITS } from '../constants/units';
import { displayName, email, timeZone } from './common';
import { newPassword } from './password';

export const signInSchema = z.object({
  email,
  password: z.string({ message: 'Enter your password.' }).min(1, 'Enter your password.').max(512),
});
export type SignInInput = z.input<typeof signInSchema>;

export const unitPreferencesSchema = z.object({
  temperatureUnit: z.enum(TEMPERATURE_UNITS),
  volumeUnit: z.enum(VOLUME_UNITS),
  salinityDisplay: z.enum(SALINITY_DISPLAYS),
});

export const updateProfileSchema = z
  .object({
    displayName,
    experienceLevel: z.enum(EXPERIENCE_LEVELS),
    timeZone,
  })
  .extend(unitPreferencesSchema.shape)
  .partial()
  .strict();
export type UpdateProfileInput = z.input<typeof updateProfileSchema>;

export const acceptInviteSchema = z.object({
  token: z.string().min(20).max(200),
  /** Needed only when the invitee has no account yet. */
  displayName: displayName.optional(),
  password: newPassword.optional(),
});
export type AcceptInviteInput = z.input<typeof acceptInviteSchema>;

export const newAccountFormSchema = z
  .object({ displayName, password: newPassword, confirmPassword: z.string() })
  .refine((v) => v.password === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The passwords differ.',
  });

export const requestPasswordResetSchema = z.object({ email });
export const resetPasswordSchema = z.object({ token: z.string().min(20).max(200), password: newPassword });
export const resetPasswordFormSchema = z
  .object({ password: newPassword, confirmPassword: z.string() })
  .refine((v) => v.password === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The passwords differ.',
  });
