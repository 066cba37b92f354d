/** Session and token lifetimes (see README "Security"). */
export const SESSION_IDLE_MINUTES = 120;
export const SESSION_ABSOLUTE_HOURS = 12;
export const INVITE_VALID_DAYS = 7;
export const PASSWORD_RESET_VALID_MINUTES = 30;
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 128;
