import { createHash } from 'node:crypto';
import type { RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { AppError, errors } from '../lib/app-error';

export const IDEMPOTENCY_HEADER = 'Idempotency-Key';
const KEY = /^[A-Za-z0-9_.:-]{8,100}$/;
const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);
/** How long a duplicate waits for the first request's answer before it is told to try again. */
const WAIT_MS = 5_000;
/** Answers are kept this long: a retry comes within minutes, a device that was offline within a day. */
export const IDEMPOTENCY_KEEP_HOURS = 24;

interface Stored {
  fingerprint: string;
  status: number | null;
  body: unknown;
}

const fingerprintOf = (method: string, url: string, body: unknown) =>
  createHash('sha256')
    .update(`${method} ${url}\n${JSON.stringify(body ?? null)}`)
    .digest('hex');

/**
 * Unsafe requests that carry an Idempotency-Key are answered once: the first request runs and its 2xx answer is
 * stored before it is sent; the same key again (a double tap, a retry after a timeout, ten at once) gets that
 * answer replayed with `Idempotent-Replayed: true` and changes nothing. The same key with a different request is
 * 422; a refused first request (4xx/5xx) frees the key, so the corrected request can be sent with it. Keys belong
 * to the signed-in person; requests without a session are not covered.
 */
export function idempotentRequests(dataSource: DataSource): RequestHandler {
  const read = async (userId: string, key: string): Promise<Stored | undefined> => {
    const rows: Stored[] = await dataSource.query(
      `SELECT fingerprint, status, body FROM idempotent_request WHERE user_id = $1 AND key = $2`,
      [userId, key],
    );
    return rows[0];
  };
  const release = (userId: string, key: string) =>
    dataSource
      .query(`DELETE FROM idempotent_request WHERE user_id = $1 AND key = $2 AND status IS NULL`, [
        userId,
        key,
      ])
      .catch(() => undefined);

  return async (req, res, next) => {
    const key = req.get(IDEMPOTENCY_HEADER);
    const userId = req.viewer?.user.id;
    if (key === undefined || SAFE.has(req.method) || !userId) return next();
    if (!KEY.test(key)) {
      return next(
        errors.badRequest('Some fields need attention.', [
          { path: IDEMPOTENCY_HEADER, message: 'Use 8 to 100 letters, digits, ".", "_", ":" or "-".' },
        ]),
      );
    }
    const fingerprint = fingerprintOf(req.method, req.originalUrl, req.body);
    const claimed: unknown[] = await dataSource.query(
      `INSERT INTO idempotent_request (user_id, key, fingerprint) VALUES ($1, $2, $3) ON CONFLICT DO NOTHING RETURNING 1`,
      [userId, key, fingerprint],
    );
    if (!claimed.length) return replay(res, await waitForAnswer(() => read(userId, key)), fingerprint);

    let stored = false;
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      if (res.statusCode < 200 || res.statusCode >= 300) return json(body);
      // Stored before it is sent: whoever sees this 2xx can count on a retry being answered the same.
      stored = true;
      void dataSource
        .query(`UPDATE idempotent_request SET status = $3, body = $4 WHERE user_id = $1 AND key = $2`, [
          userId,
          key,
          res.statusCode,
          JSON.stringify(body),
        ])
        .then(
          () => json(body),
          () => json(body),
        );
      return res;
    };
    res.on('finish', () => {
      if (stored) return;
      if (res.statusCode >= 200 && res.statusCode < 300) {
        void dataSource
          .query(`UPDATE idempotent_request SET status = $3 WHERE user_id = $1 AND key = $2`, [
            userId,
            key,
            res.statusCode,
          ])
          .catch(() => undefined);
      } else void release(userId, key);
    });
    res.on('close', () => {
      if (!res.writableFinished && !stored) void release(userId, key);
    });
    next();
  };
}

async function waitForAnswer(read: () => Promise<Stored | undefined>): Promise<Stored | undefined> {
  const deadline = Date.now() + WAIT_MS;
  for (;;) {
    const row = await read();
    if (!row || row.status !== null || Date.now() > deadline) return row;
    await new Promise((r) => setTimeout(r, 50));
  }
}

function replay(res: Response, row: Stored | undefined, fingerprint: string): void {
  // Gone meanwhile: the first request was refused and freed the key.
  if (!row)
    throw new AppError({
      code: 'conflict',
      status: 409,
      message: 'The same request was just refused. Check it and send it again.',
    });
  if (row.fingerprint !== fingerprint) {
    throw errors.unprocessable(
      'This Idempotency-Key was already used for a different request. Make a new key for a new request.',
    );
  }
  if (row.status === null) {
    throw new AppError({
      code: 'in_progress',
      status: 409,
      message: 'The same request is still being saved. Try again in a moment.',
      headers: { 'Retry-After': '1' },
    });
  }
  res.set('Idempotent-Replayed', 'true').status(row.status);
  if (row.body === null) res.end();
  else res.json(row.body);
}

export async function pruneIdempotentRequests(dataSource: DataSource): Promise<void> {
  await dataSource.query(
    `DELETE FROM idempotent_request WHERE created_at < now() - make_interval(hours => $1)`,
    [IDEMPOTENCY_KEEP_HOURS],
  );
}
