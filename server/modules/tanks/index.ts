/**
 * Tanks: a keeper's tanks and everything logged on them (animals, water tests, events, photos), and the tank-changed
 * seam every change to a tank goes through.
 */
export { Livestock } from './livestock.entity';
export { TankEvent } from './tank-event.entity';
export { Tank } from './tank.entity';
export { WaterTest } from './water-test.entity';

export { livestockRouter } from './livestock.router';
export { photoRouter } from './photo.router';
export { tankEventRouter } from './tank-event.router';
export { tankRouter } from './tank.router';
export { timelineRouter } from './timeline.router';
export { waterTestRouter } from './water-test.router';

export {
  NOTHING_NEW,
  TankChanges,
  type JudgedConcern,
  type TankChange,
  type TankChangeCause,
  type TankChangeListener,
  type TankJudge,
  type TankVerdict,
} from './tank-changed';
export { findTank, loadTank, lockTank, ownedBy, requireActive } from './tank-access';
export {
  listTanks,
  tankForCare,
  tankRef,
  type TankForCare,
  type TankListRow,
  type TankRef,
} from './tank.queries';
export { careHistories, careHistory } from './water-test.queries';
export { lastSourceNitrate } from './tank-event.queries';
export { presentWaterTest, valuesOf } from './water-test.presenter';

export { addLivestock } from './livestock.service';
export { createTankEvent } from './tank-event.service';
export { createTank } from './tank.service';
export { attachPhotos } from './tank-photo.service';
export {
  createWaterTest,
  insertWaterTests,
  type NewWaterTest,
  type SavedWaterTest,
} from './water-test.service';
export { chemistryOf, lastKnownBefore } from './water-test.context';
export { allWaterTests, takenAtsOf } from './water-test.queries';
export { allTankEvents } from './tank-event.queries';
