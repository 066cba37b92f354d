import type { EntityManager } from 'typeorm';
import { asSubject, type QuestionSubject } from '@shared/abilities';
import type { PersonRef } from '@shared/schemas/notification-views';
import { mentionedIn } from '@shared/questions/mentions';
import { loadViewer } from '../access';

/** Clubs are small; past this a mention picker would be the wrong tool anyway. */
const CANDIDATES_MAX = 100;

/**
 * Mentors and admins of the club who may read this question, by the same rules as the routes (loaded fresh):
 * a mention never tells someone about a question they could not open.
 */
export async function mentionableFor(m: EntityManager, question: QuestionSubject): Promise<PersonRef[]> {
  const rows: { userId: string; displayName: string }[] = await m.query(
    `SELECT u.id AS "userId", u.display_name AS "displayName"
       FROM membership ms JOIN app_user u ON u.id = ms.user_id
      WHERE ms.club_id = $1 AND ms.status = 'active' AND ms.role IN ('mentor', 'admin') AND u.disabled_at IS NULL
      ORDER BY u.display_name, u.id LIMIT ${CANDIDATES_MAX}`,
    [question.clubId],
  );
  const subject = asSubject('Question', { clubId: question.clubId, askerId: question.askerId });
  const allowed: PersonRef[] = [];
  for (const r of rows) {
    const viewer = await loadViewer(m, r.userId);
    if (viewer?.ability.can('read', subject)) allowed.push(r);
  }
  return allowed;
}

/** Who a message mentions: "@Name" in the text or picked by id, among those it may reach, never the author. */
export async function mentionsOf(
  m: EntityManager,
  question: QuestionSubject,
  text: string,
  pickedIds: readonly string[],
  authorId: string,
): Promise<PersonRef[]> {
  const candidates = (await mentionableFor(m, question)).filter((p) => p.userId !== authorId);
  const named = new Set([...mentionedIn(text, candidates), ...pickedIds]);
  return candidates.filter((p) => named.has(p.userId));
}
