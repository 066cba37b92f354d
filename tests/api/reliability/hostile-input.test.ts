import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { answerUnreadableRequests } from '../../../server/lib/client-error';
import { MATRIX_ROWS, type MatrixRow } from '../access/matrix-rows';
import { buildWorld, type Persona, type World } from '../access/world';
import { resetDatabase } from '../../helpers/db';
import { Client, signedIn } from '../../helpers/http';
import { listRoutes } from '../../helpers/route-table';
import { watchRows, type RowWatch } from '../../helpers/row-watch';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { fuzzCaseArbitrary, type FuzzCase } from './fuzz-cases';

/**
 * Hostile input over every route of the route table (ASVS 1.2.x, 2.2.1, 15.3.6, 16.5.2): each request is a
 * well-formed request of the authorization matrix with one thing made wrong, sent by a person the route lets in so
 * it reaches validation and the handler. Seeded (FUZZ_SEED) and sized (FUZZ_REQUESTS) by the environment.
 */
const SEED = Number(process.env.FUZZ_SEED ?? 20_251_203);
const REQUESTS = Number(process.env.FUZZ_REQUESTS ?? 2_000);
/** Replays one route's cases (e.g. FUZZ_ROUTE='POST /password-resets'); LOG_LEVEL=error shows the server's side. */
const ONLY_ROUTE = process.env.FUZZ_ROUTE;
/** Written by design on a refused request: sessions (touched on every request), security events, mail sent later by the queue. */
const WRITTEN_WHEN_REFUSED = [
  'session',
  'audit_event',
  'captured_mail',
  'socket_io_attachments',
  'rate_limit_hit',
];
/** Pages for people following an e-mail link: they answer in HTML, refusals included. */
const HTML_PAGES = ['GET /unsubscribe', 'POST /unsubscribe'];
/** A CSV that parses into a single column is answered on the separator option: the file is fine, the separator is not. */
// A CSV mangled so that its columns or dates change is answered on the choice that no longer fits the file.
const ANSWERED_ON: Record<string, string[]> = { csv: ['delimiter', 'mapping', 'dateFormat'] };
const SIGNED_IN: Exclude<Persona, 'anonymous' | 'outsider' | 'suspended'>[] = [
  'member',
  'admin',
  'mentor',
  'otherMentor',
];

/** Someone the route lets through: anonymous when everyone gets the same answer, else the person it serves best. */
function personaFor(row: MatrixRow): Persona {
  const statuses = Object.values(row.expect);
  if (statuses.every((s) => s === statuses[0])) return 'anonymous';
  const rank = (s: number) => ([401, 403, 404].includes(s) ? Infinity : s);
  return [...SIGNED_IN].sort((a, b) => rank(row.expect[a]) - rank(row.expect[b]))[0]!;
}

/** Reads before writes, and the requests that end or remove the world's objects last, so fewer cases meet a 404. */
function order(row: MatrixRow): number {
  const [method, path] = row.route.split(' ') as [string, string];
  if (
    method === 'DELETE' ||
    /\/(archive|end|accept|decline|resolve|acknowledge|answered|members\/:membershipId)$/.test(path)
  )
    return 2;
  return method === 'GET' ? 0 : 1;
}

interface Finding {
  case: string;
  status: number;
  problem: string;
  body?: unknown;
}

