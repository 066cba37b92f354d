import { AuditEvent } from '../modules/audit/audit-event.entity';
import { PasswordReset } from '../modules/auth/password-reset.entity';
import { ClubCareProfile, ClubCareProfileVersion } from '../modules/care/care-profile.entity';
import { Club } from '../modules/clubs/club.entity';
import { Membership } from '../modules/clubs/membership.entity';
import { Invite } from '../modules/invites/invite.entity';
import { CapturedMail } from '../modules/mail/captured-mail.entity';
import { MentorAssignment } from '../modules/mentorship/mentor-assignment.entity';
import { User } from '../modules/users/user.entity';

/** Every TypeORM entity, listed explicitly. */
export const entities: Function[] = [User, Club, Membership, Invite, PasswordReset, MentorAssignment, AuditEvent, CapturedMail, ClubCareProfile, ClubCareProfileVersion];
