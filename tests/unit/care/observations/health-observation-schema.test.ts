import { describe, expect, it } from 'vitest';
import {
  OBSERVATION_CHECKS,
  OBSERVATION_SCALES,
  USUAL_VALUES,
  OBSERVATION_SCALE_KEYS,
} from '@shared/care/observations';
import {
  OBSERVATION_AFFECTED_LABELS,
  OBSERVATION_CHECK_LABELS,
  OBSERVATION_SCALE_LABELS,
  OBSERVATION_VALUE_LABELS,
} from '@shared/constants/tank-labels';
import { healthObservationSchema } from '@shared/schemas/health-observation.schema';
import { createTankEventSchema, observationDetailsSchema } from '@shared/schemas/tank-event.schema';

const PHOTO = '0b6f3f3e-8f0e-4c55-9a4f-3f1f5e1b2c3d';

function issues(input: unknown): { path: string; message: string }[] {
  const r = healthObservationSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

describe('healthObservationSchema', () => {
  it('takes one animal with every kind of sign, a photo and a note', () => {
    const input = {
      animal: 'Yellow seahorse',
      affected: 'one',
      feedingResponse: 'spat-out',
      breathing: 'fast',
      breathsPerMinute: 90,
      buoyancy: 'tilted',
      colour: 'faded',
      bodyCondition: 'thin',
      spots: 'dusty-film',
      fins: 'frayed',
      hiding: 'more-than-usual',
      checks: { scratching: true, stayingAtSurface: false },
      photoId: PHOTO,
      text: '  Snicks at mysis, then blows it out.  ',
    };
    const parsed = healthObservationSchema.parse(input);
    expect(parsed).toEqual({ ...input, text: 'Snicks at mysis, then blows it out.' });
  });

  it('refuses an observation that names the animals but records nothing seen', () => {
    expect(issues({ animal: 'All the fish', affected: 'all' })).toEqual([
      { path: '', message: 'Record at least one thing you saw.' },
    ]);
    expect(issues({ animal: 'Clownfish', checks: {} })).toEqual([
      { path: '', message: 'Record at least one thing you saw.' },
    ]);
  });

  it('counts a photo alone as something seen', () => {
    expect(issues({ photoId: PHOTO })).toEqual([]);
  });

  it('names the field and the choices for a value outside the vocabulary', () => {
    expect(issues({ breathing: 'panting' })).toEqual([
      { path: 'breathing', message: 'Choose one of: normal, fast, laboured, at-surface.' },
    ]);
    expect(issues({ affected: 'many' })).toEqual([
      { path: 'affected', message: 'Choose one of: one, some, all.' },
    ]);
  });

  it('refuses unknown fields, unknown checks, a bad photo id and impossible breath counts', () => {
    expect(issues({ breathing: 'fast', diagnosis: 'x' }).map((i) => i.path)).toEqual(['']);
    expect(issues({ breathing: 'fast', checks: { coughing: true } })).toEqual([
      { path: 'checks', message: 'Unrecognized key: "coughing"' },
    ]);
    expect(issues({ photoId: 'photo-1' }).map((i) => i.path)).toEqual(['photoId']);
    expect(issues({ breathsPerMinute: 12.5 })).toEqual([
      { path: 'breathsPerMinute', message: 'Enter a whole number of breaths.' },
    ]);
    expect(issues({ breathsPerMinute: 401 })).toEqual([
      { path: 'breathsPerMinute', message: 'At most 400.' },
    ]);
  });

  it('is the schema of an observation tank event, so observations stored before it still read', () => {
    expect(observationDetailsSchema).toBe(healthObservationSchema);
    // The demo seed's observation, written before body condition, photos and "affected" existed.
    const stored = {
      animal: 'Clownfish',
      feedingResponse: 'normal',
      breathing: 'normal',
      colour: 'normal',
      fins: 'normal',
      hiding: 'normal',
      spots: 'none',
      text: 'Both out and about, eating frozen mysis.',
    };
    const event = createTankEventSchema.parse({
      kind: 'observation',
      occurredAt: '2025-03-04T18:30:00+01:00',
      details: stored,
    });
    expect(event.details).toEqual(stored);
  });
});

describe('observation vocabulary and its words', () => {
  it('has a label for every scale, value, check and "affected" choice, and starts each scale with its usual states', () => {
    for (const s of OBSERVATION_SCALE_KEYS) {
      expect(OBSERVATION_SCALE_LABELS[s]).toBeTruthy();
      // The usual states come first, so the form offers them first.
      expect(OBSERVATION_SCALES[s].slice(0, USUAL_VALUES[s].length)).toEqual(USUAL_VALUES[s]);
      for (const v of OBSERVATION_SCALES[s]) expect(OBSERVATION_VALUE_LABELS[v], `${s}.${v}`).toBeTruthy();
    }
    for (const c of OBSERVATION_CHECKS) expect(OBSERVATION_CHECK_LABELS[c]).toBeTruthy();
    expect(Object.keys(OBSERVATION_AFFECTED_LABELS)).toEqual(['one', 'some', 'all']);
  });

  it('covers what the club asked to record: eating, spitting, not eating; fast breathing; posture; colour; body; skin and fins; hiding, scratching, staying at the surface', () => {
    expect(OBSERVATION_SCALES.feedingResponse).toEqual(
      expect.arrayContaining(['normal', 'spat-out', 'ignored-food']),
    );
    expect(OBSERVATION_SCALES.breathing).toEqual(expect.arrayContaining(['normal', 'fast']));
    expect(OBSERVATION_SCALES.buoyancy).toEqual(expect.arrayContaining(['floating', 'sinking', 'tilted']));
    expect(OBSERVATION_SCALES.bodyCondition).toEqual(expect.arrayContaining(['thin']));
    expect(OBSERVATION_SCALES.spots).toEqual(expect.arrayContaining(['fine-white-grains', 'dusty-film']));
    expect(OBSERVATION_SCALES.fins).toContain('frayed');
    expect(OBSERVATION_CHECKS).toEqual(expect.arrayContaining(['scratching', 'stayingAtSurface']));
    expect(OBSERVATION_SCALES.hiding).toContain('more-than-usual');
  });
});
