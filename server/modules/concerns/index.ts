/** Concerns: what the care engine flags on a tank, kept with its history; the tank's care summary and sign-off. */
export { ConcernRow, TankReadiness, type ConcernStatus } from './concern.entity';
export { concernRouter } from './concern.router';
export { judgeConcerns } from './judge';
export { reevaluateTank, type Reevaluation } from './reevaluate-tank';
