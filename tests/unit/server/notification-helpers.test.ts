import { describe, expect, it } from 'vitest';
import { localDayAndHour } from '@server/modules/notifications/local-day';
import {
  signUnsubscribeToken,
  unsubscribeUrl,
  verifyUnsubscribeToken,
} from '@server/modules/notifications/unsubscribe-token';

const SECRET = 'a-test-secret-that-is-long-enough-0123456789';
const USER = '0b5a3c1e-8d2f-4a6b-9c7d-1e2f3a4b5c6d';

describe('unsubscribe tokens', () => {
  it('when signed, then the same secret reads the claim back and any other secret does not', () => {
    const token = signUnsubscribeToken(SECRET, { userId: USER, scope: 'digest' });
    expect(verifyUnsubscribeToken(SECRET, token)).toEqual({ userId: USER, scope: 'digest' });
    expect(verifyUnsubscribeToken(`${SECRET}x`, token)).toBeNull();
  });

  it('when a well-signed payload names an unknown scope or a non-id, then it is refused', () => {
    // Sign arbitrary payloads the way the module does, to prove the checks after the signature matter.
    for (const payload of [`${USER}:everything`, `not-a-uuid:all`, `${USER}`]) {
      const forged = signUnsubscribeToken(SECRET, {
        userId: payload.split(':')[0]!,
        scope: (payload.split(':')[1] ?? '') as 'all',
      });
      expect(verifyUnsubscribeToken(SECRET, forged), payload).toBeNull();
    }
  });

  it('when put in a URL, then it survives encoding', () => {
    const url = new URL(
      unsubscribeUrl('https://club.example', SECRET, { userId: USER, scope: 'concern.urgent' }),
    );
    expect(url.pathname).toBe('/api/unsubscribe');
    expect(verifyUnsubscribeToken(SECRET, url.searchParams.get('token')!)).toEqual({
      userId: USER,
      scope: 'concern.urgent',
    });
  });
});

describe('local day and hour', () => {
  const at = new Date('2026-03-01T02:30:00Z');
  it('when the zone is west of UTC, then the date can still be yesterday', () => {
    expect(localDayAndHour(at, 'America/Los_Angeles')).toEqual({ date: '2026-02-28', hour: 18 });
  });
  it('when the zone is east of UTC, then the hour moves forward', () => {
    expect(localDayAndHour(at, 'Asia/Kolkata')).toEqual({ date: '2026-03-01', hour: 8 });
  });
  it('when the zone is unknown, then UTC is used', () => {
    expect(localDayAndHour(at, 'Mars/Olympus')).toEqual({ date: '2026-03-01', hour: 2 });
    expect(localDayAndHour(new Date('2026-03-01T00:10:00Z'), 'UTC')).toEqual({ date: '2026-03-01', hour: 0 });
  });
});
