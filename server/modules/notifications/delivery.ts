import type { Config } from '../../config/env';
import type { Mailer } from '../../mail/mailer';
import type { RealtimeHub } from '../../realtime/hub';

/** What notify() needs besides the transaction: the socket hub, the mail queue and the links' base. */
export interface NotificationDelivery {
  hub: RealtimeHub;
  mailer: Mailer;
  config: Pick<Config, 'baseUrl' | 'sessionSecret'>;
}
