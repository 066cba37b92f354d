import { AuditEvent } from '../modules/audit';
import { PasswordReset } from '../modules/auth';
import { ClubCareProfile, ClubCareProfileVersion } from '../modules/care';
import { Club, Membership } from '../modules/clubs';
import { ConcernRow, TankReadiness } from '../modules/concerns';
import { Invite } from '../modules/invites';
import { CapturedMail } from '../modules/mail';
import { Meetup, MeetupRsvp } from '../modules/meetups';
import { MentorAssignment, MentorRequest } from '../modules/mentorship';
import { Notification, NotificationDigest, NotificationPreference } from '../modules/notifications';
import { Photo } from '../modules/photos';
import { Question, QuestionReply } from '../modules/questions';
import { Livestock, Tank, TankEvent, WaterTest } from '../modules/tanks';
import { User } from '../modules/users';

/** Every TypeORM entity, listed explicitly. */
export const entities: Function[] = [
  User,
  Club,
  Membership,
  Invite,
  PasswordReset,
  MentorAssignment,
  AuditEvent,
  CapturedMail,
  ClubCareProfile,
  ClubCareProfileVersion,
  Tank,
  Livestock,
  WaterTest,
  TankEvent,
  Photo,
  MentorRequest,
  Notification,
  NotificationPreference,
  NotificationDigest,
  ConcernRow,
  TankReadiness,
  Question,
  QuestionReply,
  Meetup,
  MeetupRsvp,
];
