import type { DataSource } from 'typeorm';
import type { CreateMeetupInput } from '../../../shared/schemas/meetup.schema';
import { utcToClubTime } from '../../../shared/meetups/club-time';
import { Club } from '../../../server/modules/clubs/club.entity';
import { makeClub } from '../../helpers/factories';

export const CLUB_ZONE = 'Europe/London';
const DAY = 86_400_000;

/** A club keeping UK time. */
export async function londonClub(ds: DataSource, name = 'Tideline Keepers'): Promise<Club> {
  const club = await makeClub(ds, name);
  await ds.getRepository(Club).update({ id: club.id }, { timeZone: CLUB_ZONE });
  return { ...club, timeZone: CLUB_ZONE };
}

/** Club wall-clock time `days` from now at hh:mm, as a datetime-local value. */
export function clubTimeIn(days: number, hhmm: string): string {
  return `${utcToClubTime(new Date(Date.now() + days * DAY), CLUB_ZONE).slice(0, 10)}T${hhmm}`;
}

export function talk(overrides: Partial<CreateMeetupInput> = {}): CreateMeetupInput {
  return {
    kind: 'talk',
    title: 'Reading your first nitrite curve',
    description: 'Bring your notebook.',
    startsAt: clubTimeIn(10, '19:00'),
    endsAt: clubTimeIn(10, '21:00'),
    placeText: 'Room 2, the invented community hall',
    capacity: 20,
    ...overrides,
  };
}