describe('hostile input over every route', () => {
  let t: TestApp;
  let server: Server;
  let base: string;
  let world: World;
  let watch: RowWatch;
  const clients = new Map<Persona, Client>();

  beforeAll(async () => {
    t = await createTestApp(process.env.LOG_LEVEL ? { LOG_LEVEL: process.env.LOG_LEVEL } : {});
    server = createServer(t.app);
    answerUnreadableRequests(server);
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    await resetDatabase(t.dataSource);
    world = await buildWorld(t.deps);
    for (const p of SIGNED_IN) clients.set(p, await signedIn(base, world.people[p].user.email));
    watch = await watchRows(t.dataSource, { ignore: WRITTEN_WHEN_REFUSED });
  }, 60_000);
  afterAll(async () => {
    await watch?.stop();
    await new Promise<void>((resolve) => server?.close(() => resolve()));
    await t?.close();
  });

  /** Undoes what an accepted request did to the people and the tank, so later routes still let their person in. */
  async function restoreWorld(): Promise<void> {
    for (const p of Object.values(world.people)) {
      const m = p.membership as { id: string; role?: string; status?: string };
      await t.dataSource.query(
        `UPDATE membership SET role = $2, status = $3 WHERE id = $1 AND (role <> $2 OR status <> $3)`,
        [m.id, m.role, m.status],
      );
    }
    await t.dataSource.query(
      `UPDATE tank SET archived_at = NULL WHERE id = ANY($1) AND archived_at IS NOT NULL`,
      [[world.tank.tank.id, world.spareTank.tank.id]],
    );
    for (const p of SIGNED_IN) {
      const me = await request(base).get('/api/me').set('Cookie', clients.get(p)!.cookies);
      if (me.status !== 200) clients.set(p, await signedIn(base, world.people[p].user.email));
    }
  }

  async function send(c: FuzzCase, persona: Persona): Promise<request.Response> {
    const client = persona === 'anonymous' ? new Client(base) : clients.get(persona)!;
    const token = c.sendCsrf && c.method !== 'get' ? await client.csrfToken() : undefined;
    let req = request(base)[c.method](c.path).set('Cookie', client.cookies).timeout(15_000);
    if (token) req = req.set('X-CSRF-Token', token);
    for (const [k, v] of Object.entries(c.headers)) req = req.set(k, v);
    if (c.body && 'raw' in c.body)
      return req.set('Content-Type', c.body.raw.contentType).send(c.body.raw.bytes);
    if (c.body) return req.set('Content-Type', 'application/json').send(JSON.stringify(c.body.json));
    return req;
  }

  it('when hostile requests arrive, then none gets a 5xx, refused ones change no row, and every 4xx says what was wrong', async () => {
    const rows = [...MATRIX_ROWS].sort((a, b) => order(a) - order(b));
    expect(rows.map((r) => r.route).sort()).toEqual(listRoutes(t.api));
    const perRoute = Math.ceil(REQUESTS / rows.length);
    const findings: Finding[] = [];
    const byStatus: Record<string, number> = {};
    let sent = 0;
    let refused = 0;
    let fieldNamed = 0;
    let fieldAimed = 0;

    for (const [i, row] of rows.entries()) {
      if (ONLY_ROUTE && row.route !== ONLY_ROUTE) continue;
      await restoreWorld();
      await watch.take();
      const persona = personaFor(row);
      const valid = { route: row.route, ...row.request(world) };
      if ('files' in valid && valid.files) delete valid.body;
      const cases = fc.sample(fuzzCaseArbitrary(valid), { seed: SEED + i, numRuns: perRoute });
      for (const c of cases) {
        const label = `${persona} ${c.method.toUpperCase()} ${c.path.slice(0, 160)} [${c.mutation}]`;
        let res: request.Response;
        try {
          res = await send(c, persona);
        } catch (err) {
          findings.push({ case: label, status: 0, problem: `no answer: ${(err as Error).message}` });
          continue;
        }
        sent++;
        const changed = await watch.take();
        byStatus[res.status] = (byStatus[res.status] ?? 0) + 1;
        if (res.status >= 500)
          findings.push({ case: label, status: res.status, problem: 'server error', body: res.body });
        if (res.status < 400) continue;
        refused++;
        if (Object.keys(changed).length)
          findings.push({
            case: label,
            status: res.status,
            problem: 'rows changed by a refused request',
            body: changed,
          });
        const error = (res.body as { error?: { code?: unknown; message?: unknown } })?.error;
        const html = HTML_PAGES.includes(c.route) && /text\/html/.test(String(res.headers['content-type']));
        if (
          !html &&
          (typeof error?.code !== 'string' || typeof error?.message !== 'string' || !error.message)
        ) {
          findings.push({
            case: label,
            status: res.status,
            problem: 'no JSON error with a code and a message',
            body: res.text?.slice(0, 200),
          });
        }
        const issues = (res.body as { issues?: { path?: unknown; message?: unknown }[] }).issues;
        if (res.status === 400 && issues) {
          if (
            !issues.length ||
            issues.some(
              (x) => typeof x.path !== 'string' || !x.path || typeof x.message !== 'string' || !x.message,
            )
          ) {
            findings.push({
              case: label,
              status: 400,
              problem: 'a field issue without a field or a reason',
              body: issues,
            });
          }
          if (c.field) {
            fieldAimed++;
            const field = c.field;
            const names = (p: unknown) =>
              typeof p === 'string' &&
              (p === field || p.startsWith(`${field}.`) || field.startsWith(`${p}.`));
            // Removing a field can leave a body that fails a rule about the whole ("change at least one thing").
            const wholeRule = c.mutation.endsWith('dropped') && issues.some((x) => x.path === '(root)');
            const explained = issues.some(
              (x) =>
                names(x.path) ||
                ANSWERED_ON[field]?.some((a) => x.path === a || String(x.path).startsWith(`${a}.`)),
            );
            if (explained || wholeRule) fieldNamed++;
            else
              findings.push({
                case: label,
                status: 400,
                problem: `the 400 does not name ${c.field}`,
                body: issues,
              });
          }
        }
      }
    }

    const polluted = Object.keys(Object.prototype).concat('polluted' in {} ? ['polluted'] : []);
    console.info(
      `hostile input: seed ${SEED}, ${rows.length} routes, ${sent} requests, ${refused} refused (4xx), ` +
        `${Object.entries(byStatus)
          .map(([s, n]) => `${s}×${n}`)
          .join(' ')}, ${findings.length} findings, ` +
        `${fieldNamed}/${fieldAimed} aimed 400s named their field`,
    );
    expect(polluted, 'Object.prototype gained keys').toEqual([]);
    for (const f of findings.slice(0, 60))
      console.info(`${f.problem} (${f.status}): ${f.case}\n  ${JSON.stringify(f.body)?.slice(0, 300)}`);
    expect(findings.map((f) => `${f.problem} (${f.status}): ${f.case}`).slice(0, 40)).toEqual([]);
    if (!ONLY_ROUTE) expect(sent).toBeGreaterThanOrEqual(REQUESTS);
  }, 600_000);
});
