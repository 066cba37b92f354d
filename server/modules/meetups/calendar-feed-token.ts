import { createHmac } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { safeEqual } from '../../lib/tokens';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// A key of its own, derived from the session secret: a signature made here is worthless for anything else.
const keyFrom = (secret: string) =>
  createHmac('sha256', secret).update('shoalwise:calendar-feed:v1').digest();
const sign = (secret: string, payload: string) =>
  createHmac('sha256', keyFrom(secret)).update(payload).digest('base64url');

/**
 * `<base64url(userId:generation)>.<HMAC-SHA256>`. It only ever reads that person's meetups; resetting the link
 * bumps the generation, and every older link stops working.
 */
export function signFeedToken(secret: string, userId: string, generation: number): string {
  const payload = Buffer.from(`${userId}:${generation}`, 'utf8').toString('base64url');
  return `${payload}.${sign(secret, payload)}`;
}

export function verifyFeedToken(
  secret: string,
  token: string,
): { userId: string; generation: number } | null {
  const [payload, signature, extra] = token.split('.');
  if (!payload || !signature || extra !== undefined) return null;
  if (!safeEqual(signature, sign(secret, payload))) return null;
  const [userId, generation] = Buffer.from(payload, 'base64url').toString('utf8').split(':');
  if (!userId || !UUID.test(userId) || !/^[1-9]\d{0,8}$/.test(generation ?? '')) return null;
  return { userId, generation: Number(generation) };
}

export async function feedGeneration(manager: EntityManager, userId: string): Promise<number> {
  const [row] = (await manager.query(`SELECT generation FROM calendar_feed WHERE user_id = $1`, [
    userId,
  ])) as { generation: number }[];
  return row?.generation ?? 1;
}

/** A new link; the old one is dead from now on. */
export async function resetFeed(manager: EntityManager, userId: string): Promise<number> {
  const [row] = (await manager.query(
    `INSERT INTO calendar_feed (user_id, generation) VALUES ($1, 2)
     ON CONFLICT (user_id) DO UPDATE SET generation = calendar_feed.generation + 1, updated_at = now()
     RETURNING generation`,
    [userId],
  )) as { generation: number }[];
  return row!.generation;
}

export const feedUrl = (baseUrl: string, secret: string, userId: string, generation: number) =>
  `${baseUrl}/api/calendar-feeds/${signFeedToken(secret, userId, generation)}/meetups.ics`;
