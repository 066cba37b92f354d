import type { Deps } from '@server/deps';
import { copyProfile } from '@server/modules/care';
import { Invite } from '@server/modules/invites';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { tankWithHistory } from './world-tanks';
import { mentorshipWorld } from './world-mentorship';
import { questionWorld } from './world-questions';
import { DAY_MS } from '@shared/care/time';
import { meetupWorld } from './world-meetups';

export const PERSONAS = [
  'anonymous',
  'outsider',
  'member',
  'mentor',
  'otherMentor',
  'admin',
  'suspended',
] as const;
export type Persona = (typeof PERSONAS)[number];

/**
 * One club with every kind of person, and a second club with an outsider:
 * member = a mentee, mentor = that mentee's mentor, otherMentor = a mentor of the same club without that mentee
 * (they mentor `spare`). `tank` is the member's, `spareTank` spare's, each with a test, an animal, an event and a photo.
 */
export async function buildWorld(deps: Deps) {
  const ds = deps.dataSource;
  const club = await makeClub(ds, 'Matrix Club');
  const elsewhere = await makeClub(ds, 'Other Club');
  const member = await makeMember(ds, club, 'Mina Member');
  const mentor = await makeMember(ds, club, 'Milo Mentor', 'mentor');
  const otherMentor = await makeMember(ds, club, 'Otto Othermentor', 'mentor');
  const admin = await makeMember(ds, club, 'Ada Admin', 'admin');
  const suspended = await makeMember(ds, club, 'Sid Suspended', 'member', 'suspended');
  const spare = await makeMember(ds, club, 'Spare Member');
  const outsider = await makeMember(ds, elsewhere, 'Olga Outsider');
  const assignment = await assignMentor(ds, club, mentor.user, member.user);
  const spareAssignment = await assignMentor(ds, club, otherMentor.user, spare.user);
  const invite = await ds.getRepository(Invite).save({
    clubId: club.id,
    email: 'pending@test.example',
    role: 'member',
    tokenHash: 'f'.repeat(64),
    invitedById: admin.user.id,
    expiresAt: new Date(Date.now() + DAY_MS),
    lastSentAt: new Date(),
    acceptedAt: null,
    revokedAt: null,
  });
  const careProfile = await ds.transaction((tx) =>
    copyProfile(tx, {
      clubId: club.id,
      basedOn: 'seahorse-large',
      name: 'Matrix seahorses',
      actorId: admin.user.id,
    }),
  );
  // The mentee's tank (read by their mentor and admins) and spare's (read by otherMentor, spare's mentor).
  const tank = await tankWithHistory(deps, club.id, member.user.id, 'Mina reef');
  const spareTank = await tankWithHistory(deps, club.id, spare.user.id, 'Spare reef');
  const mentorship = await mentorshipWorld(ds, club, { member: member.user, mentor: mentor.user });
  const questions = await questionWorld(deps, {
    member: member.user,
    tank: tank.tank,
    waterTest: tank.waterTest,
  });
  const meetups = await meetupWorld(deps, {
    clubId: club.id,
    admin: admin.user,
    mentor: mentor.user,
    member: member.user,
    tank: tank.tank,
  });
  // Animals went in without a sign-off, so the member's tank has at least that concern open.
  const concerns: { id: string }[] = await ds.query(
    `SELECT id FROM concern WHERE tank_id = $1 AND status <> 'resolved' ORDER BY raised_at LIMIT 1`,
    [tank.tank.id],
  );
  const concernId = concerns[0]!.id;
  return {
    club,
    elsewhere,
    invite,
    assignment,
    spareAssignment,
    spare,
    tank,
    spareTank,
    careProfile,
    mentorship,
    concernId,
    questions,
    meetups,
    people: { outsider, member, mentor, otherMentor, admin, suspended } as Record<
      Exclude<Persona, 'anonymous'>,
      { user: { email: string; id: string }; membership: { id: string } }
    >,
  };
}
export type World = Awaited<ReturnType<typeof buildWorld>>;
