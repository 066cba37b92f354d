import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import type { ChartReading, ReplyView } from '@shared/schemas/question-views';
import { errors } from '../../lib/app-error';
import { whereAllowed } from '../access';
import { valuesOf, WaterTest } from '../tanks';
import { Question } from './question.entity';
import type { SummaryRow } from './question.presenter';
import { DAY_MS } from '@shared/care/time';

/** How far either side of the test the question's chart reaches. */
export const CHART_WINDOW_DAYS = 14;
const LIST_LIMIT = 200;

/** The author of the newest reply, or the asker while there is none: who spoke last. */
const LAST_AUTHOR = `COALESCE((SELECT r.author_id FROM question_reply r WHERE r.question_id = q.id ORDER BY r.created_at DESC, r.id DESC LIMIT 1), q.asker_id)`;

/**
 * Open questions per tank whose last message is the asker's (nobody has answered it since), for the mentor desk.
 * Every tank asked about is in the map, 0 when none are waiting.
 */
export async function unansweredCountsByTank(
  manager: EntityManager,
  clubId: string,
  tankIds: readonly string[],
): Promise<Map<string, number>> {
  const counts = new Map<string, number>(tankIds.map((id) => [id, 0]));
  if (!tankIds.length) return counts;
  const rows: { tankId: string; n: number }[] = await manager.query(
    `SELECT q.tank_id AS "tankId", count(*)::int AS n
       FROM question q
      WHERE q.club_id = $1 AND q.tank_id = ANY($2::uuid[]) AND q.status = 'open' AND ${LAST_AUTHOR} = q.asker_id
      GROUP BY q.tank_id`,
    [clubId, [...tankIds]],
  );
  for (const r of rows) counts.set(r.tankId, r.n);
  return counts;
}

function summaries(manager: EntityManager): SelectQueryBuilder<Question> {
  return manager
    .createQueryBuilder(Question, 'q')
    .innerJoin('tank', 't', 't.id = q.tank_id')
    .innerJoin('app_user', 'u', 'u.id = q.asker_id')
    .select('q.id', 'id')
    .addSelect('q.club_id', 'clubId')
    .addSelect('q.tank_id', 'tankId')
    .addSelect('t.name', 'tankName')
    .addSelect('q.asker_id', 'askerId')
    .addSelect('u.display_name', 'askerName')
    .addSelect(`q.snapshot -> 'subject' ->> 'kind'`, 'aboutKind')
    .addSelect(
      `COALESCE(q.snapshot -> 'subject' ->> 'takenAt', q.snapshot -> 'subject' ->> 'occurredAt')`,
      'aboutAt',
    )
    .addSelect('q.title', 'title')
    .addSelect('q.status', 'status')
    .addSelect('q.created_at', 'createdAt')
    .addSelect('q.answered_at', 'answeredAt')
    .addSelect('(SELECT count(*)::int FROM question_reply r WHERE r.question_id = q.id)', 'replyCount')
    .addSelect(
      'COALESCE((SELECT max(r.created_at) FROM question_reply r WHERE r.question_id = q.id), q.created_at)',
      'lastActivityAt',
    )
    .addSelect(LAST_AUTHOR, 'lastAuthorId');
}

/** The club's questions the viewer may read, filtered by the permission rules in SQL; newest activity first. */
export async function listQuestions(
  manager: EntityManager,
  ability: AppAbility,
  clubId: string,
  filter: { status: 'open' | 'all'; tankId?: string },
): Promise<SummaryRow[]> {
  const qb = summaries(manager).where('q.club_id = :clubId', { clubId });
  if (filter.status === 'open') qb.andWhere(`q.status = 'open'`);
  if (filter.tankId) qb.andWhere('q.tank_id = :tankId', { tankId: filter.tankId });
  whereAllowed(qb, ability, 'read', 'Question', { clubId: 'q.club_id', askerId: 'q.asker_id' });
  return qb
    .orderBy('"lastActivityAt"', 'DESC')
    .addOrderBy('q.id', 'DESC')
    .limit(LIST_LIMIT)
    .getRawMany<SummaryRow>();
}

export async function summaryOf(manager: EntityManager, questionId: string): Promise<SummaryRow> {
  const row = await summaries(manager).where('q.id = :questionId', { questionId }).getRawOne<SummaryRow>();
  if (!row) throw errors.notFound('That question');
  return row;
}

/** The question in this club, or 404: an id from another club does not exist here. */
export async function loadQuestion(
  manager: EntityManager,
  clubId: string,
  questionId: string,
  lock = false,
): Promise<Question> {
  const qb = manager
    .createQueryBuilder(Question, 'q')
    .where('q.id = :questionId AND q.club_id = :clubId', { questionId, clubId });
  if (lock) qb.setLock('pessimistic_write');
  const question = await qb.getOne();
  if (!question) throw errors.notFound('That question');
  return question;
}

export async function repliesOf(manager: EntityManager, questionId: string): Promise<ReplyView[]> {
  const rows: { id: string; authorId: string; authorName: string; body: string; createdAt: Date }[] =
    await manager.query(
      `SELECT r.id, r.author_id AS "authorId", u.display_name AS "authorName", r.body, r.created_at AS "createdAt"
       FROM question_reply r JOIN app_user u ON u.id = r.author_id
      WHERE r.question_id = $1 ORDER BY r.created_at, r.id`,
      [questionId],
    );
  return rows.map((r) => ({
    id: r.id,
    author: { userId: r.authorId, displayName: r.authorName },
    body: r.body,
    createdAt: new Date(r.createdAt).toISOString(),
  }));
}

/** The tank's readings as they are today, two weeks either side of `at`, oldest first. */
export async function readingsAround(
  manager: EntityManager,
  tankId: string,
  at: string,
): Promise<ChartReading[]> {
  const centre = Date.parse(at);
  const rows = await manager
    .createQueryBuilder(WaterTest, 'w')
    .where('w.tank_id = :tankId AND w.taken_at BETWEEN :from AND :to', {
      tankId,
      from: new Date(centre - CHART_WINDOW_DAYS * DAY_MS),
      to: new Date(centre + CHART_WINDOW_DAYS * DAY_MS),
    })
    .orderBy('w.taken_at', 'ASC')
    .addOrderBy('w.id', 'ASC')
    .limit(500)
    .getMany();
  return rows.map((w) => ({ id: w.id, takenAt: w.takenAt.toISOString(), values: valuesOf(w) }));
}
