import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { MembershipStatus, Role } from '@shared/constants/roles';
import { hashPassword } from '@server/lib/passwords';
import { Club } from '@server/modules/clubs/club.entity';
import { Membership } from '@server/modules/clubs/membership.entity';
import { MentorAssignment } from '@server/modules/mentorship/mentor-assignment.entity';
import { User } from '@server/modules/users/user.entity';
import { DAY_MS } from '@shared/care/time';

export const TEST_PASSWORD = 'correct horse battery';
let cachedHash: Promise<string> | undefined;

export async function makeClub(ds: DataSource, name = 'Test Club'): Promise<Club> {
  return ds
    .getRepository(Club)
    .save({ name, slug: `${name.toLowerCase().replace(/\W+/g, '-')}-${randomUUID().slice(0, 8)}` });
}

export async function makeUser(
  ds: DataSource,
  name: string,
  email = `${name.toLowerCase().replace(/\W+/g, '.')}.${randomUUID().slice(0, 6)}@test.example`,
): Promise<User> {
  const passwordHash = await (cachedHash ??= hashPassword(TEST_PASSWORD));
  return ds.getRepository(User).save({ email, displayName: name, passwordHash, disabledAt: null });
}

export async function makeMember(
  ds: DataSource,
  club: Club,
  name: string,
  role: Role = 'member',
  status: MembershipStatus = 'active',
) {
  const user = await makeUser(ds, name);
  const membership = await ds
    .getRepository(Membership)
    .save({ clubId: club.id, userId: user.id, role, status, mentorCapacity: null });
  return { user, membership };
}

export async function assignMentor(
  ds: DataSource,
  club: Club,
  mentor: User,
  mentee: User,
  endedAt: Date | null = null,
) {
  return ds.getRepository(MentorAssignment).save({
    clubId: club.id,
    mentorId: mentor.id,
    menteeId: mentee.id,
    startedAt: new Date(Date.now() - 90 * DAY_MS),
    endedAt,
    createdById: null,
  });
}
