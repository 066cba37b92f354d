import type { Persona, World } from './world';

export type Expect = Record<Persona, number>;
export interface MentorshipMatrixRow {
  route: string;
  request: (w: World) => { path: string; body?: unknown };
  expect: Expect;
}

export const all = (s: number): Expect => ({
  anonymous: s,
  outsider: s,
  member: s,
  mentor: s,
  otherMentor: s,
  admin: s,
  suspended: s,
});
export const signedInOnly = (s: number): Expect => ({ ...all(s), anonymous: 401 });
export const clubMembers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: s,
  admin: s,
  suspended: 403,
});
export const adminsOnly = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: 403,
  otherMentor: 403,
  admin: s,
  suspended: 403,
});
const requests = (w: World) => `/clubs/${w.club.id}/mentor-requests`;

export const MENTORSHIP_ROWS: MentorshipMatrixRow[] = [
  {
    route: 'POST /clubs/:clubId/mentor-requests',
    request: (w) => ({ path: requests(w), body: { note: 'Could someone help with my first tank?' } }),
    // The member already has a mentor (409); anyone without one may ask.
    expect: {
      anonymous: 401,
      outsider: 404,
      member: 409,
      mentor: 201,
      otherMentor: 201,
      admin: 201,
      suspended: 403,
    },
  },
  {
    route: 'GET /clubs/:clubId/mentor-requests',
    request: (w) => ({ path: requests(w) }),
    expect: adminsOnly(200),
  },
  {
    route: 'GET /clubs/:clubId/mentor-requests/mine',
    request: (w) => ({ path: `${requests(w)}/mine` }),
    expect: clubMembers(200),
  },
  {
    route: 'POST /clubs/:clubId/mentor-requests/:requestId/accept',
    request: (w) => ({
      path: `${requests(w)}/${w.mentorship.mentorRequest.id}/accept`,
      body: { mentorId: w.people.mentor.user.id },
    }),
    expect: adminsOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/mentor-requests/:requestId/decline',
    request: (w) => ({
      path: `${requests(w)}/${w.mentorship.mentorRequest.id}/decline`,
      body: { reason: 'No mentor free this term.' },
    }),
    expect: adminsOnly(200),
  },
  {
    route: 'PATCH /clubs/:clubId/mentors/:userId/capacity',
    request: (w) => ({
      path: `/clubs/${w.club.id}/mentors/${w.people.mentor.user.id}/capacity`,
      body: { capacity: 3 },
    }),
    // The mentor sets their own; an admin sets anyone's; another mentor may not.
    expect: {
      anonymous: 401,
      outsider: 404,
      member: 403,
      mentor: 200,
      otherMentor: 403,
      admin: 200,
      suspended: 403,
    },
  },
  {
    route: 'GET /me/notifications',
    request: () => ({ path: '/me/notifications' }),
    expect: signedInOnly(200),
  },
  {
    route: 'POST /me/notifications/read-all',
    request: () => ({ path: '/me/notifications/read-all' }),
    expect: signedInOnly(200),
  },
  {
    route: 'POST /me/notifications/:id/read',
    request: (w) => ({ path: `/me/notifications/${w.mentorship.notification.id}/read` }),
    // Only its owner (the member) finds it.
    expect: { ...all(404), anonymous: 401, member: 200 },
  },
  {
    route: 'GET /me/notification-preferences',
    request: () => ({ path: '/me/notification-preferences' }),
    expect: signedInOnly(200),
  },
  {
    route: 'PATCH /me/notification-preferences',
    request: () => ({ path: '/me/notification-preferences', body: { mention: 'off' } }),
    expect: signedInOnly(200),
  },
  // No session needed, so nobody is treated differently: a made-up token is refused for all.
  {
    route: 'GET /unsubscribe',
    request: () => ({ path: '/unsubscribe?token=bm90LmEudG9rZW4.c2lnbmF0dXJl' }),
    expect: all(400),
  },
  {
    route: 'POST /unsubscribe',
    request: () => ({ path: '/unsubscribe?token=bm90LmEudG9rZW4.c2lnbmF0dXJl' }),
    expect: all(400),
  },
];
