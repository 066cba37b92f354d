/** Invitations by e-mail into a club. */
export { Invite } from './invite.entity';
export { inviteRouter } from './invite.router';
