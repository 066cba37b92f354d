/** The mentor desk: the tanks a mentor or admin watches, most in need first. */
export { deskRouter } from './desk.router';
