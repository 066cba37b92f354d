import type { CareProfile, LastKnown } from '@shared/care';
import type { NormalizedWaterTest } from '@shared/readings/normalize-water-test';
import { SeverityBadge } from '@client/components/ui/severity-badge';
import { previewConcerns, type PreviewTank } from '../../lib/water-test-preview';

/** What saving these readings will flag (see previewConcerns). */
export function ConcernPreview({
  tank,
  profile,
  normalized,
  lastKnown,
}: {
  tank: PreviewTank;
  profile: CareProfile;
  normalized: NormalizedWaterTest;
  lastKnown: LastKnown;
}) {
  if (Object.keys(normalized.values).length === 0) return null;
  const concerns = previewConcerns(normalized, {
    tank,
    profile,
    lastKnown,
    now: new Date().toISOString(),
  }).filter((c) => c.severity !== 'info');
  return (
    <section
      aria-live="polite"
      aria-labelledby="preview-concerns"
      className="rounded-card bg-canvas p-4 ring-1 ring-line"
    >
      <h2 id="preview-concerns" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">
        If you save this
      </h2>
      {concerns.length === 0 ? (
        <p className="mt-1 text-sm text-ok">
          ✔ Nothing here would be flagged against the {profile.name} profile.
        </p>
      ) : (
        <ul className="mt-2 space-y-2">
          {concerns.map((c) => (
            <li key={c.rule} className="text-sm">
              <SeverityBadge severity={c.severity} /> <span className="font-bold text-ink">{c.reason}</span>
              {c.nextSteps[0] ? <span className="block text-ink-muted">{c.nextSteps[0]}</span> : null}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
