import type { EntityManager } from 'typeorm';
import { utcToClubTime } from '../../../shared/meetups/club-time';
import { createMeetupSchema, type CreateMeetupInput } from '../../../shared/schemas/meetup.schema';
import { createMeetup } from '../../modules/meetups';

const DAY = 86_400_000;

interface DemoMeetup {
  inDays: number;
  input: Omit<CreateMeetupInput, 'startsAt' | 'endsAt'> & { from: string; to: string };
  hostEmail?: string;
  going: string[];
  waiting?: string[];
  notGoing?: string[];
  /** Clinic only: who brings water, in which slot (minutes after the start). */
  samples?: { email: string; afterMinutes: number }[];
}

/** The Harbourlight club's coming meetups; every place, link and name is invented. */
const MEETUPS: DemoMeetup[] = [
  {
    inDays: 9,
    input: {
      kind: 'talk',
      title: 'Reading your first nitrite curve',
      description:
        'Teodor walks through a real (invented) cycle week by week: when nitrite peaks, why it falls, and when the tank is ready for its first animals. Bring your own numbers.',
      from: '19:00',
      to: '21:00',
      placeText: 'Harbourlight community hall, room 2 (an invented place)',
      capacity: 24,
    },
    hostEmail: 'teodor@harbourlight.example',
    going: ['jonah@harbourlight.example', 'ines@harbourlight.example', 'marisol@harbourlight.example'],
    notGoing: ['wendell@harbourlight.example'],
  },
  {
    inDays: 16,
    input: {
      kind: 'clinic',
      title: 'Bring-a-sample water-testing clinic',
      description:
        'Bring a clean, sealed container of tank water. Priya tests ammonia, nitrite, nitrate and pH at the bench and saves the results straight onto your tank.',
      from: '10:00',
      to: '12:00',
      placeText: 'Harbourlight community hall, the back room (an invented place)',
      capacity: 8,
      slotMinutes: 15,
    },
    hostEmail: 'priya@harbourlight.example',
    going: ['jonah@harbourlight.example', 'wendell@harbourlight.example'],
    samples: [{ email: 'jonah@harbourlight.example', afterMinutes: 15 }],
  },
  {
    inDays: 23,
    input: {
      kind: 'online',
      title: 'Online evening: questions about quarantine',
      description:
        'An hour of questions about quarantine tanks for new fish. Ask anything; a vet who knows fish is the one to see when animals look unwell.',
      from: '20:00',
      to: '21:00',
      onlineUrl: 'https://meet.example/harbourlight-quarantine',
      capacity: 40,
    },
    going: ['ines@harbourlight.example'],
  },
  {
    inDays: 37,
    input: {
      kind: 'swap',
      title: 'Plant and frag swap',
      description:
        'Swap cuttings and captive-grown frags. Bring animals only with their paperwork; no wild-caught seahorses.',
      from: '14:00',
      to: '16:00',
      placeText: 'Teodor’s garage, 4 Invented Row (an invented place)',
      mapUrl: 'https://maps.example/invented-row-4',
      capacity: 3,
    },
    hostEmail: 'teodor@harbourlight.example',
    going: ['marisol@harbourlight.example', 'teodor@harbourlight.example', 'ines@harbourlight.example'],
    waiting: ['wendell@harbourlight.example'],
  },
];

/**
 * Answers are written directly, in arrival order: the demo starts with nobody promoted or told anything, so the
 * waitlist path (which e-mails people) has nothing to do here.
 */
async function answer(
  tx: EntityManager,
  meetupId: string,
  userId: string,
  status: 'going' | 'waitlisted' | 'not-going',
  slot?: { at: Date; tankId: string },
): Promise<void> {
  await tx.query(
    `INSERT INTO meetup_rsvp (meetup_id, user_id, status, slot_starts_at, tank_id) VALUES ($1, $2, $3, $4, $5)`,
    [meetupId, userId, status, slot?.at ?? null, slot?.tankId ?? null],
  );
}

export async function seedDemoMeetups(
  tx: EntityManager,
  p: { clubId: string; timeZone: string; people: Record<string, string>; adminEmail: string; now?: Date },
): Promise<void> {
  const now = p.now ?? new Date();
  const id = (email: string) => p.people[email]!;
  for (const m of MEETUPS) {
    const day = utcToClubTime(new Date(now.getTime() + m.inDays * DAY), p.timeZone).slice(0, 10);
    const { from, to, ...rest } = m.input;
    const values = createMeetupSchema.parse({
      ...rest,
      startsAt: `${day}T${from}`,
      endsAt: `${day}T${to}`,
      hostId: m.hostEmail ? id(m.hostEmail) : null,
    });
    const meetup = await createMeetup(tx, {
      clubId: p.clubId,
      timeZone: p.timeZone,
      values,
      actorId: id(p.adminEmail),
      now,
    });
    for (const email of m.going) {
      const sample = m.samples?.find((s) => s.email === email);
      const [tank] = sample
        ? ((await tx.query(
            `SELECT id FROM tank WHERE club_id = $1 AND owner_id = $2 ORDER BY created_at LIMIT 1`,
            [p.clubId, id(email)],
          )) as { id: string }[])
        : [];
      await answer(
        tx,
        meetup.id,
        id(email),
        'going',
        sample && tank
          ? { at: new Date(meetup.startsAt.getTime() + sample.afterMinutes * 60_000), tankId: tank.id }
          : undefined,
      );
    }
    for (const email of m.waiting ?? []) await answer(tx, meetup.id, id(email), 'waitlisted');
    for (const email of m.notGoing ?? []) await answer(tx, meetup.id, id(email), 'not-going');
  }
}
