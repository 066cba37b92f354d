import { observationFindings } from '../observations/findings';
import { currentSigns, type SubjectSigns } from '../observations/signs';
import { indexTests } from '../test-timeline';
import { toMs } from '../time';
import {
  ASK_MENTOR_AND_VET,
  feeding,
  flowAndEquipment,
  newAnimalsAndQuarantine,
  oxygenAndSurface,
  recentChanges,
  tankMates,
  watchAndLog,
} from './animal-rules';
import type { CheckContext, CheckRule, WhatToCheck, WhatToCheckInput } from './types';
import {
  ammoniaNitriteToday,
  notTestedLately,
  swings,
  temperatureThroughTheDay,
  waterOutOfRange,
} from './water-rules';

/**
 * The order of the list: what can harm the animals fastest and is quickest to check comes first, then
 * what takes longer to look into. A product choice (common practice, no source).
 */
export const CHECK_ORDER: readonly CheckRule[] = [
  oxygenAndSurface,
  waterOutOfRange,
  ammoniaNitriteToday,
  feeding,
  swings,
  temperatureThroughTheDay,
  notTestedLately,
  flowAndEquipment,
  recentChanges,
  newAnimalsAndQuarantine,
  tankMates,
  watchAndLog,
];

function showsSomething(s: SubjectSigns): boolean {
  return Object.keys(s.unusual).length > 0 || Object.keys(s.checks).length > 0 || s.notEating !== null;
}

/**
 * What a keeper should check next, in order and with the reason for each, from the animals' recent
 * observations, the tank's care profile and its tests. It says where to look, never what is wrong, and
 * names no medicine; the list always ends by sending the keeper to their mentor and a veterinarian who
 * knows aquatic animals.
 */
export function whatToCheckNext(input: WhatToCheckInput): WhatToCheck {
  const subjects = currentSigns(input.observations, input.now);
  const ctx: CheckContext = {
    input,
    nowMs: toMs(input.now),
    timeline: indexTests(input.tests),
    subjects,
    findings: observationFindings(input.observations, { tank: input.tank, now: input.now }),
    anySign: subjects.some(showsSomething),
    seahorse: input.tank.systemType === 'seahorse',
  };
  const items = CHECK_ORDER.map((rule) => rule(ctx)).filter((item) => item !== null);
  return { items: [...items, ASK_MENTOR_AND_VET], findings: [...ctx.findings] };
}
