import type { Persona, World } from './world';

type Expect = Record<Persona, number>;
export interface CareMatrixRow {
  route: string;
  request: (w: World) => { path: string; body?: unknown };
  expect: Expect;
}

/** The member's own tank: their mentor and the club's admins read it; another mentor of the club may not. */
const readers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: 403,
  admin: s,
  suspended: 403,
});
/** Acting on a concern: the keeper themselves or their mentor; admins read but do not act, other mentors neither. */
const keeperOrMentor = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: 403,
  admin: 403,
  suspended: 403,
});
const ownerOnly = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: 403,
  otherMentor: 403,
  admin: 403,
  suspended: 403,
});
/** Only the mentee's own mentor signs a tank off. */
const mentorOnly = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: s,
  otherMentor: 403,
  admin: 403,
  suspended: 403,
});

const tankPath = (w: World) => `/clubs/${w.club.id}/tanks/${w.tank.tank.id}`;

/** The desk: mentors and admins (each sees only the tanks they watch); members have their own tank list. */
const watchers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: s,
  otherMentor: s,
  admin: s,
  suspended: 403,
});

export const CARE_ROWS: CareMatrixRow[] = [
  {
    route: 'GET /clubs/:clubId/desk',
    request: (w) => ({ path: `/clubs/${w.club.id}/desk` }),
    expect: watchers(200),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/concerns',
    request: (w) => ({ path: `${tankPath(w)}/concerns?status=all` }),
    expect: readers(200),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/care',
    request: (w) => ({ path: `${tankPath(w)}/care` }),
    expect: readers(200),
  },
  {
    route: 'POST /clubs/:clubId/concerns/:concernId/acknowledge',
    request: (w) => ({
      path: `/clubs/${w.club.id}/concerns/${w.concernId}/acknowledge`,
      body: { note: 'seen' },
    }),
    expect: mentorOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/concerns/:concernId/resolve',
    request: (w) => ({ path: `/clubs/${w.club.id}/concerns/${w.concernId}/resolve`, body: {} }),
    expect: keeperOrMentor(200),
  },
  {
    route: 'PUT /clubs/:clubId/tanks/:tankId/readiness',
    request: (w) => ({
      path: `${tankPath(w)}/readiness`,
      body: { equipmentRunning: true, quarantinePlan: true, foodReady: false },
    }),
    expect: ownerOnly(200),
  },
  // The world's tank is not ready (it has not cycled), so the mentor passes the permission check and meets 409.
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/sign-off',
    request: (w) => ({ path: `${tankPath(w)}/sign-off`, body: {} }),
    expect: mentorOnly(409),
  },
  {
    route: 'DELETE /clubs/:clubId/tanks/:tankId/sign-off',
    request: (w) => ({ path: `${tankPath(w)}/sign-off` }),
    expect: mentorOnly(200),
  },
];
