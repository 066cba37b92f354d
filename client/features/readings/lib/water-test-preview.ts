import { evaluateReading, type CareProfile, type Concern, type LastKnown } from '@shared/care';
import { PARAMETER_KEYS, type ParameterKey } from '@shared/care/parameters';
import {
  normalizeWaterTest,
  type NormalizeContext,
  type NormalizedWaterTest,
} from '@shared/readings/normalize-water-test';
import type { TankDetailView } from '@shared/schemas/tank-views';
import { ENTRY_SCHEMAS, type WaterTestEntries } from '@shared/schemas/water-test.schema';
import type { UnitPrefs } from '@client/lib/display-units';
import { localInputToIso } from '@client/lib/form-values';
import { entryInput, isFilled, waterTestFieldOf, type WaterTestDraft } from './water-test-draft';

export interface DraftPreview {
  /** Entries the shared schema refuses as typed (e.g. "pH 80 is not possible — did you mean 8.0?"), by form field. */
  fieldErrors: Record<string, string>;
  /** The shared normalizer's answer for the entries that pass: exactly what the server would store. */
  normalized: NormalizedWaterTest;
}

/** The ISO time a draft is for; an unreadable time previews as now (the schema names the time itself). */
function takenAtOf(draft: WaterTestDraft, now: string): string {
  const iso = localInputToIso(draft.takenAt);
  return Number.isNaN(Date.parse(iso)) ? now : iso;
}

/**
 * Live preview of a draft. Each entry is checked on its own with the shared schema, so one typo does not hide the
 * preview of the others; the rest go through the shared normalizer with the tank's context.
 */
export function previewDraft(draft: WaterTestDraft, prefs: UnitPrefs, ctx: NormalizeContext): DraftPreview {
  const fieldErrors: Record<string, string> = {};
  const accepted: Partial<Record<ParameterKey, unknown>> = {};
  for (const key of PARAMETER_KEYS) {
    const d = draft.entries[key];
    if (!isFilled(d)) continue;
    const parsed = ENTRY_SCHEMAS[key].safeParse(entryInput(key, d, prefs));
    if (parsed.success) {
      accepted[key] = parsed.data;
      continue;
    }
    for (const issue of parsed.error.issues) {
      const field =
        waterTestFieldOf(['entries', key, ...issue.path.map(String)].join('.')) ?? `entries.${key}.value`;
      fieldErrors[field] ??= issue.message;
    }
  }
  const normalized = normalizeWaterTest(
    { takenAt: takenAtOf(draft, ctx.now), entries: accepted as WaterTestEntries },
    ctx,
  );
  for (const e of normalized.errors) {
    const field = waterTestFieldOf(e.path);
    if (field) fieldErrors[field] ??= e.message;
  }
  return { fieldErrors, normalized };
}

/** Messages of one kind for one parameter's fields (value, sample temperature…). */
export const issuesFor = (issues: readonly { path: string; message: string }[], key: ParameterKey) =>
  issues.filter((i) => i.path.startsWith(`entries.${key}.`)).map((i) => i.message);

export type PreviewTank = Pick<TankDetailView, 'systemType' | 'phase' | 'volumeL' | 'hasLivestock'>;

/**
 * What saving a previewed test will flag, by the evaluation the server runs on it, with the same last known
 * temperature, pH and salinity. Trend and schedule rules need the stored history, so only the server adds those.
 */
export function previewConcerns(
  normalized: NormalizedWaterTest,
  p: { tank: PreviewTank; profile: CareProfile; lastKnown: LastKnown; now: string },
): Concern[] {
  const { tank } = p;
  return evaluateReading(
    { id: 'preview', takenAt: normalized.takenAt || p.now, values: normalized.values },
    p.profile,
    {
      tank: {
        volumeL: tank.volumeL,
        phase: tank.phase,
        systemType: tank.systemType,
        hasLivestock: tank.hasLivestock,
      },
      history: [],
      lastKnown: p.lastKnown,
      now: p.now,
    },
  );
}
