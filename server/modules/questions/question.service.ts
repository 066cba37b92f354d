import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Deps } from '@server/deps';
import type { PersonRef } from '@shared/schemas/notification-views';
import type { askQuestionSchema, replySchema } from '@shared/schemas/question.schema';
import { errors } from '../../lib/app-error';
import { currentMentorsOf } from '../mentorship';
import type { Tank } from '../tanks';
import { mentionsOf } from './question-people';
import { takeSnapshot } from './question-snapshot';
import { Question, QuestionReply } from './question.entity';

type QuestionDeps = Pick<Deps, 'notify' | 'tankChanges'>;

interface Author {
  id: string;
  displayName: string;
}

const TITLE_QUOTE_MAX = 80;
const quote = (title: string) =>
  `“${title.length > TITLE_QUOTE_MAX ? `${title.slice(0, TITLE_QUOTE_MAX - 1)}…` : title}”`;
const linkTo = (q: Question) => `/questions/${q.id}`;
const subjectOf = (q: Question) => ({ type: 'Question', id: q.id });

/** Mentions go to people not already told about this message some other way, so nobody gets two for one. */
async function notifyMentions(
  tx: EntityManager,
  { notify }: QuestionDeps,
  q: Question,
  author: Author,
  text: string,
  pickedIds: readonly string[],
  alreadyTold: readonly string[],
): Promise<PersonRef[]> {
  const mentioned = await mentionsOf(tx, q, text, pickedIds, author.id);
  const toTell = mentioned.filter((p) => !alreadyTold.includes(p.userId));
  await notify(tx, {
    userIds: toTell.map((p) => p.userId),
    clubId: q.clubId,
    kind: 'mention',
    title: `${author.displayName} mentioned you on ${quote(q.title)}`,
    body: text,
    link: linkTo(q),
    subject: subjectOf(q),
  });
  return mentioned;
}

/** Whoever watches the tank sees its questions change (the desk counts unanswered ones). */
async function announce(tx: EntityManager, deps: QuestionDeps, q: Question): Promise<void> {
  await deps.tankChanges.publish(tx, q.tankId, 'question');
}

/** A keeper asks about one of their tests or observations; their current mentors hear of it. */
export async function askQuestion(
  tx: EntityManager,
  deps: QuestionDeps,
  tank: Tank,
  input: z.output<typeof askQuestionSchema>,
  asker: Author,
  now = new Date(),
) {
  if (tank.ownerId !== asker.id)
    throw errors.forbidden('Only the keeper of this tank can ask about its readings.');
  const snapshot = await takeSnapshot(
    tx,
    tank,
    { waterTestId: input.waterTestId, eventId: input.eventId },
    now,
  );
  const question = await tx.save(
    tx.create(Question, {
      clubId: tank.clubId,
      tankId: tank.id,
      askerId: asker.id,
      waterTestId: input.waterTestId ?? null,
      eventId: input.eventId ?? null,
      title: input.title,
      body: input.body,
      status: 'open',
      snapshot,
      answeredAt: null,
    }),
  );
  const mentors = await currentMentorsOf(tx, tank.clubId, asker.id);
  await deps.notify(tx, {
    userIds: mentors,
    clubId: tank.clubId,
    kind: 'question.asked',
    title: `${asker.displayName} asked ${quote(question.title)}`,
    body: input.body,
    link: linkTo(question),
    subject: subjectOf(question),
  });
  const mentioned = await notifyMentions(
    tx,
    deps,
    question,
    asker,
    `${input.title}\n${input.body}`,
    input.mentionIds,
    mentors,
  );
  await announce(tx, deps, question);
  return { question, mentioned };
}

/**
 * A message in the thread. A reply by someone else tells the asker; the asker's own follow-up tells their current
 * mentors and reopens a question they had marked answered.
 */
export async function addReply(
  tx: EntityManager,
  deps: QuestionDeps,
  question: Question,
  input: z.output<typeof replySchema>,
  author: Author,
) {
  const reply = await tx.save(
    tx.create(QuestionReply, { questionId: question.id, authorId: author.id, body: input.body }),
  );
  const byAsker = author.id === question.askerId;
  let told: string[];
  if (byAsker) {
    told = (await currentMentorsOf(tx, question.clubId, question.askerId)).filter((id) => id !== author.id);
    await deps.notify(tx, {
      userIds: told,
      clubId: question.clubId,
      kind: 'question.asked',
      title: `${author.displayName} added to ${quote(question.title)}`,
      body: input.body,
      link: linkTo(question),
      subject: subjectOf(question),
    });
    if (question.status === 'answered')
      await tx.update(Question, { id: question.id }, { status: 'open', answeredAt: null });
  } else {
    told = [question.askerId];
    await deps.notify(tx, {
      userIds: told,
      clubId: question.clubId,
      kind: 'question.answered',
      title: `${author.displayName} answered ${quote(question.title)}`,
      body: input.body,
      link: linkTo(question),
      subject: subjectOf(question),
    });
  }
  const mentioned = await notifyMentions(tx, deps, question, author, input.body, input.mentionIds, told);
  await announce(tx, deps, question);
  return { reply, mentioned };
}

/** The asker says the thread answered them, or reopens it. */
export async function setAnswered(
  tx: EntityManager,
  deps: QuestionDeps,
  question: Question,
  answered: boolean,
  now = new Date(),
): Promise<void> {
  await tx.update(
    Question,
    { id: question.id },
    answered
      ? { status: 'answered', answeredAt: question.answeredAt ?? now }
      : { status: 'open', answeredAt: null },
  );
  await announce(tx, deps, question);
}
