import type { Severity } from '@shared/care';

/** Colour plus a shape and a word, so severity never relies on colour alone. */
const LOOK: Record<Severity, { label: string; mark: string; className: string }> = {
  urgent: { label: 'Act now', mark: '▲', className: 'bg-ember-100 text-ember-700 ring-ember-500/40' },
  caution: { label: 'Watch', mark: '◆', className: 'bg-amber-100 text-amber-700 ring-amber-500/40' },
  info: { label: 'Note', mark: '●', className: 'bg-tide-50 text-tide-700 ring-tide-200' },
};

export function SeverityBadge({ severity }: { severity: Severity }) {
  const look = LOOK[severity];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full px-2 py-0.5 text-xs font-extrabold ring-1 ${look.className}`}>
      <span aria-hidden>{look.mark}</span>
      {look.label}
    </span>
  );
}
