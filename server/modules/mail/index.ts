/** The development outbox: what the fake mail server caught. */
export { CapturedMail } from './captured-mail.entity';
export { outboxRouter } from './outbox.router';
