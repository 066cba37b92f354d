import type { SystemType } from '@shared/care/system-types';
import type { TankPhase } from '@shared/care/types';
import {
  TANK_SHAPES,
  tankVolume,
  type TankShape,
  type TankVolume,
  type TankVolumeInput,
} from '@shared/chemistry/tank-volume';
import { convert } from '@shared/chemistry/units';
import { CM_PER_INCH, type CreateTankInput, type LENGTH_UNITS } from '@shared/schemas/tank.schema';
import type { TankView } from '@shared/schemas/tank-views';
import { volumeUnitOf, type UnitPrefs } from '@client/lib/display-units';
import { parseDecimal } from '@client/lib/form-values';

type LengthUnit = (typeof LENGTH_UNITS)[number];
const SIDES = ['length', 'width', 'height', 'diameter', 'bowDepth', 'fillHeight'] as const;
type Side = (typeof SIDES)[number];

export interface TankDraft {
  name: string;
  systemType: SystemType;
  setUpOn: string;
  phase: TankPhase;
  equipmentNotes: string;
  careProfileKey: string;
  volume: {
    source: 'entered' | 'dimensions';
    value: string;
    unit: 'L' | 'US gal';
    shape: TankShape;
    lengthUnit: LengthUnit;
    displacementPercent: string;
  } & Record<Side, string>;
}

/** Which measurements a shape takes (the schema refuses the others). */
export const SHAPE_SIDES: Record<TankShape, readonly Side[]> = {
  rectangle: ['length', 'width', 'height', 'fillHeight'],
  cylinder: ['diameter', 'height', 'fillHeight'],
  bowfront: ['length', 'width', 'bowDepth', 'height', 'fillHeight'],
};

const num = (v: number | undefined | null) =>
  v === undefined || v === null ? '' : String(Number(v.toFixed(2)));

export function newTankDraft(prefs: UnitPrefs, systemType: SystemType, careProfileKey: string): TankDraft {
  return {
    name: '',
    systemType,
    setUpOn: '',
    phase: 'cycling',
    equipmentNotes: '',
    careProfileKey,
    volume: {
      source: 'entered',
      value: '',
      unit: volumeUnitOf(prefs),
      shape: TANK_SHAPES[0],
      lengthUnit: prefs.volumeUnit === 'USgal' ? 'in' : 'cm',
      displacementPercent: '',
      length: '',
      width: '',
      height: '',
      diameter: '',
      bowDepth: '',
      fillHeight: '',
    },
  };
}

export function draftFromTank(tank: TankView, prefs: UnitPrefs): TankDraft {
  const draft = newTankDraft(prefs, tank.systemType, tank.careProfileKey);
  Object.assign(draft, {
    name: tank.name,
    setUpOn: tank.setUpOn ?? '',
    phase: tank.phase,
    equipmentNotes: tank.equipmentNotes,
  });
  if (tank.volume.source === 'entered') {
    draft.volume.value = num(convert(tank.volumeL, 'L', draft.volume.unit));
    return draft;
  }
  const v = tank.volume;
  draft.volume = {
    ...draft.volume,
    source: 'dimensions',
    shape: v.shape,
    lengthUnit: 'cm',
    displacementPercent: v.displacementFraction ? num(v.displacementFraction * 100) : '',
  };
  for (const side of ['length', 'width', 'height', 'diameter', 'bowDepth'] as const)
    draft.volume[side] = num(v.dimensionsCm[side]);
  draft.volume.fillHeight = num(v.fillHeightCm);
  return draft;
}

/** The draft as the API's tank input (not yet checked: numbers may be NaN, which the schema names). */
export function tankDraftToInput(d: TankDraft): CreateTankInput {
  const v = d.volume;
  let volume: CreateTankInput['volume'];
  if (v.source === 'entered')
    volume = { source: 'entered', value: parseDecimal(v.value) as number, unit: v.unit };
  else {
    const sides = Object.fromEntries(
      SHAPE_SIDES[v.shape].flatMap((s) => (v[s].trim() === '' ? [] : [[s, parseDecimal(v[s])]])),
    );
    const percent = parseDecimal(v.displacementPercent);
    volume = {
      source: 'dimensions',
      shape: v.shape,
      unit: v.lengthUnit,
      ...sides,
      ...(percent === undefined ? {} : { displacementFraction: percent / 100 }),
    } as CreateTankInput['volume'];
  }
  return {
    name: d.name,
    systemType: d.systemType,
    volume,
    setUpOn: d.setUpOn === '' ? null : d.setUpOn,
    phase: d.phase,
    equipmentNotes: d.equipmentNotes,
    careProfileKey: d.careProfileKey,
  };
}

export function tankFieldOf(path: string): string | null {
  if (['name', 'systemType', 'setUpOn', 'phase', 'equipmentNotes', 'careProfileKey'].includes(path))
    return path;
  if (path === 'volume.displacementFraction') return 'volume.displacementPercent';
  const m = /^volume\.(\w+)$/.exec(path);
  if (!m) return path === 'volume' ? 'volume.value' : null;
  return ['value', 'unit', 'shape', ...SIDES].includes(m[1]!) ? path : null;
}

/** Live gross and net litres from the measurements typed so far; undefined until they make a tank. */
export function previewVolume(d: TankDraft): TankVolume | undefined {
  const v = d.volume;
  if (v.source !== 'dimensions') return undefined;
  const toCm = (s: Side) => {
    const n = parseDecimal(v[s]);
    return n === undefined || Number.isNaN(n) ? undefined : v.lengthUnit === 'in' ? n * CM_PER_INCH : n;
  };
  const dims = Object.fromEntries(
    SHAPE_SIDES[v.shape].filter((s) => s !== 'fillHeight').map((s) => [s, toCm(s)]),
  );
  if (Object.values(dims).some((x) => x === undefined)) return undefined;
  const percent = parseDecimal(v.displacementPercent);
  try {
    return tankVolume({
      shape: v.shape,
      dimensionsCm: dims,
      ...(toCm('fillHeight') !== undefined ? { fillHeightCm: toCm('fillHeight') } : {}),
      displacementFraction: percent === undefined || Number.isNaN(percent) ? 0 : percent / 100,
    } as unknown as TankVolumeInput);
  } catch (error) {
    if (error instanceof RangeError) return undefined;
    throw error;
  }
}
