import type { ConcernRow } from './concern.entity';

export function presentConcern(c: ConcernRow) {
  const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);
  return {
    id: c.id,
    tankId: c.tankId,
    waterTestId: c.waterTestId,
    rule: c.rule,
    parameter: c.parameter,
    severity: c.severity,
    reason: c.reason,
    nextSteps: c.nextSteps,
    waterChanges: c.waterChanges,
    value: c.value,
    unit: c.unit,
    status: c.status,
    raisedAt: iso(c.raisedAt),
    lastSeenAt: iso(c.lastSeenAt),
    acknowledged: c.acknowledgedAt
      ? { byId: c.acknowledgedById, at: iso(c.acknowledgedAt), note: c.acknowledgeNote }
      : null,
    resolved: c.resolvedAt
      ? { byId: c.resolvedById, at: iso(c.resolvedAt), note: c.resolveNote, byTest: c.resolvedByTest }
      : null,
  };
}
export type ConcernView = ReturnType<typeof presentConcern>;
