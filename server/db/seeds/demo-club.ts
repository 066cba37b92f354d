import type { DataSource } from 'typeorm';
import { hashPassword } from '../../lib/passwords';
import { Club, Membership } from '../../modules/clubs';
import { MentorAssignment } from '../../modules/mentorship';
import { User } from '../../modules/users';
import { DEMO_CLUBS, DEMO_PASSWORD, DEMO_PEOPLE } from './demo-people';
import { seedDemoMeetups } from './demo-meetups';
import { seedDemoTanks } from './demo-tanks';

/** Seeds the invented demo clubs once; running it again changes nothing. */
export async function seedDemoClub(dataSource: DataSource): Promise<{ created: boolean }> {
  return dataSource.transaction(async (tx) => {
    // One seeder at a time, even if two starts race.
    await tx.query(`SELECT pg_advisory_xact_lock(hashtext('shoalwise-demo-seed'))`);
    if (await tx.existsBy(Club, { slug: DEMO_CLUBS[0].slug })) return { created: false };
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const clubs = new Map<string, Club>();
    for (const c of DEMO_CLUBS) clubs.set(c.slug, await tx.save(tx.create(Club, { ...c })));
    const users = new Map<string, User>();
    for (const p of DEMO_PEOPLE) {
      const user = await tx.save(
        tx.create(User, {
          email: p.email,
          displayName: p.displayName,
          experienceLevel: p.experienceLevel,
          passwordHash,
          timeZone: 'Europe/London',
          disabledAt: null,
        }),
      );
      users.set(p.email, user);
      for (const [slug, role] of Object.entries(p.roles)) {
        await tx.insert(Membership, {
          clubId: clubs.get(slug)!.id,
          userId: user.id,
          role,
          status: 'active',
          mentorCapacity: role === 'member' ? null : 4,
        });
      }
    }
    for (const p of DEMO_PEOPLE) {
      for (const [slug, mentorEmail] of Object.entries(p.mentoredBy ?? {})) {
        await tx.insert(MentorAssignment, {
          clubId: clubs.get(slug)!.id,
          mentorId: users.get(mentorEmail)!.id,
          menteeId: users.get(p.email)!.id,
          startedAt: new Date(),
          endedAt: null,
          createdById: users.get(DEMO_PEOPLE[0]!.email)!.id,
        });
      }
    }
    const ids = Object.fromEntries([...users].map(([email, u]) => [email, u.id]));
    await seedDemoTanks(tx, clubs.get(DEMO_CLUBS[0].slug)!.id, ids);
    await seedDemoMeetups(tx, {
      clubId: clubs.get(DEMO_CLUBS[0].slug)!.id,
      timeZone: DEMO_CLUBS[0].timeZone,
      people: ids,
      adminEmail: DEMO_PEOPLE[0]!.email,
    });
    return { created: true };
  });
}
