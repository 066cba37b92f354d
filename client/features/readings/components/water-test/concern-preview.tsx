import { evaluateReading, type CareProfile, type WaterTestInput } from '@shared/care';
import type { NormalizedWaterTest } from '@shared/readings/normalize-water-test';
import type { TankDetailView } from '@shared/schemas/tank-views';
import { SeverityBadge } from '@client/components/ui/severity-badge';

/**
 * What saving these readings will flag, worked out in the browser by the same evaluation the server runs
 * (trend rules need the stored history, so only the server adds those).
 */
export function ConcernPreview({ tank, profile, normalized }: { tank: Pick<TankDetailView, 'id' | 'systemType' | 'phase' | 'volumeL' | 'hasLivestock'>; profile: CareProfile; normalized: NormalizedWaterTest }) {
  const values = Object.fromEntries(Object.entries(normalized.values).filter(([, v]) => typeof v === 'number')) as WaterTestInput['values'];
  if (Object.keys(values).length === 0) return null;
  const now = new Date().toISOString();
  const concerns = evaluateReading({ id: 'preview', takenAt: normalized.takenAt || now, values }, profile, {
    tank: { volumeL: tank.volumeL, phase: tank.phase, systemType: tank.systemType, hasLivestock: tank.hasLivestock },
    history: [],
    now,
  }).filter((c) => c.severity !== 'info');
  return (
    <section aria-live="polite" aria-labelledby="preview-concerns" className="rounded-card bg-canvas p-4 ring-1 ring-line">
      <h2 id="preview-concerns" className="text-sm font-extrabold uppercase tracking-wide text-ink-muted">If you save this</h2>
      {concerns.length === 0 ? (
        <p className="mt-1 text-sm text-ok">✔ Nothing here would be flagged against the {profile.name} profile.</p>
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
