import { IsNull, type EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import type { Role } from '@shared/constants/roles';
import { INVITE_VALID_DAYS } from '@shared/constants/security';
import { errors } from '../../lib/app-error';
import { hashToken, newToken } from '../../lib/tokens';
import { inviteMail } from '../../mail/templates';
import type { OutgoingMail } from '../../mail/mailer';
import { audit } from '../audit';
import { Club, Membership } from '../clubs';
import { User, userByEmail } from '../users';
import { Invite } from './invite.entity';
import { DAY_MS } from '@shared/care/time';

export interface IssuedInvite {
  invite: Invite;
  mail: OutgoingMail;
}

function mailFor(
  invite: Invite,
  club: Club,
  inviterName: string,
  token: string,
  baseUrl: string,
): OutgoingMail {
  const link = `${baseUrl}/invites/accept?token=${encodeURIComponent(token)}`;
  return { to: invite.email, ...inviteMail({ clubName: club.name, inviterName, role: invite.role, link }) };
}

/** Creates (or refreshes) the pending invite for an address; returns the e-mail to queue after commit. */
export async function issueInvite(
  tx: EntityManager,
  p: { clubId: string; email: string; role: Role; inviter: User; baseUrl: string },
): Promise<IssuedInvite> {
  const club = await tx.findOneByOrFail(Club, { id: p.clubId });
  const existingUser = await userByEmail(tx, p.email);
  if (existingUser) {
    const member = await tx.findOneBy(Membership, { clubId: p.clubId, userId: existingUser.id });
    if (member) throw errors.conflict(`${p.email} is already a member of ${club.name}.`);
  }
  const { token, hash } = newToken();
  const now = new Date();
  const expiresAt = new Date(now.getTime() + INVITE_VALID_DAYS * DAY_MS);
  const repo = tx.getRepository(Invite);
  let invite = await repo.findOneBy({
    clubId: p.clubId,
    email: p.email,
    acceptedAt: IsNull(),
    revokedAt: IsNull(),
  });
  if (invite) {
    Object.assign(invite, {
      role: p.role,
      tokenHash: hash,
      expiresAt,
      lastSentAt: now,
      invitedById: p.inviter.id,
    });
    invite = await repo.save(invite);
  } else {
    invite = await repo.save(
      repo.create({
        clubId: p.clubId,
        email: p.email,
        role: p.role,
        tokenHash: hash,
        invitedById: p.inviter.id,
        expiresAt,
        lastSentAt: now,
        acceptedAt: null,
        revokedAt: null,
      }),
    );
  }
  await audit(tx, {
    actorId: p.inviter.id,
    clubId: p.clubId,
    action: 'invite.sent',
    targetType: 'Invite',
    targetId: invite.id,
    details: { role: p.role },
  });
  return { invite, mail: mailFor(invite, club, p.inviter.displayName, token, p.baseUrl) };
}

/** A new token for a pending invite: the old link stops working. */
export async function resendInvite(
  tx: EntityManager,
  p: { invite: Invite; inviter: User; baseUrl: string },
): Promise<IssuedInvite> {
  if (p.invite.acceptedAt) throw errors.conflict('That invitation was already accepted.');
  if (p.invite.revokedAt) throw errors.conflict('That invitation was withdrawn. Send a new one.');
  return issueInvite(tx, {
    clubId: p.invite.clubId,
    email: p.invite.email,
    role: p.invite.role,
    inviter: p.inviter,
    baseUrl: p.baseUrl,
  });
}

/** Finds a usable invite by its token or explains, in words the invitee understands, why it cannot be used. */
export async function findUsableInvite(tx: EntityManager, token: string, lock = false): Promise<Invite> {
  const qb = tx.createQueryBuilder(Invite, 'i').where('i.token_hash = :h', { h: hashToken(token) });
  if (lock) qb.setLock('pessimistic_write');
  const invite = await qb.getOne();
  if (!invite) throw errors.notFound('That invitation');
  if (invite.revokedAt)
    throw errors.gone('This invitation was withdrawn by the club. Ask the club admin for a new one.');
  if (invite.acceptedAt) throw errors.gone('This invitation was already used. Sign in instead.');
  if (invite.expiresAt.getTime() < Date.now())
    throw errors.gone('This invitation has expired. Ask the club admin to send it again.');
  return invite;
}

export function presentInvite(i: Invite) {
  const state = i.acceptedAt
    ? 'accepted'
    : i.revokedAt
      ? 'revoked'
      : i.expiresAt.getTime() < Date.now()
        ? 'expired'
        : 'pending';
  return {
    id: i.id,
    clubId: i.clubId,
    email: i.email,
    role: i.role,
    state,
    expiresAt: i.expiresAt.toISOString(),
    lastSentAt: i.lastSentAt.toISOString(),
    createdAt: i.createdAt.toISOString(),
  };
}

/** Issues (or refreshes) an invite and queues its e-mail once it is committed. */
export async function sendInvite(
  deps: Pick<Deps, 'dataSource' | 'mailer' | 'config'>,
  p: { clubId: string; email: string; role: Role; inviter: User },
): Promise<Invite> {
  const issued = await deps.dataSource.transaction((tx) =>
    issueInvite(tx, { ...p, baseUrl: deps.config.baseUrl }),
  );
  await deps.mailer.enqueue(issued.mail);
  return issued.invite;
}

/** A new link for a pending invite, e-mailed once it is committed. */
export async function sendInviteAgain(
  deps: Pick<Deps, 'dataSource' | 'mailer' | 'config'>,
  p: { invite: Invite; inviter: User },
): Promise<Invite> {
  const issued = await deps.dataSource.transaction((tx) =>
    resendInvite(tx, { ...p, baseUrl: deps.config.baseUrl }),
  );
  await deps.mailer.enqueue(issued.mail);
  return issued.invite;
}

/** Withdraws a pending invite (audited); withdrawing twice changes nothing, an accepted one cannot be. */
export async function revokeInvite(m: EntityManager, invite: Invite, actorId: string): Promise<void> {
  if (invite.acceptedAt) throw errors.conflict('That invitation was already accepted.');
  if (invite.revokedAt) return;
  await m.update(Invite, { id: invite.id }, { revokedAt: new Date() });
  await audit(m, {
    actorId,
    clubId: invite.clubId,
    action: 'invite.revoked',
    targetType: 'Invite',
    targetId: invite.id,
  });
}

/** What the accept page shows before the invitee commits to anything. */
export async function invitePreview(m: EntityManager, token: string) {
  const invite = await findUsableInvite(m, token);
  const club = await m.findOneByOrFail(Club, { id: invite.clubId });
  const account = await userByEmail(m, invite.email);
  return {
    clubName: club.name,
    email: invite.email,
    role: invite.role,
    accountExists: account !== null,
    expiresAt: invite.expiresAt.toISOString(),
  };
}

/**
 * Accepts an invite: the invitee's existing account (they must be signed in as it) or a new one joins the club with
 * the invite's role. Returns who to sign in and into which club.
 */
export async function acceptInvite(
  tx: EntityManager,
  p: { token: string; displayName?: string; passwordHash?: string; signedInId?: string },
): Promise<{ user: User; clubId: string }> {
  const invite = await findUsableInvite(tx, p.token, true);
  let user = await userByEmail(tx, invite.email);
  if (user) {
    if (p.signedInId !== user.id)
      throw errors.unauthenticated(`Sign in as ${invite.email} first, then open the link again.`);
  } else {
    const issues = [
      ...(!p.displayName ? [{ path: 'displayName', message: 'Enter your name.' }] : []),
      ...(!p.passwordHash ? [{ path: 'password', message: 'Choose a password.' }] : []),
    ];
    if (issues.length) throw errors.badRequest('Some fields need attention.', issues);
    user = await tx.save(
      tx.create(User, {
        email: invite.email,
        displayName: p.displayName!,
        passwordHash: p.passwordHash!,
        disabledAt: null,
      }),
    );
  }
  const existing = await tx.findOneBy(Membership, { clubId: invite.clubId, userId: user.id });
  if (!existing)
    await tx.insert(Membership, {
      clubId: invite.clubId,
      userId: user.id,
      role: invite.role,
      status: 'active',
      mentorCapacity: null,
    });
  await tx.update(Invite, { id: invite.id }, { acceptedAt: new Date() });
  await audit(tx, {
    actorId: user.id,
    clubId: invite.clubId,
    action: 'invite.accepted',
    targetType: 'Invite',
    targetId: invite.id,
  });
  return { user, clubId: invite.clubId };
}
