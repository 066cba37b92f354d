import { AuditEvent } from '../modules/audit/audit-event.entity';
import { PasswordReset } from '../modules/auth/password-reset.entity';
import { ClubCareProfile, ClubCareProfileVersion } from '../modules/care/care-profile.entity';
import { ConcernRow, TankReadiness } from '../modules/concerns/concern.entity';
import { Club } from '../modules/clubs/club.entity';
import { Membership } from '../modules/clubs/membership.entity';
import { Invite } from '../modules/invites/invite.entity';
import { CapturedMail } from '../modules/mail/captured-mail.entity';
import { Meetup, MeetupRsvp } from '../modules/meetups/meetup.entity';
import { MentorAssignment } from '../modules/mentorship/mentor-assignment.entity';
import { MentorRequest } from '../modules/mentorship/mentor-request.entity';
import { Notification } from '../modules/notifications/notification.entity';
import { NotificationDigest } from '../modules/notifications/notification-digest.entity';
import { NotificationPreference } from '../modules/notifications/notification-preference.entity';
import { Photo } from '../modules/photos/photo.entity';
import { Question, QuestionReply } from '../modules/questions/question.entity';
import { Livestock } from '../modules/tanks/livestock.entity';
import { TankEvent } from '../modules/tanks/tank-event.entity';
import { Tank } from '../modules/tanks/tank.entity';
import { WaterTest } from '../modules/tanks/water-test.entity';
import { User } from '../modules/users/user.entity';

/** Every TypeORM entity, listed explicitly. */
export const entities: Function[] = [User, Club, Membership, Invite, PasswordReset, MentorAssignment, AuditEvent, CapturedMail, ClubCareProfile, ClubCareProfileVersion, Tank, Livestock, WaterTest, TankEvent, Photo, MentorRequest, Notification, NotificationPreference, NotificationDigest, ConcernRow, TankReadiness, Question, QuestionReply, Meetup, MeetupRsvp];
