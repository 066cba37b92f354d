/** What the permission rules talk about. Field names match the entities' properties (and the SQL field map). */
export interface ClubSubject {
  id: string;
}
export interface MembershipSubject {
  id?: string;
  clubId: string;
  userId: string;
}
export interface InviteSubject {
  id?: string;
  clubId: string;
}
export interface MentorAssignmentSubject {
  id?: string;
  clubId: string;
  mentorId: string;
  menteeId: string;
}
export interface UserSubject {
  id: string;
}
/** Tanks and everything logged on them carry the tank's club and owner. */
export interface OwnedInClub {
  clubId: string;
  ownerId: string;
}
export interface QuestionSubject {
  clubId: string;
  askerId: string;
}
/** hostId: who runs it (a clinic's mentor), or null. */
export interface MeetupSubject {
  clubId: string;
  hostId?: string | null;
}
/** One member's meetup attendance in one club. */
export interface AttendanceSubject {
  clubId: string;
  userId: string;
}
export interface CareProfileSubject {
  clubId: string | null;
}
export interface MentorRequestSubject {
  id?: string;
  clubId: string;
  requesterId: string;
}
/** A mentor's own settings in one club (e.g. how many mentees they take on). */
export interface MentorSettingsSubject {
  clubId: string;
  mentorId: string;
}

export interface SubjectMap {
  Club: ClubSubject;
  Membership: MembershipSubject;
  Invite: InviteSubject;
  MentorAssignment: MentorAssignmentSubject;
  User: UserSubject;
  Tank: OwnedInClub;
  WaterTest: OwnedInClub;
  TankEvent: OwnedInClub;
  Photo: OwnedInClub;
  Concern: OwnedInClub;
  Question: QuestionSubject;
  Meetup: MeetupSubject;
  Attendance: AttendanceSubject;
  CareProfile: CareProfileSubject;
  MentorRequest: MentorRequestSubject;
  MentorSettings: MentorSettingsSubject;
}

export type SubjectType = keyof SubjectMap;
export const SUBJECT_TYPES = [
  'Club',
  'Membership',
  'Invite',
  'MentorAssignment',
  'User',
  'Tank',
  'WaterTest',
  'TankEvent',
  'Photo',
  'Concern',
  'Question',
  'Meetup',
  'Attendance',
  'CareProfile',
  'MentorRequest',
  'MentorSettings',
] as const satisfies readonly SubjectType[];

export const ACTIONS = [
  'manage',
  'create',
  'read',
  'update',
  'delete',
  'answer',
  'acknowledge',
  'resolve',
  'signOff',
  'rsvp',
  /** Tick people in at a meetup; record a clinic's results onto the tank of the member who brought the water. */
  'checkIn',
  'recordResults',
  /** Be told live when a tank changes: its keeper, their current mentor and the club's admins (not past mentors). */
  'watch',
] as const;
export type Action = (typeof ACTIONS)[number];
