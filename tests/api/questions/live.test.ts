import { io as connect, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TankChangedPayload } from '@shared/events/socket-events';
import type { NotificationView } from '@shared/schemas/notification-views';
import { startServer, type RunningServer } from '@server/boot';
import { resetDatabase } from '@tests/helpers/db';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import { testConfig } from '@tests/helpers/test-app';

interface Heard {
  socket: Socket;
  changed: TankChangedPayload[];
  notifications: NotificationView[];
}

function listen(url: string, client: Client): Promise<Heard> {
  const socket = connect(url, {
    transports: ['websocket'],
    extraHeaders: { Cookie: client.cookies.join('; '), Origin: new URL(url).origin },
    reconnection: false,
    forceNew: true,
  });
  const heard: Heard = { socket, changed: [], notifications: [] };
  socket.on('tankChanged', (p: TankChangedPayload) => heard.changed.push(p));
  socket.on('notification', (p: { notification: NotificationView }) =>
    heard.notifications.push(p.notification),
  );
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve(heard));
    socket.once('connect_error', reject);
  });
}

async function until(check: () => boolean, ms: number): Promise<boolean> {
  const end = Date.now() + ms;
  while (!check()) {
    if (Date.now() > end) return false;
    await new Promise((r) => setTimeout(r, 20));
  }
  return true;
}

/** The desk's unanswered count is live: a question or a reply announces the tank to those watching it, and only them. */
describe('questions, live', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer(testConfig({ PORT: '0' }));
  });
  afterAll(() => server?.close());

  it('when the keeper asks and the mentor replies, then the mentor’s and keeper’s sockets hear of it at once; an unrelated mentor’s never do', async () => {
    const ds = server.dataSource;
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Live Question Club');
    const keeper = await makeMember(ds, club, 'Kai Keeper');
    const mentor = await makeMember(ds, club, 'Mia Mentor', 'mentor');
    const stranger = await makeMember(ds, club, 'Stu Stranger', 'mentor');
    await assignMentor(ds, club, mentor.user, keeper.user);

    const asKeeper = await signedIn(server.url, keeper.user.email);
    const asMentor = await signedIn(server.url, mentor.user.email);
    const tankId = (
      await asKeeper.post(`/api/clubs/${club.id}/tanks`, {
        name: 'Nano reef',
        systemType: 'reef',
        phase: 'established',
        volume: { source: 'entered', value: 60 },
      })
    ).body.tank.id as string;
    const test = await asKeeper.post(`/api/clubs/${club.id}/tanks/${tankId}/water-tests`, {
      takenAt: new Date().toISOString(),
      entries: { pH: { value: 8.1 } },
    });
    expect(test.status).toBe(201);

    const mentorHears = await listen(server.url, asMentor);
    const keeperHears = await listen(server.url, asKeeper);
    const strangerHears = await listen(server.url, await signedIn(server.url, stranger.user.email));

    const asked = await asKeeper.post(`/api/clubs/${club.id}/tanks/${tankId}/questions`, {
      title: 'pH fine?',
      body: 'Reads 8.1',
      waterTestId: test.body.waterTest.id,
    });
    expect(asked.status).toBe(201);
    expect(await until(() => mentorHears.changed.some((c) => c.tankId === tankId), 1_000)).toBe(true);
    expect(await until(() => mentorHears.notifications.some((n) => n.kind === 'question.asked'), 1_000)).toBe(
      true,
    );

    keeperHears.changed.length = 0;
    const reply = await asMentor.post(`/api/clubs/${club.id}/questions/${asked.body.question.id}/replies`, {
      body: 'Yes, 8.1 is right.',
    });
    expect(reply.status).toBe(201);
    expect(await until(() => keeperHears.changed.some((c) => c.tankId === tankId), 1_000)).toBe(true);
    expect(
      await until(
        () =>
          keeperHears.notifications.some(
            (n) => n.kind === 'question.answered' && n.link === `/questions/${asked.body.question.id}`,
          ),
        1_000,
      ),
    ).toBe(true);

    await new Promise((r) => setTimeout(r, 300));
    expect(strangerHears.changed).toEqual([]);
    expect(strangerHears.notifications).toEqual([]);
    for (const h of [mentorHears, keeperHears, strangerHears]) h.socket.close();
  });
});
