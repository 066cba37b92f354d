import { io as connect, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '@server/boot';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn } from '@tests/helpers/http';
import { testConfig } from '@tests/helpers/test-app';

function open(url: string, headers: Record<string, string>): Socket {
  return connect(url, {
    transports: ['websocket'],
    extraHeaders: headers,
    reconnection: false,
    forceNew: true,
  });
}

function outcome(socket: Socket): Promise<'connected' | string> {
  return new Promise((resolve) => {
    socket.once('connect', () => resolve('connected'));
    socket.once('connect_error', (err) => resolve(err.message));
  });
}

/** Live connections share the HTTP session (ASVS 4.4.3) and end with it. */
describe('sockets and sessions', () => {
  let server: RunningServer;
  let email: string;
  beforeAll(async () => {
    server = await startServer(testConfig({ PORT: '0' }));
  });
  afterAll(() => server.close());
  beforeEach(async () => {
    await resetDatabase(server.dataSource);
    email = (await makeMember(server.dataSource, await makeClub(server.dataSource), 'Sasha Socket')).user
      .email;
  });

  it('when there is no signed-in session, then the socket is refused', async () => {
    const socket = open(server.url, {});
    expect(await outcome(socket)).toBe('unauthenticated');
    socket.close();
  });

  it('when the Origin is foreign, then the handshake is refused (ASVS 4.4.1)', async () => {
    const c = await signedIn(server.url, email);
    const socket = open(server.url, { Cookie: c.cookies.join('; '), Origin: 'https://elsewhere.example' });
    expect(await outcome(socket)).not.toBe('connected');
    socket.close();
  });

  it('when the user signs out, then their open socket is closed within a second', async () => {
    const c = await signedIn(server.url, email);
    const socket = open(server.url, { Cookie: c.cookies.join('; '), Origin: new URL(server.url).origin });
    expect(await outcome(socket)).toBe('connected');
    const closed = new Promise<number>((resolve) => socket.once('disconnect', () => resolve(Date.now())));
    const signedOutAt = Date.now();
    expect((await c.delete('/api/session')).status).toBe(204);
    const at = await Promise.race([
      closed,
      new Promise<number>((r) => setTimeout(() => r(Number.NaN), 2_000)),
    ]);
    expect(at - signedOutAt).toBeLessThan(1_000);
    socket.close();
  });
});
