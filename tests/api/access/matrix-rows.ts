import { SEAHORSE_LARGE_PROFILE } from '@shared/care';
import type { UploadFile } from '@tests/helpers/http';
import { CARE_ROWS } from './matrix-care-rows';
import { MENTORSHIP_ROWS } from './matrix-mentorship-rows';
import { MEETUP_ROWS } from './matrix-meetup-rows';
import { QUESTION_ROWS } from './matrix-question-rows';
import { TANK_ROWS } from './matrix-tank-rows';
import { PERSONAS, type Persona, type World } from './world';

/**
 * The rows of the authorization matrix: for every API route, one well-formed request and the exact status each kind
 * of person gets. The matrix test checks them; the hostile-input fuzz starts from the same requests.
 */
export type Expect = Record<Persona, number>;
export interface MatrixRow {
  route: string;
  /** `files` makes it a multipart upload. */
  request: (w: World) => { path: string; body?: unknown; files?: UploadFile[] };
  expect: Expect;
}

const all = (status: number): Expect => Object.fromEntries(PERSONAS.map((p) => [p, status])) as Expect;
const signedInOnly = (status: number): Expect => ({ ...all(status), anonymous: 401 });
/** Any active member of the club; another club's member sees nothing (404); a suspended member is told why (403). */
const clubMembers = (status: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: status,
  mentor: status,
  otherMentor: status,
  admin: status,
  suspended: 403,
});
/** Mentors and admins of the club (both may copy and adjust care profiles). */
const mentorsAndAdmins = (status: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: status,
  otherMentor: status,
  admin: status,
  suspended: 403,
});
const adminsOnly = (status: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: 403,
  otherMentor: 403,
  admin: status,
  suspended: 403,
});

export const MATRIX_ROWS: MatrixRow[] = [
  { route: 'GET /health', request: () => ({ path: '/health' }), expect: all(200) },
  { route: 'GET /csrf', request: () => ({ path: '/csrf' }), expect: all(200) },
  {
    route: 'POST /session',
    request: () => ({ path: '/session', body: { email: 'nobody@test.example', password: 'wrong password' } }),
    expect: all(401),
  },
  { route: 'DELETE /session', request: () => ({ path: '/session' }), expect: all(204) },
  { route: 'GET /me', request: () => ({ path: '/me' }), expect: signedInOnly(200) },
  {
    route: 'PATCH /me',
    request: () => ({ path: '/me', body: { temperatureUnit: 'F' } }),
    expect: signedInOnly(200),
  },
  {
    route: 'POST /password-resets',
    request: (w) => ({
      path: '/password-resets',
      body: { email: `nobody-${w.club.id.slice(0, 8)}@test.example` },
    }),
    expect: all(202),
  },
  {
    route: 'POST /password-resets/confirm',
    request: () => ({
      path: '/password-resets/confirm',
      body: { token: 'x'.repeat(43), password: 'a fine new password' },
    }),
    expect: all(404),
  },
  { route: 'GET /invites/:token', request: () => ({ path: `/invites/${'y'.repeat(43)}` }), expect: all(404) },
  {
    route: 'POST /invites/accept',
    request: () => ({ path: '/invites/accept', body: { token: 'z'.repeat(43) } }),
    expect: all(404),
  },
  {
    route: 'GET /clubs/:clubId',
    request: (w) => ({ path: `/clubs/${w.club.id}` }),
    expect: clubMembers(200),
  },
  {
    route: 'GET /clubs/:clubId/members',
    request: (w) => ({ path: `/clubs/${w.club.id}/members` }),
    expect: clubMembers(200),
  },
  {
    route: 'PATCH /clubs/:clubId/members/:membershipId',
    request: (w) => ({
      path: `/clubs/${w.club.id}/members/${w.people.member.membership.id}`,
      body: { role: 'mentor' },
    }),
    expect: adminsOnly(200),
  },
  {
    route: 'GET /clubs/:clubId/invites',
    request: (w) => ({ path: `/clubs/${w.club.id}/invites` }),
    expect: adminsOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/invites',
    request: (w) => ({
      path: `/clubs/${w.club.id}/invites`,
      body: { email: 'fresh@test.example', role: 'member' },
    }),
    expect: adminsOnly(201),
  },
  {
    route: 'POST /clubs/:clubId/invites/:inviteId/resend',
    request: (w) => ({ path: `/clubs/${w.club.id}/invites/${w.invite.id}/resend` }),
    expect: adminsOnly(200),
  },
  {
    route: 'DELETE /clubs/:clubId/invites/:inviteId',
    request: (w) => ({ path: `/clubs/${w.club.id}/invites/${w.invite.id}` }),
    expect: adminsOnly(204),
  },
  {
    route: 'GET /clubs/:clubId/mentor-assignments',
    request: (w) => ({ path: `/clubs/${w.club.id}/mentor-assignments` }),
    expect: clubMembers(200),
  },
  {
    route: 'POST /clubs/:clubId/mentor-assignments',
    request: (w) => ({
      path: `/clubs/${w.club.id}/mentor-assignments`,
      body: { mentorId: w.people.mentor.user.id, menteeId: w.spare.user.id },
    }),
    expect: adminsOnly(201),
  },
  {
    route: 'POST /clubs/:clubId/mentor-assignments/:assignmentId/end',
    request: (w) => ({ path: `/clubs/${w.club.id}/mentor-assignments/${w.assignment.id}/end` }),
    expect: adminsOnly(200),
  },
  {
    route: 'GET /clubs/:clubId/care-profiles',
    request: (w) => ({ path: `/clubs/${w.club.id}/care-profiles` }),
    expect: clubMembers(200),
  },
  {
    route: 'GET /clubs/:clubId/care-profiles/:key',
    request: (w) => ({ path: `/clubs/${w.club.id}/care-profiles/${w.careProfile.key}` }),
    expect: clubMembers(200),
  },
  {
    route: 'POST /clubs/:clubId/care-profiles',
    request: (w) => ({
      path: `/clubs/${w.club.id}/care-profiles`,
      body: { basedOn: 'reef', name: 'Our reef' },
    }),
    expect: mentorsAndAdmins(201),
  },
  {
    route: 'PUT /clubs/:clubId/care-profiles/:profileId',
    request: (w) => ({
      path: `/clubs/${w.club.id}/care-profiles/${w.careProfile.id}`,
      body: {
        definition: { ...SEAHORSE_LARGE_PROFILE, name: 'Matrix seahorses, warmer' },
        baseVersion: 1,
        note: 'Our fish room runs warm.',
      },
    }),
    expect: mentorsAndAdmins(200),
  },
  // The viewer's own tanks and questions: every member has one (a mentor's or admin's lists only their own).
  {
    route: 'GET /clubs/:clubId/home',
    request: (w) => ({ path: `/clubs/${w.club.id}/home` }),
    expect: clubMembers(200),
  },
  ...TANK_ROWS,
  ...CARE_ROWS,
  ...MENTORSHIP_ROWS,
  ...QUESTION_ROWS,
  ...MEETUP_ROWS,
];
