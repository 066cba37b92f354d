import type { UploadFile } from '@tests/helpers/http';
import { png } from '@tests/helpers/images';
import type { Persona, World } from './world';

type Expect = Record<Persona, number>;
export interface TankMatrixRow {
  route: string;
  request: (w: World) => { path: string; body?: unknown; files?: UploadFile[] };
  expect: Expect;
}

/** Any active member: the list is filtered to what each may read, and anyone may start a tank of their own. */
const clubMembers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: s,
  admin: s,
  suspended: 403,
});
/** The member's own tank: their mentor and the club's admins read it; another mentor of the club may not. */
const readers = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: s,
  otherMentor: 403,
  admin: s,
  suspended: 403,
});
/** Spare's tank, read by spare's own mentor (otherMentor) and admins; the member and their mentor may not. */
const spareReaders = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: 403,
  mentor: 403,
  otherMentor: s,
  admin: s,
  suspended: 403,
});
/** Only the member changes their own tank; mentors and admins read but never write. */
const ownerOnly = (s: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  member: s,
  mentor: 403,
  otherMentor: 403,
  admin: 403,
  suspended: 403,
});

const PHOTO: UploadFile = { data: await png(), name: 'tank.png', type: 'image/png' };
const day = () => new Date(Date.now() - 3_600_000).toISOString();
const tankPath = (w: World) => `/clubs/${w.club.id}/tanks/${w.tank.tank.id}`;
const CSV = 'date,pH,nitrate (mg/L NO3)\n2025-01-05T10:00:00Z,8.1,5\n';

export const TANK_ROWS: TankMatrixRow[] = [
  {
    route: 'GET /clubs/:clubId/tanks',
    request: (w) => ({ path: `/clubs/${w.club.id}/tanks` }),
    expect: clubMembers(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks',
    request: (w) => ({
      path: `/clubs/${w.club.id}/tanks`,
      body: { name: 'New tank', systemType: 'tropical-freshwater', volume: { source: 'entered', value: 60 } },
    }),
    expect: clubMembers(201),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId',
    request: (w) => ({ path: tankPath(w) }),
    expect: readers(200),
  },
  {
    route: 'PATCH /clubs/:clubId/tanks/:tankId',
    request: (w) => ({ path: tankPath(w), body: { name: 'Renamed' } }),
    expect: ownerOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/archive',
    request: (w) => ({ path: `${tankPath(w)}/archive` }),
    expect: ownerOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/restore',
    request: (w) => ({ path: `${tankPath(w)}/restore` }),
    expect: ownerOnly(200),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/livestock',
    request: (w) => ({ path: `/clubs/${w.club.id}/tanks/${w.spareTank.tank.id}/livestock` }),
    expect: spareReaders(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/livestock',
    request: (w) => ({
      path: `${tankPath(w)}/livestock`,
      body: { speciesCommonName: 'Invented blenny', count: 2, addedOn: day().slice(0, 10) },
    }),
    expect: ownerOnly(201),
  },
  {
    route: 'PATCH /clubs/:clubId/tanks/:tankId/livestock/:livestockId',
    request: (w) => ({ path: `${tankPath(w)}/livestock/${w.tank.livestock.id}`, body: { count: 3 } }),
    expect: ownerOnly(200),
  },
  {
    route: 'DELETE /clubs/:clubId/tanks/:tankId/livestock/:livestockId',
    request: (w) => ({ path: `${tankPath(w)}/livestock/${w.tank.livestock.id}` }),
    expect: ownerOnly(204),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/water-tests',
    request: (w) => ({ path: `${tankPath(w)}/water-tests` }),
    expect: readers(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/water-tests',
    request: (w) => ({
      path: `${tankPath(w)}/water-tests`,
      body: { takenAt: day(), entries: { nitrate: { value: 10, unit: 'mg/L NO3' } } },
    }),
    expect: ownerOnly(201),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/water-tests/:testId',
    request: (w) => ({ path: `${tankPath(w)}/water-tests/${w.tank.waterTest.id}` }),
    expect: readers(200),
  },
  {
    route: 'PATCH /clubs/:clubId/tanks/:tankId/water-tests/:testId',
    request: (w) => ({
      path: `${tankPath(w)}/water-tests/${w.tank.waterTest.id}`,
      body: { note: 'Checked twice.' },
    }),
    expect: ownerOnly(200),
  },
  {
    route: 'DELETE /clubs/:clubId/tanks/:tankId/water-tests/:testId',
    request: (w) => ({ path: `${tankPath(w)}/water-tests/${w.tank.waterTest.id}` }),
    expect: ownerOnly(204),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/events',
    request: (w) => ({ path: `${tankPath(w)}/events` }),
    expect: readers(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/events',
    request: (w) => ({
      path: `${tankPath(w)}/events`,
      body: { kind: 'observation', occurredAt: day(), details: { hiding: 'more-than-usual' } },
    }),
    expect: ownerOnly(201),
  },
  {
    route: 'PATCH /clubs/:clubId/tanks/:tankId/events/:eventId',
    request: (w) => ({ path: `${tankPath(w)}/events/${w.tank.event.id}`, body: { note: 'Ate well.' } }),
    expect: ownerOnly(200),
  },
  {
    route: 'DELETE /clubs/:clubId/tanks/:tankId/events/:eventId',
    request: (w) => ({ path: `${tankPath(w)}/events/${w.tank.event.id}` }),
    expect: ownerOnly(204),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/timeline',
    request: (w) => ({ path: `${tankPath(w)}/timeline` }),
    expect: readers(200),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/photos',
    request: (w) => ({ path: `/clubs/${w.club.id}/tanks/${w.spareTank.tank.id}/photos` }),
    expect: spareReaders(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/photos',
    request: (w) => ({ path: `${tankPath(w)}/photos`, files: [PHOTO] }),
    expect: ownerOnly(201),
  },
  {
    route: 'GET /clubs/:clubId/photos/:photoId',
    request: (w) => ({ path: `/clubs/${w.club.id}/photos/${w.tank.photo.id}` }),
    expect: readers(200),
  },
  {
    route: 'GET /clubs/:clubId/photos/:photoId/thumb',
    request: (w) => ({ path: `/clubs/${w.club.id}/photos/${w.spareTank.photo.id}/thumb` }),
    expect: spareReaders(200),
  },
  {
    route: 'DELETE /clubs/:clubId/photos/:photoId',
    request: (w) => ({ path: `/clubs/${w.club.id}/photos/${w.tank.photo.id}` }),
    expect: ownerOnly(204),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/imports/preview',
    request: (w) => ({ path: `${tankPath(w)}/imports/preview`, body: { csv: CSV } }),
    expect: ownerOnly(200),
  },
  {
    route: 'POST /clubs/:clubId/tanks/:tankId/imports/commit',
    request: (w) => ({ path: `${tankPath(w)}/imports/commit`, body: { csv: CSV } }),
    expect: ownerOnly(200),
  },
  {
    route: 'GET /clubs/:clubId/tanks/:tankId/export.csv',
    request: (w) => ({ path: `/clubs/${w.club.id}/tanks/${w.spareTank.tank.id}/export.csv` }),
    expect: spareReaders(200),
  },
];
