import type { EntityManager } from 'typeorm';
import { tankChanged } from '../concerns/tank-changed';
import type { WaterTest } from './water-test.entity';

/**
 * Called inside the transaction after a water test is saved or edited (an import calls it once, with its newest
 * test): concerns are re-evaluated in the same transaction and the change is announced after commit.
 */
export async function onWaterTestSaved(tx: EntityManager, test: WaterTest): Promise<void> {
  await tankChanged(tx, test.tankId);
}
