import { describe, expect, it } from 'vitest';
import {
  CHECK_RULES,
  OBSERVATION_CHECKS,
  OBSERVATION_SCALE_KEYS,
  OBSERVATION_SCALES,
  SIGN_RULES,
  SOURCES,
  currentSigns,
  observationFindings,
  observationSeverity,
  type ObservationFinding,
  type ObservationInput,
} from '@shared/care';
import { day } from '../helpers';
import { FISH_TANK, SEAHORSE_TANK, forbiddenWordsIn, seen } from './helpers';

// Sign and pattern thresholds: common practice, no source, except where a rule names Koldewey (2005),
// Syngnathid Husbandry in Public Aquariums (seahorse feeding, from memory) or Noga (2010), Fish Disease:
// Diagnosis and Treatment (breathing at the surface; several animals at once; from memory).

const rules = (f: readonly ObservationFinding[]) => f.map((x) => [x.rule, x.severity]);
const find = (f: readonly ObservationFinding[], rule: string) => f.find((x) => x.rule === rule);

describe('observationFindings: not eating', () => {
  const refusedTwoDays = [
    seen(0.8, { animal: 'Yellow seahorse', feedingResponse: 'ignored-food' }, 'a'),
    seen(1.8, { animal: 'Yellow seahorse', feedingResponse: 'spat-out' }, 'b'),
  ];

  it('is urgent when a seahorse on a stocked seahorse tank has eaten nothing two days running (Koldewey 2005)', () => {
    const f = observationFindings(refusedTwoDays, { tank: SEAHORSE_TANK, now: day(2) });
    expect(rules(f)).toEqual([['observation.not-eating', 'urgent']]);
    const finding = f[0]!;
    expect(finding.reason).toBe(
      'Yellow seahorse: no food eaten on 2 days running (since 2025-03-02). Seahorses have no true stomach and need food several times a day, so they weaken fast without it.',
    );
    expect(finding.observationIds).toEqual(['a', 'b']);
    expect(finding.provenance).toBe(SOURCES.koldewey2005);
    expect(finding.nextSteps).toEqual([
      'Go through "What to check next" for this tank.',
      'Ask your mentor now.',
      'If an animal gets worse, ask a veterinarian who knows aquatic animals.',
    ]);
    expect(observationSeverity(refusedTwoDays, { tank: SEAHORSE_TANK, now: day(2) })).toBe('urgent');
  });

  it('is a caution for fish two days running, urgent after four days', () => {
    expect(rules(observationFindings(refusedTwoDays, { tank: FISH_TANK, now: day(2) }))).toEqual([
      ['observation.not-eating', 'caution'],
    ]);
    const fourDays = [
      ...refusedTwoDays,
      seen(4.9, { animal: 'Yellow seahorse', feedingResponse: 'ignored-food' }),
    ];
    expect(rules(observationFindings(fourDays, { tank: FISH_TANK, now: day(5) }))).toEqual([
      ['observation.not-eating', 'urgent'],
    ]);
  });

  it('one refusal, or two on the same day, is a caution about that meal, not "not eating"', () => {
    const sameDay = [
      seen(1, { feedingResponse: 'ignored-food' }),
      seen(1.3, { feedingResponse: 'ignored-food' }),
    ];
    expect(rules(observationFindings(sameDay, { tank: SEAHORSE_TANK, now: day(1.5) }))).toEqual([
      ['observation.feedingResponse.ignored-food', 'caution'],
    ]);
  });

  it('a meal eaten in between starts the count again', () => {
    const obs = [
      seen(0, { feedingResponse: 'ignored-food' }),
      seen(1, { feedingResponse: 'normal' }),
      seen(2, { feedingResponse: 'ignored-food' }),
    ];
    expect(rules(observationFindings(obs, { tank: SEAHORSE_TANK, now: day(2.1) }))).toEqual([
      ['observation.feedingResponse.ignored-food', 'caution'],
    ]);
  });

  it('is followed back beyond the 3-day sign window, but a refusal older than the window with nothing since is not news', () => {
    const long = [
      seen(0, { feedingResponse: 'ignored-food' }),
      seen(2, { feedingResponse: 'ignored-food' }),
      seen(5, { feedingResponse: 'ignored-food' }),
    ];
    expect(
      find(observationFindings(long, { tank: SEAHORSE_TANK, now: day(5.5) }), 'observation.not-eating')
        ?.reason,
    ).toContain('6 days running (since 2025-03-01)');
    expect(observationFindings(long.slice(0, 2), { tank: SEAHORSE_TANK, now: day(6) })).toEqual([]);
  });

  it('counts each animal on its own: two fish each refusing once is not one fish refusing twice', () => {
    const obs = [
      seen(0, { animal: 'Molly', feedingResponse: 'ignored-food' }),
      seen(1, { animal: 'Platy', feedingResponse: 'ignored-food' }),
    ];
    const f = observationFindings(obs, { tank: FISH_TANK, now: day(1.2) });
    expect(find(f, 'observation.not-eating')).toBeUndefined();
    expect(find(f, 'observation.feedingResponse.ignored-food')?.animals).toEqual(['Molly', 'Platy']);
  });

  it('ignores observations after now', () => {
    expect(
      observationFindings([seen(3, { breathing: 'laboured' })], { tank: FISH_TANK, now: day(2) }),
    ).toEqual([]);
  });
});

