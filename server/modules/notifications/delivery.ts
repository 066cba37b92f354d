import type { DataSource, EntityManager } from 'typeorm';
import { enableAfterCommit } from '../../db/after-commit';
import type { Config } from '../../config/env';
import type { Mailer } from '../../mail/mailer';
import type { RealtimeHub } from '../../realtime/hub';

/** What notify() needs besides the transaction: the socket hub, the mail queue and the links' base. */
export interface NotificationDelivery {
  hub: RealtimeHub;
  mailer: Mailer;
  config: Pick<Config, 'baseUrl' | 'sessionSecret'>;
}

const deliveries = new WeakMap<DataSource, NotificationDelivery>();

/** Called once per app (createApp): notify() on this data source delivers through these. */
export function attachNotificationDelivery(dataSource: DataSource, delivery: NotificationDelivery): void {
  enableAfterCommit(dataSource);
  deliveries.set(dataSource, delivery);
}

/** The delivery of this data source, if the app attached one (scripts and bare data sources have none). */
export function maybeDeliveryFor(manager: EntityManager): NotificationDelivery | undefined {
  return deliveries.get(manager.dataSource);
}

export function deliveryFor(manager: EntityManager): NotificationDelivery {
  const delivery = deliveries.get(manager.dataSource);
  if (!delivery) throw new Error('notify(): attachNotificationDelivery() was not called for this data source');
  return delivery;
}
