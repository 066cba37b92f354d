import { describe, expect, it } from 'vitest';
import { asSubject, defineAbilityFor, type Viewer } from '@shared/abilities';

const A = 'club-a';
const B = 'club-b';
const viewer = (partial: Partial<Viewer>): Viewer => ({
  userId: 'me',
  memberships: [],
  mentorships: [],
  now: '2026-12-01T12:00:00.000Z',
  ...partial,
});
const request = (clubId: string, requesterId: string) => asSubject('MentorRequest', { clubId, requesterId });
const settings = (clubId: string, mentorId: string) => asSubject('MentorSettings', { clubId, mentorId });

describe('mentor requests and mentor settings in the rules', () => {
  it('when a member, then they ask for and read their own request, and answer none', () => {
    const ability = defineAbilityFor(
      viewer({ memberships: [{ clubId: A, role: 'member', status: 'active' }] }),
    );
    expect(ability.can('create', request(A, 'me'))).toBe(true);
    expect(ability.can('read', request(A, 'me'))).toBe(true);
    expect(ability.can('update', request(A, 'me'))).toBe(false);
    expect(ability.can('read', request(A, 'someone'))).toBe(false);
    expect(ability.can('create', request(B, 'me'))).toBe(false);
    expect(ability.can('update', settings(A, 'me'))).toBe(false);
  });

  it('when a mentor, then they change their own settings only, and answer no requests', () => {
    const ability = defineAbilityFor(
      viewer({ memberships: [{ clubId: A, role: 'mentor', status: 'active' }] }),
    );
    expect(ability.can('update', settings(A, 'me'))).toBe(true);
    expect(ability.can('update', settings(A, 'other-mentor'))).toBe(false);
    expect(ability.can('update', settings(B, 'me'))).toBe(false);
    expect(ability.can('update', request(A, 'someone'))).toBe(false);
  });

  it('when an admin of A, then they answer A’s requests and set any A mentor’s settings, nothing in B', () => {
    const ability = defineAbilityFor(
      viewer({ memberships: [{ clubId: A, role: 'admin', status: 'active' }] }),
    );
    expect(ability.can('update', request(A, 'someone'))).toBe(true);
    expect(ability.can('read', request(A, 'someone'))).toBe(true);
    expect(ability.can('update', settings(A, 'any-mentor'))).toBe(true);
    expect(ability.can('update', request(B, 'someone'))).toBe(false);
    expect(ability.can('update', settings(B, 'any-mentor'))).toBe(false);
  });

  it('when the membership is suspended, then nothing about mentoring is allowed', () => {
    const ability = defineAbilityFor(
      viewer({ memberships: [{ clubId: A, role: 'admin', status: 'suspended' }] }),
    );
    expect(ability.can('create', request(A, 'me'))).toBe(false);
    expect(ability.can('update', settings(A, 'me'))).toBe(false);
  });
});
