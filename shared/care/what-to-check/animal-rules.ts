import { listOf } from '../evaluation/wording';
import { COMMON_PRACTICE, SOURCES, commonPractice } from '../provenance';
import { DAY_MS, isoDate, toMs } from '../time';
import type { SubjectSigns } from '../observations/signs';
import type { CheckContext, CheckItem, RecentChange } from './types';

/**
 * Thresholds of the animal rules. Common practice, no source: an animal that arrived in the last 30 days
 * may have brought something with it; a change in the last 3 days is the first suspect for new signs.
 */
export const ANIMAL_CHECK_RULES = {
  newAnimalDays: 30,
  recentChangeDays: 3,
  provenance: 'common practice, no source',
} as const;

const some = (ctx: CheckContext, test: (s: SubjectSigns) => boolean) => ctx.subjects.filter(test);

function names(subjects: readonly SubjectSigns[]): string {
  return listOf([...new Set(subjects.map((s) => s.label))]) || 'the animals';
}

export function oxygenAndSurface(ctx: CheckContext): CheckItem | null {
  const seen = some(ctx, (s) => s.unusual.breathing !== undefined || s.checks.stayingAtSurface !== undefined);
  if (seen.length === 0) return null;
  const temperature = ctx.timeline.lastKnown('temperature', ctx.nowMs);
  const warm =
    ctx.input.profile.ranges.temperature &&
    temperature &&
    temperature.value > ctx.input.profile.ranges.temperature.ideal[1];
  return {
    key: 'oxygen-and-surface',
    title: 'Check the water surface is moving and the filter and air pump are running',
    why: `${names(seen)}: breathing is not as usual. Animals breathe hard or stay at the surface when the water gives them too little oxygen or something in it bothers their gills, so the water comes first.${warm ? ' The last temperature was above the range, and warm water holds less oxygen.' : ''}`,
    provenance: SOURCES.noga2010,
  };
}

const FEEDING_SIGNS = new Set(['slow', 'spat-out', 'ignored-food']);

export function feeding(ctx: CheckContext): CheckItem | null {
  const seen = some(
    ctx,
    (s) =>
      s.notEating !== null ||
      FEEDING_SIGNS.has(s.unusual.feedingResponse?.value ?? '') ||
      s.unusual.bodyCondition !== undefined,
  );
  if (seen.length === 0) return null;
  const food = ctx.input.profile.readinessNotes?.food;
  return {
    key: 'feeding',
    title: 'Watch a whole feeding closely',
    why: `${names(seen)}: not eating as usual. Offer a food they have eaten before and watch: do they try and miss, take it and spit it out, or show no interest? Check the food is fresh and small enough for their mouths, and that tank mates are not eating it first.${food ? ` ${food}` : ''}${ctx.seahorse ? ' Seahorses have no true stomach, so missed meals tell on them quickly.' : ''}`,
    provenance: ctx.seahorse ? SOURCES.koldewey2005 : COMMON_PRACTICE,
  };
}

export function flowAndEquipment(ctx: CheckContext): CheckItem | null {
  if (!ctx.anySign) return null;
  return ctx.seahorse
    ? {
        key: 'flow-and-equipment',
        title: 'Check the flow is gentle and they have places to hold on',
        why: 'Seahorses swim weakly: strong flow tires them and blows their food away before they can take it. Check the heater and pumps run as usual too.',
        provenance: COMMON_PRACTICE,
      }
    : {
        key: 'flow-and-equipment',
        title: 'Check the filter, heater and pumps are running as usual',
        why: 'A pump that stopped or a heater stuck on changes the water within hours, before the next test shows it.',
        provenance: COMMON_PRACTICE,
      };
}

function changeText(c: RecentChange): string {
  const what = {
    'water-change': 'water change',
    'supplement-dose': 'dose',
    'equipment-change': 'equipment',
    'feeding-note': 'feeding',
  }[c.kind];
  return `${what} on ${isoDate(c.occurredAt)}${c.summary ? ` (${c.summary})` : ''}`;
}

export function recentChanges(ctx: CheckContext): CheckItem | null {
  if (!ctx.anySign) return null;
  const from = ctx.nowMs - ANIMAL_CHECK_RULES.recentChangeDays * DAY_MS;
  const changes = (ctx.input.recentChanges ?? [])
    .filter((c) => {
      const ms = toMs(c.occurredAt);
      return ms >= from && ms <= ctx.nowMs;
    })
    .sort((a, b) => toMs(a.occurredAt) - toMs(b.occurredAt));
  if (changes.length === 0) return null;
  return {
    key: 'recent-changes',
    title: `Go over what changed in the last ${ANIMAL_CHECK_RULES.recentChangeDays} days: ${changes.map(changeText).join('; ')}`,
    why: 'A change just before the signs began is the first thing to look at: the new water’s temperature and salinity, the dose and how much, equipment put in or moved, a new food.',
    provenance: COMMON_PRACTICE,
  };
}

export function newAnimalsAndQuarantine(ctx: CheckContext): CheckItem | null {
  const from = ctx.nowMs - ANIMAL_CHECK_RULES.newAnimalDays * DAY_MS;
  const recent = (ctx.input.livestock ?? []).filter((l) => {
    const ms = toMs(l.addedOn);
    return !l.removedOn && ms >= from && ms <= ctx.nowMs;
  });
  if (recent.length === 0 || !ctx.anySign) return null;
  const unquarantined = recent.filter((l) => !l.quarantineNotes?.trim());
  const list = recent
    .map((l) => `${l.name} (${Math.floor((ctx.nowMs - toMs(l.addedOn)) / DAY_MS)} days ago)`)
    .join(', ');
  const quarantine = ctx.input.profile.readinessNotes?.quarantine;
  return {
    key: 'new-animals-and-quarantine',
    title: `Think about the newest animals: ${list}`,
    why: `Signs that start after an animal arrives may have come with it, so watch the others closely too.${
      unquarantined.length
        ? ` No quarantine is recorded for ${unquarantined.map((l) => l.name).join(', ')}. ${quarantine ?? 'Keep new animals in a separate quarantine tank before they join the others.'} Ask your mentor before adding more.`
        : ''
    }`,
    provenance: commonPractice('Quarantining new animals is the trade’s usual advice.'),
  };
}

export function tankMates(ctx: CheckContext): CheckItem | null {
  const seen = some(
    ctx,
    (s) =>
      s.unusual.hiding !== undefined || s.unusual.fins?.value === 'frayed' || s.checks.wounds !== undefined,
  );
  if (seen.length === 0) return null;
  return {
    key: 'tank-mates',
    title: 'Watch the tank mates for a while, lights on and off',
    why: `${names(seen)}: hiding, torn fins or wounds can come from being chased or nipped, which is easy to miss in a quick look.`,
    provenance: COMMON_PRACTICE,
  };
}

export function watchAndLog(ctx: CheckContext): CheckItem | null {
  if (!ctx.anySign) return null;
  return {
    key: 'watch-and-log',
    title: 'Watch again tomorrow at the same time and log what you see, with a photo',
    why: 'How signs change from one day to the next tells your mentor far more than one look.',
    provenance: COMMON_PRACTICE,
  };
}

export const ASK_MENTOR_AND_VET: CheckItem = {
  key: 'ask-mentor-and-vet',
  title: 'Ask your mentor, and a veterinarian who knows aquatic animals',
  why: 'This list only says where to look; it cannot tell what is wrong. Show them your observations and tests, and give no medicine without a veterinarian’s advice.',
  provenance: commonPractice('The product’s safety rule: medication only on a veterinarian’s advice.'),
};
