import type { TankPhase } from '@shared/care/types';
import { TANK_PHASE_LABELS } from '@shared/constants/tank-labels';
import { Badge } from '@client/components/ui/badge';

export function PhaseBadge({ phase }: { phase: TankPhase }) {
  return (
    <Badge
      tone={phase === 'cycling' ? 'watch' : 'ok'}
      mark={phase === 'cycling' ? '↻' : '✓'}
      title={TANK_PHASE_LABELS[phase].hint}
    >
      {TANK_PHASE_LABELS[phase].label}
    </Badge>
  );
}

export function ArchivedBadge() {
  return <Badge tone="neutral">Archived</Badge>;
}
