import { In, IsNull, type EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import type { MentorRequestView, MyMentorRequestView } from '@shared/schemas/notification-views';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { Membership } from '../clubs';
import { User } from '../users';
import { MentorAssignment } from './mentor-assignment.entity';
import { assignMentor } from './assignment.service';
import { MentorRequest } from './mentor-request.entity';

/** Requests with the names of the people in them. */
export async function presentRequests(
  manager: EntityManager,
  rows: MentorRequest[],
): Promise<MentorRequestView[]> {
  const ids = [
    ...new Set(rows.flatMap((r) => [r.requesterId, ...(r.preferredMentorId ? [r.preferredMentorId] : [])])),
  ];
  const users = ids.length
    ? await manager.find(User, { where: { id: In(ids) }, select: { id: true, displayName: true } })
    : [];
  const name = new Map(users.map((u) => [u.id, u.displayName]));
  const person = (userId: string) => ({ userId, displayName: name.get(userId) ?? 'Former member' });
  return rows.map((r) => ({
    id: r.id,
    clubId: r.clubId,
    requester: person(r.requesterId),
    preferredMentor: r.preferredMentorId ? person(r.preferredMentorId) : null,
    note: r.note,
    state: r.state,
    declineReason: r.declineReason,
    decidedAt: r.decidedAt?.toISOString() ?? null,
    assignmentId: r.assignmentId,
    createdAt: r.createdAt.toISOString(),
  }));
}

const isUniqueViolation = (err: unknown) => (err as { code?: string })?.code === '23505';

export async function createMentorRequest(
  tx: EntityManager,
  { notify }: Pick<Deps, 'notify'>,
  p: { clubId: string; requester: User; note?: string; preferredMentorId?: string },
): Promise<MentorRequest> {
  const { clubId, requester } = p;
  if (p.preferredMentorId) {
    const mentor = await tx.findOneBy(Membership, { clubId, userId: p.preferredMentorId });
    if (
      !mentor ||
      mentor.status !== 'active' ||
      mentor.role === 'member' ||
      p.preferredMentorId === requester.id
    ) {
      throw errors.badRequest('Choose one of the club’s mentors, or leave it to the admins.', [
        { path: 'preferredMentorId', message: 'Not an active mentor of this club.' },
      ]);
    }
  }
  if (await tx.existsBy(MentorAssignment, { clubId, menteeId: requester.id, endedAt: IsNull() })) {
    throw errors.conflict('You already have a mentor in this club.');
  }
  const open = () => errors.conflict('You already asked for a mentor. An admin will answer soon.');
  if (await tx.existsBy(MentorRequest, { clubId, requesterId: requester.id, state: 'open' })) throw open();
  let row: MentorRequest;
  try {
    // A savepoint, so a lost race with a second click ends as a 409 and not as an aborted transaction.
    row = await tx.transaction((inner) =>
      inner.save(
        inner.create(MentorRequest, {
          clubId,
          requesterId: requester.id,
          preferredMentorId: p.preferredMentorId ?? null,
          note: p.note ?? '',
          state: 'open',
          declineReason: null,
          decidedById: null,
          decidedAt: null,
          assignmentId: null,
        }),
      ),
    );
  } catch (err) {
    if (isUniqueViolation(err)) throw open();
    throw err;
  }
  await audit(tx, {
    actorId: requester.id,
    clubId,
    action: 'mentor-request.created',
    targetType: 'MentorRequest',
    targetId: row.id,
    details: { preferredMentorId: row.preferredMentorId },
  });
  const admins = await tx.findBy(Membership, { clubId, role: 'admin', status: 'active' });
  await notify(tx, {
    userIds: admins.map((a) => a.userId).filter((id) => id !== requester.id),
    clubId,
    kind: 'mentor-request',
    title: `${requester.displayName} asks for a mentor`,
    body: row.note,
    link: '/club',
    subject: { type: 'MentorRequest', id: row.id },
  });
  return row;
}

/** Locks an open request of the club for answering; 404 if there is none, 409 if it was already answered. */
export async function lockOpenRequest(
  tx: EntityManager,
  clubId: string,
  requestId: string,
): Promise<MentorRequest> {
  const row = await tx.findOne(MentorRequest, {
    where: { id: requestId, clubId },
    lock: { mode: 'pessimistic_write' },
  });
  if (!row) throw errors.notFound('That mentor request');
  if (row.state !== 'open') throw errors.conflict(`That request was already ${row.state}.`);
  return row;
}

export async function declineMentorRequest(
  tx: EntityManager,
  { notify }: Pick<Deps, 'notify'>,
  p: { request: MentorRequest; actorId: string; reason: string },
): Promise<MentorRequest> {
  const { request } = p;
  await tx.update(
    MentorRequest,
    { id: request.id },
    { state: 'declined', declineReason: p.reason, decidedById: p.actorId, decidedAt: new Date() },
  );
  await audit(tx, {
    actorId: p.actorId,
    clubId: request.clubId,
    action: 'mentor-request.declined',
    targetType: 'MentorRequest',
    targetId: request.id,
  });
  await notify(tx, {
    userIds: [request.requesterId],
    clubId: request.clubId,
    kind: 'mentor-request',
    title: 'Your mentor request was declined',
    body: p.reason,
    link: '/',
    subject: { type: 'MentorRequest', id: request.id },
  });
  return tx.findOneByOrFail(MentorRequest, { id: request.id });
}

/** The member's latest request in the club and their current mentor, for the home page. */
export async function myMentorRequest(
  manager: EntityManager,
  clubId: string,
  userId: string,
): Promise<MyMentorRequestView> {
  const latest = await manager.findOne(MentorRequest, {
    where: { clubId, requesterId: userId },
    order: { createdAt: 'DESC' },
  });
  const current = await manager.findOneBy(MentorAssignment, { clubId, menteeId: userId, endedAt: IsNull() });
  const mentor = current
    ? await manager.findOne(User, {
        where: { id: current.mentorId },
        select: { id: true, displayName: true },
      })
    : null;
  return {
    request: latest ? (await presentRequests(manager, [latest]))[0]! : null,
    mentor: mentor ? { userId: mentor.id, displayName: mentor.displayName } : null,
  };
}

/** An admin answers a request with a pairing: the chosen mentor, or the one the member asked for. */
export async function acceptMentorRequest(
  tx: EntityManager,
  deps: Pick<Deps, 'notify'>,
  p: { request: MentorRequest; mentorId?: string; actorId: string },
): Promise<{ assignment: MentorAssignment; request: MentorRequest }> {
  const { request } = p;
  const mentorId = p.mentorId ?? request.preferredMentorId;
  if (!mentorId)
    throw errors.badRequest('Choose a mentor for this member.', [
      { path: 'mentorId', message: 'Choose a mentor.' },
    ]);
  const requester = await tx.findOneBy(Membership, { clubId: request.clubId, userId: request.requesterId });
  if (requester?.status !== 'active')
    throw errors.conflict('That member is no longer active in the club. Decline the request instead.');
  const { assignment } = await assignMentor(tx, deps, {
    clubId: request.clubId,
    mentorId,
    menteeId: request.requesterId,
    actorId: p.actorId,
  });
  return { assignment, request: await tx.findOneByOrFail(MentorRequest, { id: request.id }) };
}
