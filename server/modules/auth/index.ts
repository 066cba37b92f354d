/** Signing in and out, the session, and password resets. */
export { PasswordReset } from './password-reset.entity';
export { authRouter } from './auth.router';
export { startSignedInSession } from './sessions';
