import { hash, verify } from '@node-rs/argon2';

/** OWASP's argon2id minimum (ASVS 11.4.2): m = 19456 KiB, t = 2, p = 1. */
export const ARGON2_OPTIONS = {
  algorithm: 2 /* Argon2id; the package's enum is an ambient const enum */,
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
} as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2_OPTIONS);
}

let dummyHash: Promise<string> | undefined;

/**
 * Verifies a password. When there is no user, verifies against a dummy hash anyway so an unknown
 * e-mail takes as long as a wrong password (no account enumeration by timing).
 */
export async function verifyPassword(storedHash: string | undefined, password: string): Promise<boolean> {
  const target = storedHash ?? (await (dummyHash ??= hashPassword('not-a-real-password-for-timing')));
  try {
    const ok = await verify(target, password);
    return storedHash !== undefined && ok;
  } catch {
    return false;
  }
}
