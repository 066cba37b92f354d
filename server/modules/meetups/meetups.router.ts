import { Router, type Request } from 'express';
import type { DataSource } from 'typeorm';
import type { Deps } from '../../deps';
import { asSubject } from '../../../shared/abilities';
import { clubIdParams } from '../../../shared/schemas/common';
import {
  attendanceSchema,
  attendeeParams,
  bookingSchema,
  cancelMeetupSchema,
  createMeetupSchema,
  meetupListQuery,
  meetupParams,
  memberAttendanceParams,
  rsvpSchema,
  updateMeetupSchema,
} from '../../../shared/schemas/meetup.schema';
import type { AttendanceListView, CalendarFeedView } from '../../../shared/schemas/meetup-views';
import { createWaterTestSchema } from '../../../shared/schemas/water-test.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { loadTank, presentWaterTest, requireActive } from '../tanks';
import { feedGeneration, feedUrl, resetFeed } from './calendar-feed-token';
import { calendarFile } from './meetup-calendar';
import type { Meetup } from './meetup.entity';
import { calendarEntryOf } from './meetup-notices';
import {
  attendanceHistory,
  attendanceRows,
  bookedSlots,
  clubTimeZone,
  listMeetups,
  loadMeetup,
  memberName,
  rsvpOf,
  summaryOf,
} from './meetups.queries';
import { presentDetail, presentHistory, presentSummary } from './meetups.presenter';
import {
  cancelMeetup,
  createMeetup,
  recordClinicResult,
  setAttendance,
  updateMeetup,
} from './meetups.service';
import { bookSlot, clearSlot, respond } from './rsvp.service';

/** Routers take the app's one deps object. */
export type MeetupDeps = Pick<Deps, 'dataSource' | 'config' | 'notify' | 'tankChanges'>;

const subjectOf = (m: Pick<Meetup, 'clubId' | 'hostId'>) => ({ clubId: m.clubId, hostId: m.hostId });

/**
 * Meetups of a club: admins plan, edit and cancel them; members answer; the admins and the person running one tick
 * people in; a clinic's mentor records what they measured onto the member's tank.
 */
