import { z } from 'zod';

export const uuid = z.uuid({ message: 'Must be a valid id.' });
export const email = z
  .string({ message: 'Enter an e-mail address.' })
  .trim()
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email({ message: 'Enter a valid e-mail address.' }))
  .transform((e) => e.toLowerCase());
export const displayName = z
  .string()
  .trim()
  .min(1, 'Enter your name.')
  .max(80, 'Keep it under 80 characters.');
export const timeZone = z
  .string()
  .trim()
  .min(1)
  .max(64)
  .refine((tz) => {
    try {
      new Intl.DateTimeFormat('en', { timeZone: tz });
      return true;
    } catch {
      return false;
    }
  }, 'Choose a known time zone, e.g. Europe/Lisbon.');
export const clubIdParams = z.object({ clubId: uuid });
