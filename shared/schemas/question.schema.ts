import { z } from 'zod';
import { uuid } from './common';
import { tankParams } from './tank.schema';

export const QUESTION_TITLE_MAX = 160;
export const QUESTION_BODY_MAX = 5000;
/** More names than this in one message is a broadcast, not a mention. */
export const MENTIONS_MAX = 10;
export const QUESTION_STATUSES = ['open', 'answered'] as const;
export type QuestionStatus = (typeof QUESTION_STATUSES)[number];

const body = z
  .string({ message: 'Write your message.' })
  .trim()
  .min(1, 'Write your message.')
  .max(QUESTION_BODY_MAX, `Keep it under ${QUESTION_BODY_MAX} characters.`);
const mentionIds = z.array(uuid).max(MENTIONS_MAX, `Mention at most ${MENTIONS_MAX} people.`).default([]);

export const askQuestionParams = tankParams;
export const questionParams = z.object({ clubId: uuid, questionId: uuid });

/** A question is about exactly one water test or one observation of the tank. */
export const askQuestionSchema = z
  .object({
    title: z
      .string({ message: 'Give your question a short title.' })
      .trim()
      .min(1, 'Give your question a short title.')
      .max(QUESTION_TITLE_MAX, `Keep the title under ${QUESTION_TITLE_MAX} characters.`),
    body,
    waterTestId: uuid.optional(),
    eventId: uuid.optional(),
    mentionIds,
  })
  .strict()
  .superRefine((q, ctx) => {
    if ((q.waterTestId === undefined) === (q.eventId === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: ['waterTestId'],
        message: 'Ask about one water test or one observation.',
      });
    }
  });
export type AskQuestionInput = z.input<typeof askQuestionSchema>;

export const replySchema = z.object({ body, mentionIds }).strict();
export type ReplyInput = z.input<typeof replySchema>;

/** `answered: false` reopens it. */
export const markAnsweredSchema = z
  .object({ answered: z.boolean({ message: 'Say whether it is answered.' }).default(true) })
  .strict();

export const questionListQuery = z
  .object({
    status: z.enum(['open', 'all'], { message: 'Choose open or all.' }).default('open'),
    tankId: uuid.optional(),
  })
  .strict();
