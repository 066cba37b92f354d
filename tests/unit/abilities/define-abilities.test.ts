import { describe, expect, it } from 'vitest';
import {
  asSubject,
  createAbility,
  defineAbilityFor,
  packAbilityRules,
  unpackAbilityRules,
  type Viewer,
} from '@shared/abilities';

const NOW = '2026-12-01T12:00:00.000Z';
const A = 'club-a';
const B = 'club-b';
const tank = (clubId: string, ownerId: string) => asSubject('Tank', { clubId, ownerId });

function viewer(partial: Partial<Viewer>): Viewer {
  return { userId: 'me', memberships: [], mentorships: [], now: NOW, ...partial };
}

describe('defineAbilityFor', () => {
  it('when a member, then they manage their own tanks in their club and nobody else’s', () => {
    const ability = defineAbilityFor(
      viewer({ memberships: [{ clubId: A, role: 'member', status: 'active' }] }),
    );
    expect(ability.can('update', tank(A, 'me'))).toBe(true);
    expect(ability.can('read', tank(A, 'someone'))).toBe(false);
    expect(ability.can('read', tank(B, 'me'))).toBe(false);
    expect(ability.can('rsvp', asSubject('Meetup', { clubId: A }))).toBe(true);
    expect(ability.can('create', asSubject('Invite', { clubId: A }))).toBe(false);
    // Readiness is a mentor's call: a keeper never signs off their own tank.
    expect(ability.can('signOff', tank(A, 'me'))).toBe(false);
    expect(ability.can('resolve', asSubject('Concern', { clubId: A, ownerId: 'me' }))).toBe(true);
    expect(ability.can('acknowledge', asSubject('Concern', { clubId: A, ownerId: 'me' }))).toBe(false);
  });

  it('when a mentor, then they read current mentees’ tanks, answer, and sign off — but do not edit them', () => {
    const ability = defineAbilityFor(
      viewer({
        memberships: [{ clubId: A, role: 'mentor', status: 'active' }],
        mentorships: [{ clubId: A, menteeId: 'mentee', endedAt: null }],
      }),
    );
    expect(ability.can('read', tank(A, 'mentee'))).toBe(true);
    expect(ability.can('update', tank(A, 'mentee'))).toBe(false);
    expect(ability.can('signOff', tank(A, 'mentee'))).toBe(true);
    expect(ability.can('answer', asSubject('Question', { clubId: A, askerId: 'mentee' }))).toBe(true);
    expect(ability.can('read', tank(A, 'not-my-mentee'))).toBe(false);
  });

  it('when an assignment ended, then the past mentee stays readable for 30 days and then not at all', () => {
    const recent = defineAbilityFor(
      viewer({
        memberships: [{ clubId: A, role: 'mentor', status: 'active' }],
        mentorships: [{ clubId: A, menteeId: 'past', endedAt: '2026-11-20T12:00:00.000Z' }],
      }),
    );
    expect(recent.can('read', tank(A, 'past'))).toBe(true);
    expect(recent.can('signOff', tank(A, 'past'))).toBe(false);
    const old = defineAbilityFor(
      viewer({
        memberships: [{ clubId: A, role: 'mentor', status: 'active' }],
        mentorships: [{ clubId: A, menteeId: 'past', endedAt: '2026-10-30T12:00:00.000Z' }],
      }),
    );
    expect(old.can('read', tank(A, 'past'))).toBe(false);
  });

  it('when an admin of A, then all of A’s tanks are readable and nothing of B', () => {
    const ability = defineAbilityFor(
      viewer({ memberships: [{ clubId: A, role: 'admin', status: 'active' }] }),
    );
    expect(ability.can('read', tank(A, 'anyone'))).toBe(true);
    expect(ability.can('update', tank(A, 'anyone'))).toBe(false);
    expect(ability.can('manage', asSubject('Invite', { clubId: A }))).toBe(true);
    expect(ability.can('read', tank(B, 'anyone'))).toBe(false);
    expect(ability.can('manage', asSubject('Invite', { clubId: B }))).toBe(false);
  });

  it('when a membership is suspended, then it grants nothing in that club but the other club still works', () => {
    const ability = defineAbilityFor(
      viewer({
        memberships: [
          { clubId: A, role: 'admin', status: 'suspended' },
          { clubId: B, role: 'member', status: 'active' },
        ],
      }),
    );
    expect(ability.can('read', asSubject('Club', { id: A }))).toBe(false);
    expect(ability.can('read', tank(A, 'me'))).toBe(false);
    expect(ability.can('read', tank(B, 'me'))).toBe(true);
  });

  it('when rules are packed for the client and unpacked, then the client ability answers the same', () => {
    const server = defineAbilityFor(
      viewer({
        memberships: [{ clubId: A, role: 'mentor', status: 'active' }],
        mentorships: [{ clubId: A, menteeId: 'mentee', endedAt: null }],
      }),
    );
    const client = createAbility(
      unpackAbilityRules(JSON.parse(JSON.stringify(packAbilityRules(server.rules)))),
    );
    for (const owner of ['me', 'mentee', 'x']) {
      for (const action of ['read', 'update', 'signOff'] as const) {
        expect(client.can(action, tank(A, owner))).toBe(server.can(action, tank(A, owner)));
      }
    }
  });
});
