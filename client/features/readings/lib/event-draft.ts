import { convert } from '@shared/chemistry/units';
import { DEFAULT_SG_REFERENCE_TEMP_C } from '@shared/readings/salinity';
import {
  DOSE_UNITS,
  EQUIPMENT_CHANGES,
  OBSERVATION_CHECKS,
  OBSERVATION_SCALES,
  SOURCE_WATER_TYPES,
  type CreateTankEventInput,
} from '@shared/schemas/tank-event.schema';
import { volumeUnitOf, type UnitPrefs } from '@client/lib/display-units';
import { localInputToIso, parseDecimal, toLocalInput, trimmedOrUndefined } from '@client/lib/form-values';

export const POSTED_KINDS = [
  'water-change',
  'supplement-dose',
  'feeding-note',
  'equipment-change',
  'observation',
] as const;
export type PostedKind = (typeof POSTED_KINDS)[number];
type Scale = keyof typeof OBSERVATION_SCALES;
export const SCALES = Object.keys(OBSERVATION_SCALES) as Scale[];

export interface EventDraft {
  kind: PostedKind;
  occurredAt: string;
  note: string;
  waterChange: {
    by: 'volume' | 'percent';
    amount: string;
    sourceWater: (typeof SOURCE_WATER_TYPES)[number];
    nitrate: string;
    nitrateUnit: string;
    salinity: string;
    salinityUnit: string;
    salinityRef: string;
  };
  dose: { product: string; amount: string; unit: (typeof DOSE_UNITS)[number] };
  feeding: { food: string; amount: string };
  equipment: { equipment: string; change: (typeof EQUIPMENT_CHANGES)[number] };
  observation: Record<Scale, string> & {
    animal: string;
    breathsPerMinute: string;
    checks: Record<(typeof OBSERVATION_CHECKS)[number], boolean>;
    text: string;
  };
}

export function newEventDraft(kind: PostedKind, prefs: UnitPrefs, now = new Date()): EventDraft {
  return {
    kind,
    occurredAt: toLocalInput(now),
    note: '',
    waterChange: {
      by: 'percent',
      amount: '',
      sourceWater: SOURCE_WATER_TYPES[1],
      nitrate: '',
      nitrateUnit: 'mg/L NO3',
      salinity: '',
      salinityUnit: prefs.salinityDisplay === 'sg' ? 'SG' : 'ppt',
      salinityRef: String(DEFAULT_SG_REFERENCE_TEMP_C),
    },
    dose: { product: '', amount: '', unit: DOSE_UNITS[0] },
    feeding: { food: '', amount: '' },
    equipment: { equipment: '', change: EQUIPMENT_CHANGES[0] },
    observation: {
      ...(Object.fromEntries(SCALES.map((s) => [s, ''])) as Record<Scale, string>),
      animal: '',
      breathsPerMinute: '',
      checks: Object.fromEntries(
        OBSERVATION_CHECKS.map((c) => [c, false]),
      ) as EventDraft['observation']['checks'],
      text: '',
    },
  };
}

const defined = (o: Record<string, unknown>) =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined && v !== ''));

function waterChangeDetails(w: EventDraft['waterChange'], prefs: UnitPrefs) {
  const amount = parseDecimal(w.amount);
  const gal = volumeUnitOf(prefs) === 'US gal';
  const volumeL =
    w.by === 'volume' && amount !== undefined && !Number.isNaN(amount) && gal
      ? convert(amount, 'US gal', 'L')
      : amount;
  const nitrate = parseDecimal(w.nitrate);
  const salinity = parseDecimal(w.salinity);
  return defined({
    [w.by === 'volume' ? 'volumeL' : 'percent']: w.by === 'volume' ? volumeL : amount,
    sourceWater: w.sourceWater,
    sourceNitrate: nitrate === undefined ? undefined : { value: nitrate, unit: w.nitrateUnit },
    sourceSalinity:
      salinity === undefined
        ? undefined
        : {
            value: salinity,
            unit: w.salinityUnit,
            ...(w.salinityUnit === 'SG' ? { referenceTempC: parseDecimal(w.salinityRef) } : {}),
          },
  });
}

/** The draft as the API's event input for its kind (not yet checked). */
export function eventDraftToInput(d: EventDraft, prefs: UnitPrefs): CreateTankEventInput {
  const o = d.observation;
  const details = {
    'water-change': () => waterChangeDetails(d.waterChange, prefs),
    'supplement-dose': () => ({
      product: d.dose.product,
      amount: parseDecimal(d.dose.amount),
      unit: d.dose.unit,
    }),
    'feeding-note': () => defined({ food: d.feeding.food, amount: trimmedOrUndefined(d.feeding.amount) }),
    'equipment-change': () => ({ equipment: d.equipment.equipment, change: d.equipment.change }),
    observation: () => {
      const checks = Object.fromEntries(Object.entries(o.checks).filter(([, on]) => on));
      return defined({
        animal: trimmedOrUndefined(o.animal),
        ...Object.fromEntries(SCALES.map((s) => [s, o[s] || undefined])),
        breathsPerMinute: parseDecimal(o.breathsPerMinute),
        checks: Object.keys(checks).length ? checks : undefined,
        text: trimmedOrUndefined(o.text),
      });
    },
  }[d.kind]();
  return {
    kind: d.kind,
    occurredAt: localInputToIso(d.occurredAt),
    note: d.note,
    details,
  } as CreateTankEventInput;
}

const DETAIL_FIELDS: Record<PostedKind, Record<string, string>> = {
  'water-change': {
    volumeL: 'waterChange.amount',
    percent: 'waterChange.amount',
    sourceWater: 'waterChange.sourceWater',
    'sourceNitrate.value': 'waterChange.nitrate',
    'sourceSalinity.value': 'waterChange.salinity',
  },
  'supplement-dose': { product: 'dose.product', amount: 'dose.amount', unit: 'dose.unit' },
  'feeding-note': { food: 'feeding.food', amount: 'feeding.amount' },
  'equipment-change': { equipment: 'equipment.equipment', change: 'equipment.change' },
  observation: {
    animal: 'observation.animal',
    breathsPerMinute: 'observation.breathsPerMinute',
    text: 'observation.text',
    ...Object.fromEntries(SCALES.map((s) => [s, `observation.${s}`])),
  },
};

/** API paths → form fields, for the kind on screen. */
export const eventFieldOf =
  (kind: PostedKind) =>
  (path: string): string | null => {
    if (path === 'occurredAt' || path === 'note') return path;
    const m = /^details\.(.+)$/.exec(path);
    return m ? (DETAIL_FIELDS[kind][m[1]!] ?? null) : null;
  };
