import type { TestApp } from '@tests/helpers/test-app';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { signedIn, type Client } from '@tests/helpers/http';
import type { CreateTankInput } from '@shared/schemas/tank.schema';

/** A club with a member (the tank keeper), their mentor, an unrelated member, and a member of another club. */
export async function tankPeople(t: TestApp) {
  const club = await makeClub(t.dataSource, 'Tank Club');
  const other = await makeClub(t.dataSource, 'Elsewhere Club');
  const keeper = await makeMember(t.dataSource, club, 'Kim Keeper');
  const mentor = await makeMember(t.dataSource, club, 'Mo Mentor', 'mentor');
  const neighbour = await makeMember(t.dataSource, club, 'Nell Neighbour');
  const stranger = await makeMember(t.dataSource, other, 'Stan Stranger');
  await assignMentor(t.dataSource, club, mentor.user, keeper.user);
  const [asKeeper, asMentor, asNeighbour, asStranger] = await Promise.all(
    [keeper, mentor, neighbour, stranger].map((p) => signedIn(t.app, p.user.email)),
  );
  return {
    club,
    other,
    keeper,
    mentor,
    neighbour,
    stranger,
    asKeeper: asKeeper!,
    asMentor: asMentor!,
    asNeighbour: asNeighbour!,
    asStranger: asStranger!,
  };
}

export const REEF: CreateTankInput = {
  name: 'Living-room reef',
  systemType: 'reef',
  volume: { source: 'entered', value: 300 },
};

export async function makeTankVia(
  client: Client,
  clubId: string,
  body: CreateTankInput = REEF,
): Promise<{ id: string; [k: string]: unknown }> {
  const res = await client.post(`/api/clubs/${clubId}/tanks`, body);
  if (res.status !== 201) throw new Error(`tank creation failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.tank;
}
