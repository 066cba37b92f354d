import { CreateSessionStore1764626000000 } from './1764626000000-create-session-store';
import { AccountsClubsRoles1764627000000 } from './1764627000000-accounts-clubs-roles';
import { SocketIoAttachments1764627500000 } from './1764627500000-socket-io-attachments';
import { TanksReadingsPhotos1764628000000 } from './1764628000000-tanks-readings-photos';
import { ClubCareProfiles1764631000000 } from './1764631000000-club-care-profiles';
import { MentorRequests1764634500000 } from './1764634500000-mentor-requests';
import { Notifications1764634600000 } from './1764634600000-notifications';
import { ConcernsAndReadiness1764635000000 } from './1764635000000-concerns-and-readiness';
import { QuestionsOnReadings1764637000000 } from './1764637000000-questions-on-readings';
import { RateLimitHits1765100000000 } from './1765100000000-rate-limit-hits';
import { IdempotentRequests1765100100000 } from './1765100100000-idempotent-requests';
import { Meetups1765500000000 } from './1765500000000-meetups';

/** Every migration in the order it must run. Never edit a migration once it has landed: add a new one. */
export const migrations = [
  CreateSessionStore1764626000000,
  AccountsClubsRoles1764627000000,
  SocketIoAttachments1764627500000,
  TanksReadingsPhotos1764628000000,
  ClubCareProfiles1764631000000,
  MentorRequests1764634500000,
  Notifications1764634600000,
  ConcernsAndReadiness1764635000000,
  QuestionsOnReadings1764637000000,
  RateLimitHits1765100000000,
  IdempotentRequests1765100100000,
  Meetups1765500000000,
];