describe('observationFindings: single signs', () => {
  it('rates every unusual value that has a rule, with its own rule id, and the usual values raise nothing', () => {
    for (const scale of OBSERVATION_SCALE_KEYS) {
      for (const value of OBSERVATION_SCALES[scale]) {
        const rule = (SIGN_RULES[scale] as Record<string, { severity: string } | undefined>)[value];
        const f = observationFindings([seen(1, { [scale]: value })], { tank: FISH_TANK, now: day(1) });
        if (rule)
          expect(rules(f), `${scale}=${value}`).toEqual([[`observation.${scale}.${value}`, rule.severity]]);
        else expect(f, `${scale}=${value}`).toEqual([]);
      }
    }
    for (const check of OBSERVATION_CHECKS) {
      const f = observationFindings([seen(1, { checks: { [check]: true } })], {
        tank: FISH_TANK,
        now: day(1),
      });
      expect(rules(f), check).toEqual([[`observation.check.${check}`, CHECK_RULES[check].severity]]);
    }
  });

  it('gasping at the surface and breathing hard are urgent (Noga 2010), fast breathing a caution', () => {
    expect(
      observationSeverity([seen(1, { breathing: 'at-surface' })], { tank: FISH_TANK, now: day(1) }),
    ).toBe('urgent');
    expect(observationSeverity([seen(1, { breathing: 'laboured' })], { tank: FISH_TANK, now: day(1) })).toBe(
      'urgent',
    );
    expect(observationSeverity([seen(1, { breathing: 'fast' })], { tank: FISH_TANK, now: day(1) })).toBe(
      'caution',
    );
  });

  it('a later observation of the same animal replaces an earlier value; a check recorded as gone stops counting', () => {
    const obs = [
      seen(0, { animal: 'Clownfish', breathing: 'fast', checks: { scratching: true } }),
      seen(1, { animal: 'clownfish ', breathing: 'normal', checks: { scratching: false } }),
    ];
    expect(observationFindings(obs, { tank: FISH_TANK, now: day(1.5) })).toEqual([]);
  });

  it('a check not mentioned again still stands for three days', () => {
    const obs = [seen(0, { checks: { cloudyEyes: true } }), seen(1, { feedingResponse: 'normal' })];
    expect(rules(observationFindings(obs, { tank: FISH_TANK, now: day(2.9) }))).toEqual([
      ['observation.check.cloudyEyes', 'caution'],
    ]);
    expect(observationFindings(obs, { tank: FISH_TANK, now: day(3.1) })).toEqual([]);
  });

  it('scratching once is information; again half a day later it is a caution', () => {
    expect(
      observationSeverity([seen(0, { checks: { scratching: true } })], { tank: FISH_TANK, now: day(0.5) }),
    ).toBe('info');
    const twice = [seen(0, { checks: { scratching: true } }), seen(0.6, { checks: { scratching: true } })];
    const f = observationFindings(twice, { tank: FISH_TANK, now: day(1) });
    expect(rules(f)).toEqual([['observation.check.scratching', 'caution']]);
    expect(f[0]!.reason).toContain('again and again');
  });
});

