import type { DataSource } from 'typeorm';
import type { Config } from './config/env';
import type { Mailer } from './mail/mailer';
import type { RateLimits } from './middleware/rate-limits';
import type { Notify } from './modules/notifications';
import type { TankChanges } from './modules/tanks';
import type { RealtimeHub } from './realtime/hub';

/**
 * What routers and services need besides their input, built once per app by `buildDeps` in server/app.ts and passed
 * as this one object: a router takes it whole, a service the part it uses (`Pick<Deps, 'notify'>`).
 */
export interface Deps {
  config: Config;
  dataSource: DataSource;
  mailer: Mailer;
  hub: RealtimeHub;
  /** Records a notification in the caller's transaction; e-mail and socket delivery follow the commit. */
  notify: Notify;
  /** The tank-changed seam: publish every change to a tank here, inside its transaction. */
  tankChanges: TankChanges;
  /** Rate limiters whose counters every instance shares. */
  rateLimits: RateLimits;
}
