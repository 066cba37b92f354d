import {
  adminsOnly,
  all,
  clubMembers,
  signedInOnly,
  type Expect,
  type MentorshipMatrixRow,
} from './matrix-mentorship-rows';
import type { World } from './world';

export type MeetupMatrixRow = MentorshipMatrixRow;
/** The clinic is run by `mentor`: they and the club's admins tick people in; other members and mentors may not. */
const hostAndAdmins = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: s,
  otherMentor: 403,
  admin: s,
  suspended: 403,
});
const meetup = (w: World) => `/clubs/${w.club.id}/meetups/${w.meetups.clinic.id}`;
const day = () => new Date(Date.now() - 3_600_000).toISOString();

export const MEETUP_ROWS: MeetupMatrixRow[] = [
  {
    route: 'GET /clubs/:clubId/meetups',
    request: (w) => ({ path: `/clubs/${w.club.id}/meetups` }),
    expect: clubMembers(200),
  },
  {
    route: 'POST /clubs/:clubId/meetups',
    request: (w) => ({
      path: `/clubs/${w.club.id}/meetups`,
      body: {
        kind: 'online',
        title: 'Online chat',
        startsAt: '2099-05-01T19:00',
        endsAt: '2099-05-01T20:00',
        onlineUrl: 'https://meet.example/room',
        capacity: 40,
      },
    }),
    expect: adminsOnly(201),
  },
  {
    route: 'GET /clubs/:clubId/meetups/:meetupId',
    request: (w) => ({ path: meetup(w) }),
    expect: clubMembers(200),
  },
  {
    route: 'PATCH /clubs/:clubId/meetups/:meetupId',
    request: (w) => ({ path: meetup(w), body: { title: 'Matrix clinic, renamed' } }),
    expect: adminsOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/meetups/:meetupId/cancel',
    request: (w) => ({ path: `${meetup(w)}/cancel`, body: { reason: 'Nobody can run it.' } }),
    expect: adminsOnly(200),
  },
  {
    route: 'PUT /clubs/:clubId/meetups/:meetupId/rsvp',
    request: (w) => ({ path: `${meetup(w)}/rsvp`, body: { response: 'going' } }),
    expect: clubMembers(200),
  },
  {
    route: 'PUT /clubs/:clubId/meetups/:meetupId/booking',
    request: (w) => ({
      path: `${meetup(w)}/booking`,
      body: { slotStartsAt: w.meetups.freeSlot, tankId: w.tank.tank.id },
    }),
    // Only your own tank: to everyone else the member's tank is not one of theirs (404).
    expect: {
      anonymous: 401,
      outsider: 404,
      member: 200,
      mentor: 404,
      otherMentor: 404,
      admin: 404,
      suspended: 403,
    },
  },
  {
    route: 'DELETE /clubs/:clubId/meetups/:meetupId/booking',
    request: (w) => ({ path: `${meetup(w)}/booking` }),
    expect: clubMembers(204),
  },
  {
    route: 'GET /clubs/:clubId/meetups/:meetupId/attendance',
    request: (w) => ({ path: `${meetup(w)}/attendance` }),
    expect: hostAndAdmins(200),
  },
  {
    route: 'PUT /clubs/:clubId/meetups/:meetupId/attendance/:userId',
    request: (w) => ({ path: `${meetup(w)}/attendance/${w.people.member.user.id}`, body: { present: true } }),
    expect: hostAndAdmins(200),
  },
  {
    route: 'POST /clubs/:clubId/meetups/:meetupId/bookings/:userId/water-tests',
    request: (w) => ({
      path: `${meetup(w)}/bookings/${w.people.member.user.id}/water-tests`,
      body: { takenAt: day(), entries: { nitrate: { value: 10, unit: 'mg/L NO3' } } },
    }),
    // Writing onto the member's tank is for the clinic's own mentor only, not every admin.
    expect: {
      anonymous: 401,
      outsider: 404,
      member: 403,
      mentor: 201,
      otherMentor: 403,
      admin: 403,
      suspended: 403,
    },
  },
  {
    route: 'GET /clubs/:clubId/meetups/:meetupId/calendar.ics',
    request: (w) => ({ path: `${meetup(w)}/calendar.ics` }),
    expect: clubMembers(200),
  },
  {
    route: 'GET /clubs/:clubId/members/:userId/attendance',
    request: (w) => ({ path: `/clubs/${w.club.id}/members/${w.people.member.user.id}/attendance` }),
    // The member and the club's admins; to anyone else it answers like an unknown member (404).
    expect: {
      anonymous: 401,
      outsider: 404,
      member: 200,
      mentor: 404,
      otherMentor: 404,
      admin: 200,
      suspended: 403,
    },
  },
  {
    route: 'GET /me/calendar-feed',
    request: () => ({ path: '/me/calendar-feed' }),
    expect: signedInOnly(200),
  },
  {
    route: 'POST /me/calendar-feed/reset',
    request: () => ({ path: '/me/calendar-feed/reset' }),
    expect: signedInOnly(200),
  },
  // The signed link is the credential (calendar apps carry no cookie): whoever holds it reads that one feed.
  {
    route: 'GET /calendar-feeds/:token/meetups.ics',
    request: (w) => ({ path: w.meetups.memberFeedPath }),
    expect: all(200),
  },
];
