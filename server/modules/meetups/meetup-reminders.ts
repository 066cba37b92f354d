import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import { REMINDER_HOURS_BEFORE, REMINDER_LATEST_HOURS_BEFORE } from '../../../shared/constants/meetups';
import type { Deps } from '../../deps';
import { Meetup } from './meetup.entity';
import { tellReminder } from './meetup-notices';
import { dueReminders } from './meetups.queries';

export const REMINDER_QUEUE = 'meetup-reminders';
/** Every quarter of an hour: a reminder goes out on the first run once the start is 24 h away or less. */
export const REMINDER_CRON = '*/15 * * * *';

/**
 * Sends every reminder due at `now`. Safe to run concurrently and as often as you like: the claim row (meetup,
 * person, start) and the e-mail job commit together or not at all, so each start is reminded of once per person.
 */
export async function sendDueReminders(
  deps: Pick<Deps, 'dataSource' | 'notify' | 'config'>,
  now = new Date(),
): Promise<{ sent: number }> {
  const { dataSource } = deps;
  const due = await dueReminders(
    dataSource.manager,
    now,
    REMINDER_HOURS_BEFORE,
    REMINDER_LATEST_HOURS_BEFORE,
  );
  const byMeetup = new Map<string, string[]>();
  for (const d of due) byMeetup.set(d.meetupId, [...(byMeetup.get(d.meetupId) ?? []), d.userId]);
  let sent = 0;
  for (const [meetupId, userIds] of byMeetup) {
    sent += await dataSource.transaction(async (tx) => {
      const meetup = await tx.findOneBy(Meetup, { id: meetupId, status: 'scheduled' });
      if (!meetup) return 0;
      // Concurrent runs block on the primary key here; the second gets DO NOTHING once the first commits.
      const claimed: { userId: string }[] = await tx.query(
        `INSERT INTO meetup_reminder (meetup_id, user_id, starts_at)
         SELECT $1, u, $3 FROM unnest($2::uuid[]) AS u
         ON CONFLICT DO NOTHING RETURNING user_id AS "userId"`,
        [meetup.id, userIds, meetup.startsAt],
      );
      await tellReminder(
        tx,
        deps,
        meetup,
        claimed.map((c) => c.userId),
      );
      return claimed.length;
    });
  }
  return { sent };
}

export interface ReminderScheduler {
  stop(): Promise<void>;
}

/** The reminder job on pg-boss, scheduled like the daily digest: the schedule survives restarts, one worker per run. */
export async function startMeetupReminders(p: {
  deps: Pick<Deps, 'dataSource' | 'notify' | 'config'>;
  logger: Logger;
}): Promise<ReminderScheduler> {
  const boss = new PgBoss({
    connectionString: p.deps.config.databaseUrl,
    max: 2,
    application_name: 'shoalwise-meetup-reminders',
  });
  boss.on('error', (err: Error) => p.logger.warn({ err: err.message }, 'meetup reminder scheduler error'));
  await boss.start();
  await boss.createQueue(REMINDER_QUEUE);
  await boss.schedule(REMINDER_QUEUE, REMINDER_CRON, {}, { tz: 'UTC', retryLimit: 2, retryDelay: 60 });
  await boss.work(REMINDER_QUEUE, { pollingIntervalSeconds: 30, batchSize: 1 }, async () => {
    const { sent } = await sendDueReminders(p.deps, new Date());
    if (sent) p.logger.info({ sent }, 'meetup reminders sent');
  });
  return {
    async stop() {
      await boss.stop({ graceful: true, timeout: 5_000, wait: true });
    },
  };
}
