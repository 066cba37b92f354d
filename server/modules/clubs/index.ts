/** Clubs and their members' roles. */
export { Club } from './club.entity';
export { Membership } from './membership.entity';
export { clubRouter } from './club.router';
