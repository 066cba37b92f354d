import { errors } from '../../lib/app-error';

export interface Position {
  at: Date;
  id: string;
}

/** An opaque "older than this" position for newest-first lists ordered by (time, id). */
export function encodeCursor(p: Position): string {
  return Buffer.from(`${p.at.toISOString()}|${p.id}`).toString('base64url');
}

export function decodeCursor(cursor: string | undefined): Position | undefined {
  if (cursor === undefined) return undefined;
  const [iso, id, ...rest] = Buffer.from(cursor, 'base64url').toString('utf8').split('|');
  const at = new Date(iso ?? '');
  if (rest.length || !id || !/^[0-9a-f-]{36}$/.test(id) || Number.isNaN(at.getTime())) {
    throw errors.badRequest('That page position is not valid.', [
      { path: 'query.before', message: 'Start again from the first page.' },
    ]);
  }
  return { at, id };
}

/** Takes one row more than the page to learn whether another page follows. */
export function pageOf<T>(
  rows: T[],
  limit: number,
  positionOf: (row: T) => Position,
): { items: T[]; nextCursor: string | null } {
  const items = rows.slice(0, limit);
  const last = items[items.length - 1];
  return { items, nextCursor: rows.length > limit && last ? encodeCursor(positionOf(last)) : null };
}
