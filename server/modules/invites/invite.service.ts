import { IsNull, type EntityManager } from 'typeorm';
import type { Role } from '../../../shared/constants/roles';
import { INVITE_VALID_DAYS } from '../../../shared/constants/security';
import { errors } from '../../lib/app-error';
import { hashToken, newToken } from '../../lib/tokens';
import { inviteMail } from '../../mail/templates';
import type { OutgoingMail } from '../../mail/mailer';
import { audit } from '../audit';
import { Club, Membership } from '../clubs';
import { User } from '../users';
import { Invite } from './invite.entity';

const DAY_MS = 86_400_000;

export interface IssuedInvite {
  invite: Invite;
  mail: OutgoingMail;
}

function mailFor(invite: Invite, club: Club, inviterName: string, token: string, baseUrl: string): OutgoingMail {
  const link = `${baseUrl}/invites/accept?token=${encodeURIComponent(token)}`;
  return { to: invite.email, ...inviteMail({ clubName: club.name, inviterName, role: invite.role, link }) };
}

/** Creates (or refreshes) the pending invite for an address; returns the e-mail to queue after commit. */
export async function issueInvite(
  tx: EntityManager,
  p: { clubId: string; email: string; role: Role; inviter: User; baseUrl: string },
): Promise<IssuedInvite> {
  const club = await tx.findOneByOrFail(Club, { id: p.clubId });
  const existingUser = await tx.createQueryBuilder(User, 'u').where('lower(u.email) = :e', { e: p.email }).getOne();
  if (existingUser) {
    const member = await tx.findOneBy(Membership, { clubId: p.clubId, userId: existingUser.id });
    if (member) throw errors.conflict(`${p.email} is already a member of ${club.name}.`);
  }
  const { token, hash } = newToken();
  const now = new Date();
  const expiresAt = new Date(now.getTime() + INVITE_VALID_DAYS * DAY_MS);
  const repo = tx.getRepository(Invite);
  let invite = await repo.findOneBy({ clubId: p.clubId, email: p.email, acceptedAt: IsNull(), revokedAt: IsNull() });
  if (invite) {
    Object.assign(invite, { role: p.role, tokenHash: hash, expiresAt, lastSentAt: now, invitedById: p.inviter.id });
    invite = await repo.save(invite);
  } else {
    invite = await repo.save(
      repo.create({ clubId: p.clubId, email: p.email, role: p.role, tokenHash: hash, invitedById: p.inviter.id, expiresAt, lastSentAt: now, acceptedAt: null, revokedAt: null }),
    );
  }
  await audit(tx, { actorId: p.inviter.id, clubId: p.clubId, action: 'invite.sent', targetType: 'Invite', targetId: invite.id, details: { role: p.role } });
  return { invite, mail: mailFor(invite, club, p.inviter.displayName, token, p.baseUrl) };
}

/** A new token for a pending invite: the old link stops working. */
export async function resendInvite(tx: EntityManager, p: { invite: Invite; inviter: User; baseUrl: string }): Promise<IssuedInvite> {
  if (p.invite.acceptedAt) throw errors.conflict('That invitation was already accepted.');
  if (p.invite.revokedAt) throw errors.conflict('That invitation was withdrawn. Send a new one.');
  return issueInvite(tx, { clubId: p.invite.clubId, email: p.invite.email, role: p.invite.role, inviter: p.inviter, baseUrl: p.baseUrl });
}

/** Finds a usable invite by its token or explains, in words the invitee understands, why it cannot be used. */
export async function findUsableInvite(tx: EntityManager, token: string, lock = false): Promise<Invite> {
  const qb = tx.createQueryBuilder(Invite, 'i').where('i.token_hash = :h', { h: hashToken(token) });
  if (lock) qb.setLock('pessimistic_write');
  const invite = await qb.getOne();
  if (!invite) throw errors.notFound('That invitation');
  if (invite.revokedAt) throw errors.gone('This invitation was withdrawn by the club. Ask the club admin for a new one.');
  if (invite.acceptedAt) throw errors.gone('This invitation was already used. Sign in instead.');
  if (invite.expiresAt.getTime() < Date.now()) throw errors.gone('This invitation has expired. Ask the club admin to send it again.');
  return invite;
}

export function presentInvite(i: Invite) {
  const state = i.acceptedAt ? 'accepted' : i.revokedAt ? 'revoked' : i.expiresAt.getTime() < Date.now() ? 'expired' : 'pending';
  return { id: i.id, clubId: i.clubId, email: i.email, role: i.role, state, expiresAt: i.expiresAt.toISOString(), lastSentAt: i.lastSentAt.toISOString(), createdAt: i.createdAt.toISOString() };
}
