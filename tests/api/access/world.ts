import type { DataSource } from 'typeorm';
import { copyProfile } from '../../../server/modules/care/care-profile.service';
import { Invite } from '../../../server/modules/invites/invite.entity';
import { assignMentor, makeClub, makeMember } from '../../helpers/factories';

export const PERSONAS = ['anonymous', 'outsider', 'member', 'mentor', 'otherMentor', 'admin', 'suspended'] as const;
export type Persona = (typeof PERSONAS)[number];

/**
 * One club with every kind of person, and a second club with an outsider:
 * member = a mentee, mentor = that mentee's mentor, otherMentor = a mentor of the same club without that mentee.
 */
export async function buildWorld(ds: DataSource) {
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
    clubId: club.id, email: 'pending@test.example', role: 'member', tokenHash: 'f'.repeat(64), invitedById: admin.user.id,
    expiresAt: new Date(Date.now() + 86_400_000), lastSentAt: new Date(), acceptedAt: null, revokedAt: null,
  });
  const careProfile = await ds.transaction((tx) => copyProfile(tx, { clubId: club.id, basedOn: 'seahorse-large', name: 'Matrix seahorses', actorId: admin.user.id }));
  return {
    club, elsewhere, invite, assignment, spareAssignment, spare, careProfile,
    people: { outsider, member, mentor, otherMentor, admin, suspended } as Record<Exclude<Persona, 'anonymous'>, { user: { email: string; id: string }; membership: { id: string } }>,
  };
}
export type World = Awaited<ReturnType<typeof buildWorld>>;
