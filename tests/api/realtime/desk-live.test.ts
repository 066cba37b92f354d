import { io as connect, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TankChangedPayload } from '@shared/events/socket-events';
import { startServer, type RunningServer } from '@server/boot';
import { resetDatabase } from '@tests/helpers/db';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import { testConfig } from '@tests/helpers/test-app';

const CALM = {
  temperature: { value: 24, unit: '°C' },
  salinity: { value: 33, unit: 'PSU' },
  pH: { value: 8.1 },
  ammonia: { value: 0, unit: 'mg/L NH3' },
  nitrate: { value: 2, unit: 'mg/L NO3' },
};

function listen(url: string, client: Client): Promise<{ socket: Socket; concerns: TankChangedPayload[] }> {
  const socket = connect(url, {
    transports: ['websocket'],
    extraHeaders: { Cookie: client.cookies.join('; '), Origin: new URL(url).origin },
    reconnection: false,
    forceNew: true,
  });
  const concerns: TankChangedPayload[] = [];
  socket.on('concern', (p: TankChangedPayload) => concerns.push(p));
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve({ socket, concerns }));
    socket.once('connect_error', reject);
  });
}

async function until<T>(read: () => T | undefined, ms: number): Promise<T | undefined> {
  const end = Date.now() + ms;
  for (;;) {
    const v = read();
    if (v !== undefined || Date.now() > end) return v;
    await new Promise((r) => setTimeout(r, 20));
  }
}

/** Two app instances on one PostgreSQL: what a keeper saves on A reaches the right mentor on B, and only them. */
describe('the live desk across instances', () => {
  let a: RunningServer;
  let b: RunningServer;
  beforeAll(async () => {
    a = await startServer(testConfig({ PORT: '0' }));
    b = await startServer(testConfig({ PORT: '0' }));
  });
  afterAll(async () => {
    await a?.close();
    await b?.close();
  });

  it('when a mentee saves an urgent test on A, then their mentor on B hears within 1 s, an unrelated mentor never does, and nothing after the pairing ends', async () => {
    await resetDatabase(a.dataSource);
    const club = await makeClub(a.dataSource, 'Two Instance Club');
    const keeper = await makeMember(a.dataSource, club, 'Kit Keeper');
    const mentor = await makeMember(a.dataSource, club, 'Mo Mentor', 'mentor');
    const stranger = await makeMember(a.dataSource, club, 'Stan Otherment', 'mentor');
    const admin = await makeMember(a.dataSource, club, 'Ada Admin', 'admin');
    const assignment = await assignMentor(a.dataSource, club, mentor.user, keeper.user);

    const onA = await signedIn(a.url, keeper.user.email);
    const tank = await onA.post(`/api/clubs/${club.id}/tanks`, {
      name: 'Seahorse home',
      systemType: 'seahorse',
      phase: 'established',
      volume: { source: 'entered', value: 200 },
    });
    expect(tank.status).toBe(201);
    const tankId = tank.body.tank.id as string;

    const mentorSocket = await listen(b.url, await signedIn(b.url, mentor.user.email));
    const strangerSocket = await listen(b.url, await signedIn(b.url, stranger.user.email));

    const savedAt = Date.now();
    const saved = await onA.post(`/api/clubs/${club.id}/tanks/${tankId}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { ...CALM, nitrite: { value: 1.0, unit: 'mg/L NO2' } },
    });
    expect(saved.status).toBe(201);
    const heard = await until(
      () => mentorSocket.concerns.find((c) => c.tankId === tankId && c.worst === 'urgent'),
      1_000,
    );
    expect(heard).toBeDefined();
    expect(Date.now() - savedAt).toBeLessThan(1_500);
    await new Promise((r) => setTimeout(r, 500));
    expect(strangerSocket.concerns).toEqual([]);

    const ended = await (
      await signedIn(a.url, admin.user.email)
    ).post(`/api/clubs/${club.id}/mentor-assignments/${assignment.id}/end`);
    expect(ended.status).toBe(200);
    mentorSocket.concerns.length = 0;
    // A past mentee stays readable for 30 days, but live updates stop with the pairing.
    await onA.post(`/api/clubs/${club.id}/tanks/${tankId}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { ...CALM, nitrite: { value: 2.0, unit: 'mg/L NO2' } },
    });
    await new Promise((r) => setTimeout(r, 1_000));
    expect(mentorSocket.concerns).toEqual([]);
    expect(strangerSocket.concerns).toEqual([]);

    mentorSocket.socket.close();
    strangerSocket.socket.close();
  });
});
