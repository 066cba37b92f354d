import { Router, type Request } from 'express';
import type { Deps } from '@server/deps';
import type { QuestionDetailView } from '@shared/schemas/question-views';
import {
  askQuestionParams,
  askQuestionSchema,
  markAnsweredSchema,
  questionListQuery,
  questionParams,
  replySchema,
} from '@shared/schemas/question.schema';
import { clubIdParams } from '@shared/schemas/common';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { loadTank, requireActive } from '../tanks';
import { mentionableFor } from './question-people';
import type { Question } from './question.entity';
import { presentSummary } from './question.presenter';
import { listQuestions, loadQuestion, readingsAround, repliesOf, summaryOf } from './question.queries';
import { addReply, askQuestion, setAnswered } from './question.service';

const author = (req: Request) => {
  const { user } = viewerOf(req);
  return { id: user.id, displayName: user.displayName };
};
const subject = (q: Pick<Question, 'clubId' | 'askerId'>) => ({ clubId: q.clubId, askerId: q.askerId });

/**
 * Questions on a reading. The asker writes in their own thread ('update'); everyone else needs 'answer'
 * (current mentors, admins), so a past mentor can still read but no longer reply.
 */
export function questionRouter(deps: Pick<Deps, 'dataSource' | 'notify' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const base = '/clubs/:clubId/questions';

  const ask = { params: askQuestionParams, body: askQuestionSchema };
  router.post(
    '/clubs/:clubId/tanks/:tankId/questions',
    requireSignIn,
    validate(ask),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, ask);
      const { question, mentioned } = await dataSource.transaction(async (tx) => {
        const tank = await loadTank(tx, params.clubId, params.tankId);
        authorize(req, 'create', 'Question', { clubId: tank.clubId, askerId: tank.ownerId });
        requireActive(tank);
        return askQuestion(tx, deps, tank, body, author(req));
      });
      const summary = presentSummary(await summaryOf(dataSource.manager, question.id));
      res.status(201).json({ question: { ...summary, body: question.body }, mentioned });
    },
  );

  const list = { params: clubIdParams, query: questionListQuery };
  router.get(base, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const rows = await listQuestions(dataSource.manager, viewerOf(req).ability, params.clubId, query);
    res.json({ questions: rows.map(presentSummary) });
  });

  const one = { params: questionParams };
  router.get(`${base}/:questionId`, requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const m = dataSource.manager;
    const question = await loadQuestion(m, params.clubId, params.questionId);
    authorize(req, 'read', 'Question', subject(question));
    const { subject: about } = question.snapshot;
    const view: QuestionDetailView = {
      question: { ...presentSummary(await summaryOf(m, question.id)), body: question.body },
      snapshot: question.snapshot,
      replies: await repliesOf(m, question.id),
      readings: await readingsAround(
        m,
        question.tankId,
        about.kind === 'water-test' ? about.takenAt : about.occurredAt,
      ),
      mentionable: (await mentionableFor(m, subject(question))).filter(
        (p) => p.userId !== viewerOf(req).user.id,
      ),
    };
    res.json(view);
  });

  const reply = { params: questionParams, body: replySchema };
  router.post(
    `${base}/:questionId/replies`,
    requireSignIn,
    validate(reply),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, reply);
      const me = author(req);
      const saved = await dataSource.transaction(async (tx) => {
        const question = await loadQuestion(tx, params.clubId, params.questionId, true);
        authorize(req, question.askerId === me.id ? 'update' : 'answer', 'Question', subject(question));
        return addReply(tx, deps, question, body, me);
      });
      const { reply: r } = saved;
      res.status(201).json({
        reply: {
          id: r.id,
          author: { userId: me.id, displayName: me.displayName },
          body: r.body,
          createdAt: r.createdAt.toISOString(),
        },
        question: presentSummary(await summaryOf(dataSource.manager, params.questionId)),
        mentioned: saved.mentioned,
      });
    },
  );

  const answered = { params: questionParams, body: markAnsweredSchema };
  router.post(
    `${base}/:questionId/answered`,
    requireSignIn,
    validate(answered),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, answered);
      await dataSource.transaction(async (tx) => {
        const question = await loadQuestion(tx, params.clubId, params.questionId, true);
        authorize(req, 'update', 'Question', subject(question));
        await setAnswered(tx, deps, question, body.answered);
      });
      res.json({ question: presentSummary(await summaryOf(dataSource.manager, params.questionId)) });
    },
  );

  return router;
}
