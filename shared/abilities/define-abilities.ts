import {
  AbilityBuilder,
  createMongoAbility,
  subject as tagSubject,
  type ForcedSubject,
  type MongoAbility,
  type RawRuleOf,
} from '@casl/ability';
import { packRules, unpackRules, type PackRule } from '@casl/ability/extra';
import { PAST_MENTEE_READ_DAYS, type MembershipStatus, type Role } from '../constants/roles';
import type { Action, SubjectMap, SubjectType } from './subjects';
import { DAY_MS } from '../care/time';

export type TaggedSubjects = { [K in SubjectType]: K | (SubjectMap[K] & ForcedSubject<K>) }[SubjectType];
/** A tagged object (not a type name): what per-object checks and `<Can this={…}>` take. */
export type SubjectInstance = Exclude<TaggedSubjects, string>;
export type AppAbility = MongoAbility<[Action, TaggedSubjects | 'all']>;
export type AppRule = RawRuleOf<AppAbility>;

export interface ViewerMembership {
  clubId: string;
  role: Role;
  status: MembershipStatus;
}

export interface ViewerMentorship {
  clubId: string;
  menteeId: string;
  /** ISO time the assignment ended, or null while it runs. */
  endedAt: string | null;
}

export interface Viewer {
  userId: string;
  memberships: ViewerMembership[];
  mentorships: ViewerMentorship[];
  /** ISO time the rules are built for; past mentees stay readable for a while after it. */
  now: string;
}

const LOGGED_ON_TANK = ['Tank', 'WaterTest', 'TankEvent', 'Photo', 'Concern'] as const;

type Builder = AbilityBuilder<AppAbility>;

function memberRules({ can }: Builder, clubId: string, userId: string): void {
  can('read', 'Club', { id: clubId });
  can('read', 'Membership', { clubId });
  can('read', 'MentorAssignment', { clubId, mentorId: userId });
  can('read', 'MentorAssignment', { clubId, menteeId: userId });
  can(['create', 'read'], 'MentorRequest', { clubId, requesterId: userId });
  // Spelled out rather than 'manage': a keeper must never sign off their own tank or acknowledge on a mentor's behalf.
  for (const s of ['Tank', 'WaterTest', 'TankEvent', 'Photo'] as const)
    can(['create', 'read', 'update', 'delete'], s, { clubId, ownerId: userId });
  can(['read', 'resolve'], 'Concern', { clubId, ownerId: userId });
  can('watch', 'Tank', { clubId, ownerId: userId });
  can(['create', 'read', 'update'], 'Question', { clubId, askerId: userId });
  can(['read', 'rsvp'], 'Meetup', { clubId });
  can('read', 'Attendance', { clubId, userId });
  can('read', 'CareProfile', { clubId: null });
  can('read', 'CareProfile', { clubId });
}

function mentorRules(
  { can }: Builder,
  clubId: string,
  currentMentees: string[],
  pastMentees: string[],
): void {
  const readable = [...currentMentees, ...pastMentees];
  if (readable.length) {
    for (const s of LOGGED_ON_TANK) can('read', s, { clubId, ownerId: { $in: readable } });
    can('read', 'Question', { clubId, askerId: { $in: readable } });
  }
  if (currentMentees.length) {
    const ownerId = { $in: currentMentees };
    can('answer', 'Question', { clubId, askerId: ownerId });
    can(['acknowledge', 'resolve'], 'Concern', { clubId, ownerId });
    can(['signOff', 'watch'], 'Tank', { clubId, ownerId });
  }
  can(['create', 'update'], 'CareProfile', { clubId });
}

function adminRules({ can, cannot }: Builder, clubId: string, userId: string): void {
  can('manage', 'Club', { id: clubId });
  for (const s of [
    'Invite',
    'Membership',
    'MentorAssignment',
    'MentorRequest',
    'MentorSettings',
    'Meetup',
    'CareProfile',
  ] as const)
    can('manage', s, { clubId });
  for (const s of LOGGED_ON_TANK) can('read', s, { clubId });
  can('watch', 'Tank', { clubId });
  can(['read', 'answer'], 'Question', { clubId });
  can('manage', 'Attendance', { clubId });
  // Writing onto a member's tank is the clinic host's alone: 'manage' must not let every admin do it.
  cannot('recordResults', 'Meetup', { clubId, hostId: { $ne: userId } });
}

/**
 * The one definition of who may do what, used by the server (route guards, SQL filters, socket emits)
 * and the client (what to show). A suspended membership grants nothing; clubs are never mixed.
 */
export function defineRulesFor(viewer: Viewer): AppRule[] {
  const builder = new AbilityBuilder<AppAbility>(createMongoAbility);
  builder.can(['read', 'update'], 'User', { id: viewer.userId });
  const now = Date.parse(viewer.now);
  for (const m of viewer.memberships) {
    if (m.status !== 'active') continue;
    memberRules(builder, m.clubId, viewer.userId);
    if (m.role === 'mentor' || m.role === 'admin') {
      const inClub = viewer.mentorships.filter((a) => a.clubId === m.clubId);
      const current = inClub.filter((a) => a.endedAt === null).map((a) => a.menteeId);
      const past = inClub
        .filter((a) => a.endedAt !== null && now - Date.parse(a.endedAt) < PAST_MENTEE_READ_DAYS * DAY_MS)
        .map((a) => a.menteeId)
        .filter((id) => !current.includes(id));
      mentorRules(builder, m.clubId, [...new Set(current)], [...new Set(past)]);
      builder.can('update', 'MentorSettings', { clubId: m.clubId, mentorId: viewer.userId });
      builder.can(['checkIn', 'recordResults'], 'Meetup', { clubId: m.clubId, hostId: viewer.userId });
    }
    if (m.role === 'admin') adminRules(builder, m.clubId, viewer.userId);
  }
  return builder.rules;
}

export function createAbility(rules: AppRule[] = []): AppAbility {
  return createMongoAbility<AppAbility>(rules);
}

export function defineAbilityFor(viewer: Viewer): AppAbility {
  return createAbility(defineRulesFor(viewer));
}

/** Tags a plain object so CASL matches it against the rules of that subject type. */
export function asSubject<K extends SubjectType>(type: K, object: SubjectMap[K]): SubjectInstance {
  return tagSubject(type, { ...object }) as unknown as SubjectInstance;
}

export type PackedRules = PackRule<AppRule>[];
export const packAbilityRules = (rules: AppRule[]): PackedRules => packRules(rules);
export const unpackAbilityRules = (packed: PackedRules): AppRule[] => unpackRules(packed) as AppRule[];
