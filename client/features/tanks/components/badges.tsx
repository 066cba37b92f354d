import type { TankPhase } from '@shared/care/types';
import { TANK_PHASE_LABELS } from '@shared/constants/tank-labels';

export function PhaseBadge({ phase }: { phase: TankPhase }) {
  const tone = phase === 'cycling' ? 'bg-amber-100 text-amber-700 ring-amber-500/30' : 'bg-kelp-100 text-kelp-700 ring-kelp-500/30';
  return (
    <span title={TANK_PHASE_LABELS[phase].hint} className={`inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-xs font-extrabold ring-1 ${tone}`}>
      <span aria-hidden>{phase === 'cycling' ? '↻' : '✓'}</span>
      {TANK_PHASE_LABELS[phase].label}
    </span>
  );
}

export function ArchivedBadge() {
  return <span className="inline-flex rounded-full bg-sand-200 px-2.5 py-0.5 text-xs font-extrabold text-tide-800">Archived</span>;
}