export function meetupsRouter(deps: MeetupDeps): Router {
  const { dataSource, config } = deps;
  const router = Router();
  const base = '/clubs/:clubId/meetups';
  const one = `${base}/:meetupId`;
  const me = (req: Request) => viewerOf(req).user;

  const detail = async (manager: DataSource['manager'], req: Request, meetup: Meetup) =>
    presentDetail(
      await summaryOf(manager, me(req).id, meetup.id),
      meetup,
      await bookedSlots(manager, meetup.id),
      me(req).id,
    );

  const list = { params: clubIdParams, query: meetupListQuery };
  router.get(base, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const rows = await listMeetups(
      dataSource.manager,
      viewerOf(req).ability,
      me(req).id,
      params.clubId,
      query.when,
    );
    res.json({ meetups: rows.map(presentSummary) });
  });

  const create = { params: clubIdParams, body: createMeetupSchema };
  router.post(base, requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    authorize(req, 'create', 'Meetup', { clubId: params.clubId, hostId: body.hostId });
    const meetup = await dataSource.transaction(async (tx) =>
      createMeetup(tx, {
        clubId: params.clubId,
        timeZone: await clubTimeZone(tx, params.clubId),
        values: body,
        actorId: me(req).id,
      }),
    );
    res.status(201).json({ meetup: await detail(dataSource.manager, req, meetup) });
  });

  const byId = { params: meetupParams };
  router.get(one, requireSignIn, validate(byId), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, byId);
    const meetup = await loadMeetup(dataSource.manager, params.clubId, params.meetupId);
    authorize(req, 'read', 'Meetup', subjectOf(meetup));
    res.json({ meetup: await detail(dataSource.manager, req, meetup) });
  });

  const update = { params: meetupParams, body: updateMeetupSchema };
  router.patch(one, requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    const meetup = await dataSource.transaction(async (tx) => {
      const current = await loadMeetup(tx, params.clubId, params.meetupId, true);
      authorize(req, 'update', 'Meetup', subjectOf(current));
      return updateMeetup(tx, deps, {
        meetup: current,
        timeZone: await clubTimeZone(tx, params.clubId),
        patch: body,
        actorId: me(req).id,
      });
    });
    res.json({ meetup: await detail(dataSource.manager, req, meetup) });
  });

  const cancel = { params: meetupParams, body: cancelMeetupSchema };
  router.post(`${one}/cancel`, requireSignIn, validate(cancel), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, cancel);
    const meetup = await dataSource.transaction(async (tx) => {
      const current = await loadMeetup(tx, params.clubId, params.meetupId, true);
      authorize(req, 'update', 'Meetup', subjectOf(current));
      return cancelMeetup(tx, deps, { meetup: current, reason: body.reason, actorId: me(req).id });
    });
    res.json({ meetup: await detail(dataSource.manager, req, meetup) });
  });

  const rsvp = { params: meetupParams, body: rsvpSchema };
  router.put(`${one}/rsvp`, requireSignIn, validate(rsvp), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, rsvp);
    const meetup = await dataSource.transaction(async (tx) => {
      const current = await loadMeetup(tx, params.clubId, params.meetupId, true);
      authorize(req, 'rsvp', 'Meetup', subjectOf(current));
      await respond(tx, deps, current, me(req).id, body.response);
      return current;
    });
    res.json({ meetup: await detail(dataSource.manager, req, meetup) });
  });

  const booking = { params: meetupParams, body: bookingSchema };
  router.put(`${one}/booking`, requireSignIn, validate(booking), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, booking);
    const meetup = await dataSource.transaction(async (tx) => {
      const current = await loadMeetup(tx, params.clubId, params.meetupId, true);
      authorize(req, 'rsvp', 'Meetup', subjectOf(current));
      const tank = await loadTank(tx, params.clubId, body.tankId);
      // Only your own tank: anyone else's does not exist for this purpose.
      if (tank.ownerId !== me(req).id) throw errors.notFound('That tank of yours');
      requireActive(tank);
      await bookSlot(tx, current, me(req).id, tank, body.slotStartsAt);
      return current;
    });
    res.json({ meetup: await detail(dataSource.manager, req, meetup) });
  });

  router.delete(`${one}/booking`, requireSignIn, validate(byId), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, byId);
    await dataSource.transaction(async (tx) => {
      const current = await loadMeetup(tx, params.clubId, params.meetupId, true);
      authorize(req, 'rsvp', 'Meetup', subjectOf(current));
      await clearSlot(tx, current, me(req).id);
    });
    res.status(204).end();
  });

  router.get(`${one}/attendance`, requireSignIn, validate(byId), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, byId);
    const meetup = await loadMeetup(dataSource.manager, params.clubId, params.meetupId);
    authorize(req, 'checkIn', 'Meetup', subjectOf(meetup));
    const view: AttendanceListView = {
      meetup: presentSummary(await summaryOf(dataSource.manager, me(req).id, meetup.id)),
      rows: await attendanceRows(dataSource.manager, meetup.id),
    };
    res.json(view);
  });

  const tick = { params: attendeeParams, body: attendanceSchema };
  router.put(
    `${one}/attendance/:userId`,
    requireSignIn,
    validate(tick),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, tick);
      await dataSource.transaction(async (tx) => {
        const meetup = await loadMeetup(tx, params.clubId, params.meetupId);
        authorize(req, 'checkIn', 'Meetup', subjectOf(meetup));
        await setAttendance(tx, {
          meetup,
          userId: params.userId,
          present: body.present,
          actorId: me(req).id,
        });
      });
      const row = (await attendanceRows(dataSource.manager, params.meetupId)).find(
        (r) => r.userId === params.userId,
      );
      res.json({ row });
    },
  );

  const result = { params: attendeeParams, body: createWaterTestSchema };
  router.post(
    `${one}/bookings/:userId/water-tests`,
    requireSignIn,
    validate(result),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, result);
      const saved = await dataSource.transaction(async (tx) => {
        const meetup = await loadMeetup(tx, params.clubId, params.meetupId, true);
        authorize(req, 'recordResults', 'Meetup', subjectOf(meetup));
        return recordClinicResult(tx, deps, {
          meetup,
          userId: params.userId,
          input: body,
          host: { id: me(req).id, displayName: me(req).displayName },
        });
      });
      res.status(201).json({ waterTest: presentWaterTest(saved.test, () => []), warnings: saved.warnings });
    },
  );

  router.get(`${one}/calendar.ics`, requireSignIn, validate(byId), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, byId);
    const meetup = await loadMeetup(dataSource.manager, params.clubId, params.meetupId);
    authorize(req, 'read', 'Meetup', subjectOf(meetup));
    const entry = await calendarEntryOf(dataSource.manager, meetup, config.baseUrl);
    const mine = await rsvpOf(dataSource.manager, meetup.id, me(req).id);
    res
      .type('text/calendar; charset=utf-8')
      .set('Content-Disposition', 'attachment; filename="meetup.ics"')
      .send(calendarFile([{ ...entry, waitlisted: mine?.status === 'waitlisted' }], entry.clubName));
  });

  const history = { params: memberAttendanceParams };
  router.get(
    '/clubs/:clubId/members/:userId/attendance',
    requireSignIn,
    validate(history),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, history);
      // Someone else's record is not there for you, just as an unknown id is not (404, not 403).
      if (
        !viewerOf(req).ability.can(
          'read',
          asSubject('Attendance', { clubId: params.clubId, userId: params.userId }),
        )
      )
        throw errors.notFound('That member');
      const name = await memberName(dataSource.manager, params.clubId, params.userId);
      if (!name) throw errors.notFound('That member');
      res.json(
        presentHistory(
          { userId: params.userId, displayName: name },
          await attendanceHistory(dataSource.manager, params.clubId, params.userId),
        ),
      );
    },
  );

  const feedView = (userId: string, generation: number): CalendarFeedView => ({
    url: feedUrl(config.baseUrl, config.sessionSecret, userId, generation),
  });
  router.get('/me/calendar-feed', requireSignIn, async (req, res) => {
    res.json(feedView(me(req).id, await feedGeneration(dataSource.manager, me(req).id)));
  });
  router.post('/me/calendar-feed/reset', requireSignIn, async (req, res) => {
    res.json(feedView(me(req).id, await resetFeed(dataSource.manager, me(req).id)));
  });

  return router;
}
