import type { EntityManager } from 'typeorm';
import { AuditEvent } from './audit-event.entity';

export interface AuditEntry {
  actorId: string | null;
  clubId?: string | null;
  action: string;
  targetType?: string;
  targetId?: string;
  details?: Record<string, unknown>;
}

/** Records a security-relevant action (sign-in, invite, role change…). Never pass secrets in details. */
export async function audit(manager: EntityManager, entry: AuditEntry): Promise<void> {
  await manager.insert(AuditEvent, {
    actorId: entry.actorId,
    clubId: entry.clubId ?? null,
    action: entry.action,
    targetType: entry.targetType ?? null,
    targetId: entry.targetId ?? null,
    details: (entry.details ?? {}) as object,
  });
}