describe('observationFindings: patterns', () => {
  it('breathing not as usual while staying at the surface is one urgent finding, not three', () => {
    const f = observationFindings([seen(1, { breathing: 'fast', checks: { stayingAtSurface: true } }, 's')], {
      tank: FISH_TANK,
      now: day(1),
    });
    expect(rules(f)).toEqual([['observation.surface-breathing', 'urgent']]);
    expect(f[0]!.observationIds).toEqual(['s']);
  });

  it('cautions on two animals at once add an urgent "several animals" finding naming both (Noga 2010)', () => {
    const obs = [
      seen(1, { animal: 'Molly', spots: 'fine-white-grains' }, 'm'),
      seen(1.1, { animal: 'Platy', fins: 'frayed' }, 'p'),
    ];
    const f = observationFindings(obs, { tank: FISH_TANK, now: day(1.2) });
    expect(rules(f)).toEqual([
      ['observation.several-animals', 'urgent'],
      ['observation.spots.fine-white-grains', 'caution'],
      ['observation.fins.frayed', 'caution'],
    ]);
    expect(f[0]!.animals).toEqual(['Molly', 'Platy']);
    expect(f[0]!.observationIds).toEqual(['m', 'p']);
    expect(f[0]!.provenance).toBe(SOURCES.noga2010);
  });

  it('a caution on "all of them" is several animals too; information-only signs on two animals are not', () => {
    const group = observationFindings(
      [seen(1, { animal: 'The tetras', affected: 'all', hiding: 'always' })],
      { tank: FISH_TANK, now: day(1) },
    );
    expect(rules(group)).toEqual([
      ['observation.several-animals', 'urgent'],
      ['observation.hiding.always', 'caution'],
    ]);
    const mild = [
      seen(1, { animal: 'Molly', colour: 'faded', fins: 'clamped' }),
      seen(1, { animal: 'Platy', hiding: 'more-than-usual' }),
    ];
    expect(rules(observationFindings(mild, { tank: FISH_TANK, now: day(1) }))).toEqual([
      ['observation.fins.clamped', 'info'],
      ['observation.hiding.more-than-usual', 'info'],
    ]);
  });

  it('never names an illness or a medicine', () => {
    const everything: ObservationInput[] = OBSERVATION_SCALE_KEYS.flatMap((scale, i) =>
      OBSERVATION_SCALES[scale].map((value, j) =>
        seen(1 + i * 0.01 + j * 0.001, { animal: `a${i}-${j}`, [scale]: value }),
      ),
    );
    everything.push(seen(1.5, { checks: Object.fromEntries(OBSERVATION_CHECKS.map((c) => [c, true])) }));
    const text = observationFindings(everything, { tank: SEAHORSE_TANK, now: day(2) })
      .flatMap((f) => [f.reason, ...f.nextSteps])
      .join(' ');
    expect(forbiddenWordsIn(text)).toEqual([]);
  });
});

describe('currentSigns', () => {
  it('keeps groups apart by livestock entry, then by the keeper’s words, and names the group as the keeper did', () => {
    const s = currentSigns(
      [
        seen(1, { livestockId: 'L1', animal: 'Pair of seahorses', breathing: 'fast', affected: 'some' }),
        seen(1.1, { animal: 'Pipefish', hiding: 'always' }),
        seen(1.2, { colour: 'darker' }),
      ],
      day(2),
    );
    expect(s.map((x) => [x.key, x.label, x.affected ?? null])).toEqual([
      ['', 'the animals', null],
      ['L1', 'Pair of seahorses', 'some'],
      ['pipefish', 'Pipefish', null],
    ]);
  });
});
