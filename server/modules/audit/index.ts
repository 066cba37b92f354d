/** The audit trail: who did what security-relevant thing, and when. */
export { AuditEvent } from './audit-event.entity';
export { audit, type AuditEntry } from './audit';
