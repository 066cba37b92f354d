import { Router } from 'express';
import { calendarFeedParams } from '../../../shared/schemas/meetup.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { feedGeneration, verifyFeedToken } from './calendar-feed-token';
import { calendarFile } from './meetup-calendar';
import type { MeetupDeps } from './meetups.router';
import { feedMeetups } from './meetups.queries';

const FEED_PAST_DAYS = 30;

/**
 * The read-only calendar feed a calendar app subscribes to. Mounted before the session and CSRF check: calendar
 * apps carry no cookie, and the signed link is the only credential it takes. Membership is checked on every read.
 */
export function calendarFeedRouter(deps: MeetupDeps): Router {
  const { dataSource, config } = deps;
  const router = Router();
  const feed = { params: calendarFeedParams };
  router.get('/calendar-feeds/:token/meetups.ics', validate(feed), async (_req, res) => {
    const { params } = inputOf(res, feed);
    const claim = verifyFeedToken(config.sessionSecret, params.token);
    if (!claim) throw errors.notFound('That calendar');
    const [user] = (await dataSource.query(
      `SELECT display_name AS "displayName" FROM app_user WHERE id = $1 AND disabled_at IS NULL`,
      [claim.userId],
    )) as { displayName: string }[];
    if (!user || claim.generation !== (await feedGeneration(dataSource.manager, claim.userId)))
      throw errors.notFound('That calendar');
    const rows = await feedMeetups(
      dataSource.manager,
      claim.userId,
      new Date(Date.now() - FEED_PAST_DAYS * 86_400_000),
    );
    const entries = rows.map((r) => ({
      meetup: r.meetup,
      timeZone: r.timeZone,
      clubName: r.clubName,
      url: `${config.baseUrl}/meetups/${r.meetup.id}`,
      waitlisted: r.waitlisted,
    }));
    res
      .type('text/calendar; charset=utf-8')
      .set('Cache-Control', 'private, max-age=300')
      .send(calendarFile(entries, `Shoalwise meetups · ${user.displayName}`));
  });
  return router;
}
