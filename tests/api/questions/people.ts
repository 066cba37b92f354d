import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import type { TestApp } from '@tests/helpers/test-app';

/**
 * A seahorse keeper (Sky) with a tank and one test, her mentor (Milo), another mentor of the club (Otto, who mentors
 * someone else), an admin (Ada), and a member of another club (Olga).
 */
export async function questionPeople(t: TestApp) {
  const club = await makeClub(t.dataSource, 'Reefside Keepers');
  const other = await makeClub(t.dataSource, 'Far Shore Club');
  const sky = await makeMember(t.dataSource, club, 'Sky Keeper');
  const milo = await makeMember(t.dataSource, club, 'Milo Mentor', 'mentor');
  const otto = await makeMember(t.dataSource, club, 'Otto Othermentor', 'mentor');
  const ada = await makeMember(t.dataSource, club, 'Ada Admin', 'admin');
  const olga = await makeMember(t.dataSource, other, 'Olga Outsider');
  await assignMentor(t.dataSource, club, milo.user, sky.user);
  await assignMentor(
    t.dataSource,
    club,
    otto.user,
    (await makeMember(t.dataSource, club, 'Spare Member')).user,
  );
  const [asSky, asMilo, asOtto, asAda, asOlga] = await Promise.all(
    [sky, milo, otto, ada, olga].map((p) => signedIn(t.app, p.user.email)),
  );
  const tankRes = await asSky!.post(`/api/clubs/${club.id}/tanks`, {
    name: 'Seahorse corner',
    systemType: 'seahorse',
    phase: 'established',
    volume: { source: 'entered', value: 200 },
  });
  if (tankRes.status !== 201) throw new Error(`tank: ${tankRes.status} ${JSON.stringify(tankRes.body)}`);
  const tankId = tankRes.body.tank.id as string;
  return {
    club,
    other,
    sky,
    milo,
    otto,
    ada,
    olga,
    asSky: asSky!,
    asMilo: asMilo!,
    asOtto: asOtto!,
    asAda: asAda!,
    asOlga: asOlga!,
    tankId,
  };
}

export async function addTest(
  client: Client,
  clubId: string,
  tankId: string,
  entries: Record<string, { value: number; unit?: string }>,
  takenAt = new Date(Date.now() - 3_600_000),
): Promise<string> {
  const res = await client.post(`/api/clubs/${clubId}/tanks/${tankId}/water-tests`, {
    takenAt: takenAt.toISOString(),
    entries,
  });
  if (res.status !== 201) throw new Error(`test: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.waterTest.id as string;
}
