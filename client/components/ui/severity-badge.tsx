import type { Severity } from '@shared/care';
import { Badge, type Tone } from './badge';

/** Our words and marks for a concern's severity. */
const LOOK: Record<Severity, { label: string; mark: string; tone: Tone }> = {
  urgent: { label: 'Act now', mark: '▲', tone: 'danger' },
  caution: { label: 'Watch', mark: '◆', tone: 'watch' },
  info: { label: 'Note', mark: '●', tone: 'info' },
};

export function SeverityBadge({ severity }: { severity: Severity }) {
  const look = LOOK[severity];
  return (
    <Badge tone={look.tone} mark={look.mark}>
      {look.label}
    </Badge>
  );
}
