import type { Deps } from '@server/deps';
import { clinicSlots } from '../../../shared/meetups/clinic-slots';
import { utcToClubTime } from '../../../shared/meetups/club-time';
import { createMeetupSchema } from '../../../shared/schemas/meetup.schema';
import { bookSlot, createMeetup, feedUrl, respond } from '../../../server/modules/meetups';
import type { Tank } from '../../../server/modules/tanks';

const DAY = 86_400_000;

/**
 * A water-testing clinic in three days run by `mentor`, which the member is going to with a slot booked for their
 * tank, and the member's calendar link.
 */
export async function meetupWorld(
  deps: Deps,
  p: { clubId: string; admin: { id: string }; mentor: { id: string }; member: { id: string }; tank: Tank },
) {
  const day = utcToClubTime(new Date(Date.now() + 3 * DAY), 'UTC').slice(0, 10);
  const values = createMeetupSchema.parse({
    kind: 'clinic',
    title: 'Matrix clinic',
    startsAt: `${day}T18:00`,
    endsAt: `${day}T20:00`,
    placeText: 'Back room',
    capacity: 10,
    hostId: p.mentor.id,
    slotMinutes: 15,
  });
  const ds = deps.dataSource;
  const clinic = await ds.transaction((tx) =>
    createMeetup(tx, { clubId: p.clubId, timeZone: 'UTC', values, actorId: p.admin.id }),
  );
  const slots = clinicSlots(clinic.startsAt, clinic.endsAt, 15);
  await ds.transaction(async (tx) => {
    await respond(tx, deps, clinic, p.member.id, 'going');
    await bookSlot(tx, clinic, p.member.id, p.tank, slots[0]!);
  });
  const { baseUrl, sessionSecret } = deps.config;
  return {
    clinic,
    freeSlot: slots[1]!,
    memberFeedPath: new URL(feedUrl(baseUrl, sessionSecret, p.member.id, 1)).pathname.replace(/^\/api/, ''),
  };
}
