import type { EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import type { CareProfile, WaterTestInput } from '@shared/care';
import { GOOD_NEWS_DAYS, HOME_QUESTIONS_MAX, HOME_REPLY_EXCERPT_MAX } from '@shared/constants/home';
import type { QuestionStatus } from '@shared/schemas/question.schema';
import { whereAllowed } from '../access';
import { resolveProfiles } from '../care';
import { ConcernRow } from '../concerns';
import { Question } from '../questions';
import { careHistories, listTanks, type TankListRow } from '../tanks';

const DAY_MS = 86_400_000;

export interface QuestionRow {
  id: string;
  tankId: string;
  tankName: string;
  title: string;
  status: QuestionStatus;
  lastActivityAt: Date;
  lastReply: { authorId: string; authorName: string; excerpt: string; at: string } | null;
  unreadNotificationIds: string[];
}

export interface GoodNewsRow {
  kind: 'signed-off' | 'concern-resolved';
  tankId: string;
  tankName: string;
  byId: string;
  byName: string;
  at: Date;
  note: string | null;
  parameter: string | null;
  reason: string | null;
}

export interface HomeData {
  tanks: TankListRow[];
  histories: Map<string, WaterTestInput[]>;
  profiles: Map<string, CareProfile>;
  concerns: ConcernRow[];
  questions: QuestionRow[];
  goodNews: GoodNewsRow[];
}

/** Concerns still open or acknowledged on these tanks, as far as the viewer may read them. */
function liveConcerns(m: EntityManager, ability: AppAbility, tankIds: string[]): Promise<ConcernRow[]> {
  const qb = m
    .createQueryBuilder(ConcernRow, 'c')
    .where("c.tank_id IN (:...tankIds) AND c.status <> 'resolved'", { tankIds });
  return whereAllowed(qb, ability, 'read', 'Concern', {
    clubId: 'c.club_id',
    ownerId: 'c.owner_id',
  }).getMany();
}

/**
 * The viewer's own questions in the club that are open or carry a notification they have not read, newest activity
 * first, each with its latest reply and those unread notifications.
 */
function myQuestions(
  m: EntityManager,
  ability: AppAbility,
  clubId: string,
  viewerId: string,
): Promise<QuestionRow[]> {
  const unread = `ARRAY(SELECT n.id FROM notification n
     WHERE n.user_id = :viewerId AND n.read_at IS NULL AND n.subject_type = 'Question' AND n.subject_id = q.id::text
     ORDER BY n.created_at)`;
  const lastReply = `(SELECT json_build_object('authorId', r.author_id, 'authorName', u.display_name, 'excerpt', left(r.body, ${HOME_REPLY_EXCERPT_MAX + 1}), 'at', r.created_at)
       FROM question_reply r JOIN app_user u ON u.id = r.author_id
      WHERE r.question_id = q.id ORDER BY r.created_at DESC, r.id DESC LIMIT 1)`;
  const qb = m
    .createQueryBuilder(Question, 'q')
    .innerJoin('tank', 't', 't.id = q.tank_id')
    .select('q.id', 'id')
    .addSelect('q.tank_id', 'tankId')
    .addSelect('t.name', 'tankName')
    .addSelect('q.title', 'title')
    .addSelect('q.status', 'status')
    .addSelect(
      'COALESCE((SELECT max(r.created_at) FROM question_reply r WHERE r.question_id = q.id), q.created_at)',
      'lastActivityAt',
    )
    .addSelect(lastReply, 'lastReply')
    .addSelect(unread, 'unreadNotificationIds')
    .where('q.club_id = :clubId AND q.asker_id = :viewerId', { clubId, viewerId })
    .andWhere(`(q.status = 'open' OR cardinality(${unread}) > 0)`);
  whereAllowed(qb, ability, 'read', 'Question', { clubId: 'q.club_id', askerId: 'q.asker_id' });
  return qb
    .orderBy('"lastActivityAt"', 'DESC')
    .addOrderBy('q.id', 'DESC')
    .limit(HOME_QUESTIONS_MAX)
    .getRawMany<QuestionRow>();
}

/** Sign-offs of these tanks and concerns on them resolved by someone other than the keeper, since `since`. */
async function goodNewsOf(m: EntityManager, tankIds: string[], since: Date): Promise<GoodNewsRow[]> {
  return m.query(
    `SELECT 'signed-off' AS kind, r.tank_id AS "tankId", t.name AS "tankName", r.signed_off_by_id AS "byId", u.display_name AS "byName",
            r.signed_off_at AS at, r.sign_off_note AS note, NULL AS parameter, NULL AS reason
       FROM tank_readiness r JOIN tank t ON t.id = r.tank_id JOIN app_user u ON u.id = r.signed_off_by_id
      WHERE r.tank_id = ANY($1::uuid[]) AND r.signed_off_at >= $2
     UNION ALL
     SELECT 'concern-resolved', c.tank_id, t.name, c.resolved_by_id, u.display_name, c.resolved_at, c.resolve_note, c.parameter, c.reason
       FROM concern c JOIN tank t ON t.id = c.tank_id JOIN app_user u ON u.id = c.resolved_by_id
      WHERE c.tank_id = ANY($1::uuid[]) AND c.status = 'resolved' AND NOT c.resolved_by_test
        AND c.resolved_by_id <> c.owner_id AND c.resolved_at >= $2
      ORDER BY at DESC
      LIMIT 10`,
    [tankIds, since.toISOString()],
  );
}

/**
 * Everything the home shows about the viewer's own tanks and questions in one club, in a fixed number of queries
 * however many tanks there are: tanks (2), test histories (1), club profiles (0–1), concerns (1), questions (1),
 * good news (1). Every list is filtered by the viewer's permission rules in SQL.
 */
export async function loadHome(
  m: EntityManager,
  p: { ability: AppAbility; clubId: string; viewerId: string; now: Date },
): Promise<HomeData> {
  const tanks = await listTanks(m, p.ability, p.clubId, { ownerId: p.viewerId });
  const ids = tanks.map((t) => t.tank.id);
  const questions = await myQuestions(m, p.ability, p.clubId, p.viewerId);
  if (!ids.length)
    return { tanks, histories: new Map(), profiles: new Map(), concerns: [], questions, goodNews: [] };
  const histories = await careHistories(m, ids, p.now);
  const profiles = await resolveProfiles(
    m,
    p.clubId,
    tanks.map((t) => t.tank.careProfileKey),
  );
  const concerns = await liveConcerns(m, p.ability, ids);
  const goodNews = await goodNewsOf(m, ids, new Date(p.now.getTime() - GOOD_NEWS_DAYS * DAY_MS));
  return { tanks, histories, profiles, concerns, questions, goodNews };
}
