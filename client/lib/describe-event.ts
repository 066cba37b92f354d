import {
  DOSE_UNIT_LABELS,
  EQUIPMENT_CHANGE_LABELS,
  OBSERVATION_CHECK_LABELS,
  OBSERVATION_SCALE_LABELS,
  OBSERVATION_VALUE_LABELS,
  SOURCE_WATER_LABELS,
} from '@shared/constants/tank-labels';
import {
  OBSERVATION_CHECKS,
  OBSERVATION_SCALES,
  type TankEventDetails,
} from '@shared/schemas/tank-event.schema';
import type { TankEventView } from '@shared/schemas/tank-views';
import { formatVolume, type UnitPrefs } from './display-units';

const SCALES = Object.keys(OBSERVATION_SCALES) as (keyof typeof OBSERVATION_SCALES)[];

/** What an observation recorded, a line per kind of thing seen. */
export function describeObservation(d: TankEventDetails<'observation'>): string[] {
  const seen = SCALES.flatMap((s) =>
    d[s] ? [`${OBSERVATION_SCALE_LABELS[s]}: ${OBSERVATION_VALUE_LABELS[d[s]!].toLowerCase()}`] : [],
  );
  if (d.breathsPerMinute !== undefined) seen.push(`${d.breathsPerMinute} breaths a minute`);
  const checks = OBSERVATION_CHECKS.filter((c) => d.checks?.[c]).map((c) =>
    OBSERVATION_CHECK_LABELS[c].toLowerCase(),
  );
  return [
    d.animal ? `Watching: ${d.animal}` : '',
    seen.join(' · '),
    checks.length ? `Also seen: ${checks.join(', ')}` : '',
    d.text ?? '',
  ].filter(Boolean);
}

/** What an event says, in a line or a few: "20 L (10 %) of RO/DI fresh water". */
export function describeEvent(e: TankEventView, prefs: Pick<UnitPrefs, 'volumeUnit'>): string[] {
  switch (e.kind) {
    case 'water-change': {
      const d = e.details as TankEventDetails<'water-change'>;
      const litres = e.computed.litres ?? d.volumeL;
      const pct =
        e.computed.fraction !== undefined
          ? ` (${Math.round(e.computed.fraction * 100)} %)`
          : d.percent !== undefined
            ? ` (${d.percent} %)`
            : '';
      return [
        `${litres !== undefined ? `${formatVolume(litres, prefs)}${pct}` : `${d.percent} %`} · ${SOURCE_WATER_LABELS[d.sourceWater]}`,
      ];
    }
    case 'supplement-dose': {
      const d = e.details as TankEventDetails<'supplement-dose'>;
      return [`${d.amount} ${DOSE_UNIT_LABELS[d.unit]} of ${d.product}`];
    }
    case 'feeding-note': {
      const d = e.details as TankEventDetails<'feeding-note'>;
      return [[d.food, d.amount].filter(Boolean).join(': ')];
    }
    case 'equipment-change': {
      const d = e.details as TankEventDetails<'equipment-change'>;
      return [`${d.equipment}: ${EQUIPMENT_CHANGE_LABELS[d.change].toLowerCase()}`];
    }
    case 'livestock-added': {
      const d = e.details as TankEventDetails<'livestock-added'>;
      return [`${d.count} × ${d.speciesCommonName}`];
    }
    case 'livestock-removed': {
      const d = e.details as TankEventDetails<'livestock-removed'>;
      return [`${d.count} × ${d.speciesCommonName}${d.reason ? `: ${d.reason}` : ''}`];
    }
    case 'observation':
      return describeObservation(e.details as TankEventDetails<'observation'>);
  }
}
