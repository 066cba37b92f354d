import { io as connect, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { NotificationView } from '@shared/schemas/notification-views';
import { startServer, type RunningServer } from '@server/boot';
import type { Club } from '@server/modules/clubs/club.entity';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn } from '@tests/helpers/http';
import { testConfig } from '@tests/helpers/test-app';

type Person = Awaited<ReturnType<typeof makeMember>>;

/** Collects every `notification` event a socket receives. */
function listen(socket: Socket): NotificationView[] {
  const got: NotificationView[] = [];
  socket.on('notification', (p: { notification: NotificationView }) => got.push(p.notification));
  return got;
}

const until = async (check: () => boolean, ms: number) => {
  const end = Date.now() + ms;
  while (!check() && Date.now() < end) await new Promise((r) => setTimeout(r, 20));
  return check();
};

describe('notifications over the socket', () => {
  let server: RunningServer;
  let club: Club;
  let mina: Person;
  let otto: Person;
  const sockets: Socket[] = [];

  beforeAll(async () => {
    server = await startServer(testConfig({ PORT: '0' }));
  });
  afterAll(async () => {
    for (const s of sockets) s.close();
    await server.close();
  });
  beforeEach(async () => {
    for (const s of sockets.splice(0)) s.close();
    await resetDatabase(server.dataSource);
    club = await makeClub(server.dataSource, 'Socket Club');
    mina = await makeMember(server.dataSource, club, 'Mina Member');
    otto = await makeMember(server.dataSource, club, 'Otto Other');
  });

  async function socketOf(email: string): Promise<Socket> {
    const c = await signedIn(server.url, email);
    const socket = connect(server.url, {
      transports: ['websocket'],
      extraHeaders: { Cookie: c.cookies.join('; '), Origin: new URL(server.url).origin },
      reconnection: false,
      forceNew: true,
    });
    sockets.push(socket);
    await new Promise<void>((resolve, reject) => {
      socket.once('connect', () => resolve());
      socket.once('connect_error', reject);
    });
    return socket;
  }

  it('when a person is notified, then their socket gets the event within a second and another person’s gets nothing', async () => {
    const minaGot = listen(await socketOf(mina.user.email));
    const ottoGot = listen(await socketOf(otto.user.email));
    const sentAt = Date.now();
    const [row] = await server.dataSource.transaction((tx) =>
      server.deps.notify(tx, {
        userIds: [mina.user.id],
        clubId: club.id,
        kind: 'mention',
        title: 'Milo mentioned you',
        body: 'Look at this nitrate.',
        link: '/tanks/t1',
      }),
    );
    expect(await until(() => minaGot.length === 1, 1_000)).toBe(true);
    expect(Date.now() - sentAt).toBeLessThan(1_000);
    expect(minaGot[0]).toMatchObject({
      id: row!.id,
      kind: 'mention',
      title: 'Milo mentioned you',
      clubName: 'Socket Club',
      link: '/tanks/t1',
      readAt: null,
    });
    // Give a stray event time to arrive before concluding there is none.
    await new Promise((r) => setTimeout(r, 400));
    expect(ottoGot).toEqual([]);
    expect(minaGot).toHaveLength(1);
  });

  it('when the notifying transaction rolls back, then no event is sent at all', async () => {
    const minaGot = listen(await socketOf(mina.user.email));
    await server.dataSource
      .transaction(async (tx) => {
        await server.deps.notify(tx, {
          userIds: [mina.user.id],
          clubId: club.id,
          kind: 'mention',
          title: 'never happened',
          link: '/',
        });
        throw new Error('roll back');
      })
      .catch(() => undefined);
    // A savepoint rolled back inside a transaction that commits takes its notification with it.
    await server.dataSource.transaction(async (tx) => {
      await tx.transaction((inner) =>
        server.deps.notify(inner, {
          userIds: [mina.user.id],
          clubId: club.id,
          kind: 'mention',
          title: 'inside a released savepoint',
          link: '/',
        }),
      );
      await tx
        .transaction(async (inner) => {
          await server.deps.notify(inner, {
            userIds: [mina.user.id],
            clubId: club.id,
            kind: 'mention',
            title: 'inside a rolled-back savepoint',
            link: '/',
          });
          throw new Error('roll back the savepoint');
        })
        .catch(() => undefined);
      await server.deps.notify(tx, {
        userIds: [mina.user.id],
        clubId: club.id,
        kind: 'mention',
        title: 'this one did',
        link: '/',
      });
    });
    expect(await until(() => minaGot.length >= 2, 1_000)).toBe(true);
    await new Promise((r) => setTimeout(r, 300));
    expect(minaGot.map((n) => n.title)).toEqual(['inside a released savepoint', 'this one did']);
    expect(
      (await server.dataSource.query(`SELECT title FROM notification ORDER BY created_at`)).map(
        (r: { title: string }) => r.title,
      ),
    ).toEqual(['inside a released savepoint', 'this one did']);
  });

  it('when a member asks for a mentor over HTTP, then the admin’s open socket hears about it', async () => {
    const admin = await makeMember(server.dataSource, club, 'Ada Admin', 'admin');
    const adminGot = listen(await socketOf(admin.user.email));
    const minaGot = listen(await socketOf(mina.user.email));
    const c = await signedIn(server.url, mina.user.email);
    expect((await c.post(`/api/clubs/${club.id}/mentor-requests`, { note: 'Please!' })).status).toBe(201);
    expect(await until(() => adminGot.length === 1, 1_000)).toBe(true);
    expect(adminGot[0]).toMatchObject({
      kind: 'mentor-request',
      title: 'Mina Member asks for a mentor',
      body: 'Please!',
      link: '/club',
    });
    expect(minaGot).toEqual([]);
  });
});
