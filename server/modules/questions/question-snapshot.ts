import type { EntityManager } from 'typeorm';
import type { AnyParameterKey } from '@shared/care/parameters';
import type { QuestionSnapshot, SnapshotConcern, SnapshotSubject } from '@shared/schemas/question-views';
import type { TankEventDetails } from '@shared/schemas/tank-event.schema';
import { errors } from '../../lib/app-error';
import { resolveProfile } from '../care';
import { ConcernRow } from '../concerns';
import { TankEvent, valuesOf, WaterTest, type Tank } from '../tanks';

export interface AskedAbout {
  waterTestId?: string;
  eventId?: string;
}

/** The test or observation asked about; an id of another tank, or an event that is not an observation, is bad input. */
async function subjectOf(m: EntityManager, tank: Tank, about: AskedAbout): Promise<SnapshotSubject> {
  if (about.waterTestId) {
    const test = await m.findOneBy(WaterTest, { id: about.waterTestId, tankId: tank.id });
    if (!test)
      throw errors.badRequest('That water test is not on this tank.', [
        { path: 'waterTestId', message: 'No such water test on this tank.' },
      ]);
    return {
      kind: 'water-test',
      waterTestId: test.id,
      takenAt: test.takenAt.toISOString(),
      values: valuesOf(test),
      freeAmmonia: test.freeAmmoniaMgL,
      note: test.note,
    };
  }
  const event = await m.findOneBy(TankEvent, { id: about.eventId!, tankId: tank.id });
  if (!event)
    throw errors.badRequest('That entry is not on this tank.', [
      { path: 'eventId', message: 'No such entry on this tank.' },
    ]);
  if (event.kind !== 'observation')
    throw errors.badRequest('Questions can be about a water test or an observation.', [
      { path: 'eventId', message: 'Choose an observation of the animals.' },
    ]);
  return {
    kind: 'observation',
    eventId: event.id,
    occurredAt: event.occurredAt.toISOString(),
    details: event.details as TankEventDetails<'observation'>,
    note: event.note,
  };
}

function measured(subject: SnapshotSubject): AnyParameterKey[] {
  if (subject.kind !== 'water-test') return [];
  const keys = Object.keys(subject.values) as AnyParameterKey[];
  return subject.freeAmmonia === null ? keys : [...keys, 'freeAmmonia'];
}

/**
 * A copy of what the question is about as it stands now: the figures, the concerns open on the tank and the care
 * profile's version and bands, so editing the test or the profile later never changes what the question showed.
 */
export async function takeSnapshot(
  m: EntityManager,
  tank: Tank,
  about: AskedAbout,
  now = new Date(),
): Promise<QuestionSnapshot> {
  const subject = await subjectOf(m, tank, about);
  const rows = await m
    .createQueryBuilder(ConcernRow, 'c')
    .where("c.tank_id = :tankId AND c.status <> 'resolved'", { tankId: tank.id })
    .orderBy('c.raised_at', 'DESC')
    .getMany();
  const concerns: SnapshotConcern[] = rows.map((c) => ({
    id: c.id,
    rule: c.rule,
    parameter: c.parameter,
    severity: c.severity,
    reason: c.reason,
    nextSteps: c.nextSteps,
    value: c.value,
    unit: c.unit,
    status: c.status as SnapshotConcern['status'],
    raisedAt: c.raisedAt.toISOString(),
  }));
  const profile = await resolveProfile(m, tank.clubId, tank.careProfileKey);
  const ranges: NonNullable<QuestionSnapshot['profile']>['ranges'] = {};
  for (const key of new Set([
    ...measured(subject),
    ...concerns.map((c) => c.parameter).filter((p): p is AnyParameterKey => p !== 'stocking'),
  ])) {
    const range = profile?.ranges[key];
    if (range) ranges[key] = { ideal: range.ideal, caution: range.caution };
  }
  return {
    takenAt: now.toISOString(),
    subject,
    concerns,
    profile: profile
      ? { key: profile.key, version: profile.version, name: profile.name, animals: profile.animals, ranges }
      : null,
    tank: { name: tank.name, systemType: tank.systemType, phase: tank.phase, volumeL: tank.volumeL },
  };
}
