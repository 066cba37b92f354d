import { z } from 'zod';
import { PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '../constants/security';

/** A short built-in list of passwords people pick first (ASVS 6.2.4). Compared case-insensitively. */
const COMMON_PASSWORDS = new Set([
  '123456789',
  '1234567890',
  '12345678910',
  'password',
  'password1',
  'password12',
  'password123',
  'password1234',
  'passw0rd',
  'qwertyuiop',
  'qwerty123',
  'qwerty1234',
  '1q2w3e4r5t',
  '1qaz2wsx3edc',
  'iloveyou1',
  'iloveyou123',
  'abc1234567',
  'abcdefghij',
  'letmein123',
  'welcome123',
  'welcome1',
  'admin12345',
  'administrator',
  'sunshine1',
  'princess1',
  'football1',
  'baseball1',
  'dragon1234',
  'monkey1234',
  'trustno1',
  'starwars1',
  '0987654321',
  '1111111111',
  '0000000000',
  'aaaaaaaaaa',
  'zaq12wsx',
  'changeme123',
  'shoalwise',
  'shoalwise1',
  'shoalwise123',
  'aquarium',
  'aquarium1',
  'aquarium123',
  'seahorse',
  'seahorse1',
  'seahorse123',
  'fishtank1',
  'fishtank123',
  'clownfish1',
  'saltwater1',
  'reeftank123',
]);

export function isCommonPassword(password: string): boolean {
  return COMMON_PASSWORDS.has(password.toLowerCase());
}

export const newPassword = z
  .string({ message: 'Choose a password.' })
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`)
  .refine((p) => !isCommonPassword(p), 'That password is too common. Try a short sentence instead.');
