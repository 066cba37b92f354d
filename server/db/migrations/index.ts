import { CreateSessionStore1764626000000 } from './1764626000000-create-session-store';
import { AccountsClubsRoles1764627000000 } from './1764627000000-accounts-clubs-roles';
import { SocketIoAttachments1764627500000 } from './1764627500000-socket-io-attachments';
import { ClubCareProfiles1764631000000 } from './1764631000000-club-care-profiles';

/** Every migration in the order it must run. Never edit a migration once it has landed: add a new one. */
export const migrations = [CreateSessionStore1764626000000, AccountsClubsRoles1764627000000, SocketIoAttachments1764627500000, ClubCareProfiles1764631000000];
