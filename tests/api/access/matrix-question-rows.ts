import type { Persona, World } from './world';

type Expect = Record<Persona, number>;
export interface QuestionMatrixRow {
  route: string;
  request: (w: World) => { path: string; body?: unknown };
  expect: Expect;
}

/** Any active member: the list is filtered to the questions each may read. */
const clubMembers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: s,
  admin: s,
  suspended: 403,
});
/** The member's question: their mentor and the club's admins read and answer it; another mentor of the club may not. */
const readers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: 403,
  admin: s,
  suspended: 403,
});
/** Only the keeper asks about their own tank and marks their own question answered. */
const askerOnly = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: 403,
  otherMentor: 403,
  admin: 403,
  suspended: 403,
});
const questions = (w: World) => `/clubs/${w.club.id}/questions`;

export const QUESTION_ROWS: QuestionMatrixRow[] = [
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/questions',
    request: (w) => ({
      path: `/clubs/${w.club.id}/tanks/${w.tank.tank.id}/questions`,
      body: { title: 'Ammonia zero?', body: 'Is 0 right?', waterTestId: w.tank.waterTest.id },
    }),
    expect: askerOnly(201),
  },
  {
    route: 'GET /clubs/:clubId/questions',
    request: (w) => ({ path: `${questions(w)}?status=all` }),
    expect: clubMembers(200),
  },
  {
    route: 'GET /clubs/:clubId/questions/:questionId',
    request: (w) => ({ path: `${questions(w)}/${w.questions.question.id}` }),
    expect: readers(200),
  },
  {
    route: 'POST /clubs/:clubId/questions/:questionId/replies',
    request: (w) => ({
      path: `${questions(w)}/${w.questions.question.id}/replies`,
      body: { body: 'Looks fine to me.' },
    }),
    expect: readers(201),
  },
  {
    route: 'POST /clubs/:clubId/questions/:questionId/answered',
    request: (w) => ({
      path: `${questions(w)}/${w.questions.question.id}/answered`,
      body: { answered: true },
    }),
    expect: askerOnly(200),
  },
];
