import { io as connect, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../../server/boot';
import { ABSOLUTE_MS } from '../../../server/config/session';
import { resetDatabase } from '../../helpers/db';
import { makeClub, makeMember } from '../../helpers/factories';
import { signedIn, type Client } from '../../helpers/http';
import { testConfig } from '../../helpers/test-app';

/**
 * A socket whose session ended without a sign-out on this server (idle or absolute expiry, sessions ended by an
 * admin) is disconnected within SOCKET_SESSION_CHECK_SECONDS (ASVS 7.4.1, 4.4.3); a live session's socket stays.
 */
const CHECK_SECONDS = 1;

function openSocket(url: string, c: Client): Promise<Socket> {
  const socket = connect(url, {
    transports: ['websocket'],
    extraHeaders: { Cookie: c.cookies.join('; '), Origin: new URL(url).origin },
    reconnection: false,
    forceNew: true,
  });
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve(socket));
    socket.once('connect_error', reject);
  });
}

/** Milliseconds until the socket is disconnected, or NaN when it stays open for `withinMs`. */
function disconnectedWithin(socket: Socket, withinMs: number): Promise<number> {
  const started = Date.now();
  return new Promise((resolve) => {
    const timer = setTimeout(() => resolve(Number.NaN), withinMs);
    socket.once('disconnect', () => {
      clearTimeout(timer);
      resolve(Date.now() - started);
    });
  });
}

const sidOf = (c: Client) =>
  decodeURIComponent(c.cookies[0]!.split('=')[1]!).replace(/^s:/, '').split('.')[0]!;

describe('sockets whose session ended', () => {
  let server: RunningServer;
  let email: string;
  beforeAll(async () => {
    server = await startServer(
      testConfig({ PORT: '0', SOCKET_SESSION_CHECK_SECONDS: String(CHECK_SECONDS) }),
    );
  });
  afterAll(() => server?.close());
  beforeEach(async () => {
    await resetDatabase(server.dataSource);
    email = (await makeMember(server.dataSource, await makeClub(server.dataSource), 'Sunny Socket')).user
      .email;
  });

  const endings: [string, (sid: string) => Promise<unknown>][] = [
    [
      'the session idled out',
      (sid) =>
        server.dataSource.query(`UPDATE "session" SET expire = now() - interval '1 second' WHERE sid = $1`, [
          sid,
        ]),
    ],
    [
      'the session passed its absolute lifetime',
      (sid) =>
        server.dataSource.query(
          `UPDATE "session" SET sess = jsonb_set(sess::jsonb, '{signedInAt}', to_jsonb($2::bigint))::json WHERE sid = $1`,
          [sid, Date.now() - ABSOLUTE_MS - 60_000],
        ),
    ],
    [
      'the session was ended on the server (an account disabled, sessions cleared)',
      (sid) => server.dataSource.query(`DELETE FROM "session" WHERE sid = $1`, [sid]),
    ],
  ];
  for (const [what, end] of endings) {
    it(`when ${what}, then its socket is disconnected within the check interval, and another session's socket stays`, async () => {
      const ending = await signedIn(server.url, email);
      const staying = await signedIn(server.url, email);
      const [doomed, kept] = await Promise.all([
        openSocket(server.url, ending),
        openSocket(server.url, staying),
      ]);
      await end(sidOf(ending));
      const [doomedAfter, keptAfter] = await Promise.all([
        disconnectedWithin(doomed, CHECK_SECONDS * 1000 + 800),
        disconnectedWithin(kept, CHECK_SECONDS * 1000 + 800),
      ]);
      expect(doomedAfter).toBeLessThan(CHECK_SECONDS * 1000 + 800);
      expect(keptAfter).toBeNaN();
      doomed.close();
      kept.close();
    });
  }
});
