import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { unansweredCountsByTank } from '@server/modules/questions/question.queries';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { addTest, questionPeople } from './people';

describe('unanswered questions per tank (for the mentor desk)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(() => resetDatabase(t.dataSource));

  it('counts open questions whose last word is the asker’s, per tank, in the club asked about only', async () => {
    const p = await questionPeople(t);
    const secondTank = (
      await p.asSky.post(`/api/clubs/${p.club.id}/tanks`, {
        name: 'Quarantine tub',
        systemType: 'seahorse',
        phase: 'established',
        volume: { source: 'entered', value: 60 },
      })
    ).body.tank.id as string;
    const quietTank = (
      await p.asSky.post(`/api/clubs/${p.club.id}/tanks`, {
        name: 'Empty tank',
        systemType: 'seahorse',
        phase: 'established',
        volume: { source: 'entered', value: 60 },
      })
    ).body.tank.id as string;
    const testA = await addTest(p.asSky, p.club.id, p.tankId, { nitrate: { value: 15, unit: 'mg/L NO3' } });
    const testB = await addTest(p.asSky, p.club.id, secondTank, { nitrate: { value: 5, unit: 'mg/L NO3' } });
    const ask = async (tankId: string, waterTestId: string, title: string) => {
      const res = await p.asSky.post(`/api/clubs/${p.club.id}/tanks/${tankId}/questions`, {
        title,
        body: 'Is this fine?',
        waterTestId,
      });
      expect(res.status).toBe(201);
      return `/api/clubs/${p.club.id}/questions/${res.body.question.id as string}`;
    };
    const reply = async (path: string, client: typeof p.asSky, body = 'Reply.') =>
      expect((await client.post(`${path}/replies`, { body })).status).toBe(201);

    await ask(p.tankId, testA, 'No answer yet'); // waiting
    const answeredByMentor = await ask(p.tankId, testA, 'Mentor replied');
    await reply(answeredByMentor, p.asMilo); // not waiting
    const followedUp = await ask(p.tankId, testA, 'Asker followed up');
    await reply(followedUp, p.asMilo);
    await reply(followedUp, p.asSky); // waiting again
    const closed = await ask(p.tankId, testA, 'Marked answered');
    expect((await p.asSky.post(`${closed}/answered`, { answered: true })).status).toBe(200); // not open
    const adminAnswered = await ask(secondTank, testB, 'Admin replied');
    await reply(adminAnswered, p.asAda); // not waiting

    const counts = await unansweredCountsByTank(t.dataSource.manager, p.club.id, [
      p.tankId,
      secondTank,
      quietTank,
    ]);
    expect(Object.fromEntries(counts)).toEqual({ [p.tankId]: 2, [secondTank]: 0, [quietTank]: 0 });

    // The same tanks asked about under another club's id count nothing.
    const elsewhere = await unansweredCountsByTank(t.dataSource.manager, p.other.id, [p.tankId]);
    expect(Object.fromEntries(elsewhere)).toEqual({ [p.tankId]: 0 });
    expect((await unansweredCountsByTank(t.dataSource.manager, p.club.id, [])).size).toBe(0);
  });
});
